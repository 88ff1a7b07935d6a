package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.format.EditorSchemas;
import dev.mesolint.core.rule.RuleDefinition;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code mesolint schema --out DIR}: local JSON Schemas for editors, with this repository's exercise ids. */
@Command(name = "schema", mixinStandardHelpOptions = true,
        description = {"Writes the JSON Schemas a YAML language server reads: programme (with the exercise ids of "
                + "the built-in catalogue and the repository's catalogue files, for completion and checking), "
                + "catalogue, configuration (.mesolint.yaml) and profile.",
            "Point a programme at its copy with a first line such as",
            "  # yaml-language-server: $schema=../.mesolint/schema/programme.schema.json",
            "Run it again after adding exercises to a catalogue file."},
        footer = {"", "Exit codes: 0 written, 2 usage or configuration error.", "", "Caution: " + Mesolint.CAUTION})
final class SchemaCommand implements Callable<Integer> {

    @Option(names = "--out", paramLabel = "DIR", defaultValue = ".mesolint/schema",
            description = "The folder to write to; created when missing (default: ${DEFAULT-VALUE}).")
    Path out;

    @Mixin
    ConfigOptions options;

    @Mixin
    ConfigOptions.Catalogues catalogues;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        try {
            List<Path> written = write(options, catalogues.files, out, err);
            PrintWriter stdout = spec.commandLine().getOut();
            written.forEach(p -> stdout.println("wrote " + p));
            stdout.flush();
            return 0;
        } catch (ConfigProblem e) {
            return Installed.fail(e, err);
        }
    }

    /** Writes the editor schemas for the repository {@code options} describe into {@code folder}. */
    static List<Path> write(ConfigOptions options, List<Path> extraCatalogues, Path folder, PrintWriter err)
            throws ConfigProblem, IOException {
        InstalledRules installed = Installed.rules();
        Workspace workspace = Workspace.open(options.toRunOptions(List.of(), extraCatalogues, Optional.empty(),
                Optional.empty()), installed.rules());
        Checker checker = new Checker(workspace.request(List.of()), installed.rules());
        checker.catalogueReports().forEach(bad -> err.println("mesolint: catalogue " + bad.displayPath()
                + " did not load: its exercises are not in the schema"));
        Map<String, String> files = EditorSchemas.render(checker.catalogue(),
                installed.rules().stream().map(RuleDefinition::id).toList());
        Files.createDirectories(folder);
        List<Path> written = new java.util.ArrayList<>();
        for (Map.Entry<String, String> file : files.entrySet()) {
            Path path = folder.resolve(file.getKey());
            Files.writeString(path, file.getValue(), StandardCharsets.UTF_8);
            written.add(path);
        }
        return written;
    }
}
