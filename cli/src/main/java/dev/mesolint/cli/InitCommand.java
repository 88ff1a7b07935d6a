package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.config.ConfigProblem;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code mesolint init [DIR]}: a programme repository to start from, with one clean sample. */
@Command(name = "init", mixinStandardHelpOptions = true,
        description = {"Creates a programme repository in DIR (default: the current folder): .mesolint.yaml, a team "
                + "profile extending general-fitness, a catalogue file, programmes/ with one sample, a pom.xml "
                + "using the Maven plugin, a CI job script and local editor schemas (.mesolint/schema/).",
            "Existing files are never overwritten unless --force is given.",
            "The sample belongs to the fictional Harbourside Strength Club; replace it with your own."},
        footer = {"", "Exit codes: 0 created, 2 a file already exists or cannot be written.", "",
            "Caution: " + Mesolint.CAUTION})
final class InitCommand implements Callable<Integer> {
    /** Template resource (without leading dots, which resource copying may drop) to the file it becomes. */
    static final Map<String, String> FILES = files();
    private static final String TEMPLATES = "/dev/mesolint/cli/init/";

    @Parameters(arity = "0..1", paramLabel = "DIR", defaultValue = ".",
            description = "The folder to create the repository in; created when missing.")
    Path dir;

    @Option(names = "--force", description = "Overwrite files that already exist.")
    boolean force;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    private static Map<String, String> files() {
        Map<String, String> files = new LinkedHashMap<>();
        files.put("mesolint.yaml", ".mesolint.yaml");
        files.put("mesolint/profiles/club.yaml", ".mesolint/profiles/club.yaml");
        files.put("mesolint/catalogue/club-exercises.yaml", ".mesolint/catalogue/club-exercises.yaml");
        files.put("programmes/harbourside-starter.yaml", "programmes/harbourside-starter.yaml");
        files.put("pom.xml", "pom.xml");
        files.put("ci/check-programmes.sh", "ci/check-programmes.sh");
        files.put("gitignore", ".gitignore");
        return files;
    }

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        List<String> existing = FILES.values().stream().filter(f -> Files.exists(dir.resolve(f))).toList();
        if (!existing.isEmpty() && !force) {
            err.println("mesolint: init would overwrite " + String.join(", ", existing) + " in " + dir
                    + "; choose an empty folder, or pass --force to replace them");
            return MesolintCommand.EXIT_USAGE;
        }
        for (Map.Entry<String, String> file : FILES.entrySet()) {
            Path target = dir.resolve(file.getValue());
            Files.createDirectories(target.toAbsolutePath().getParent());
            Files.writeString(target, template(file.getKey()), StandardCharsets.UTF_8);
            if (target.toString().endsWith(".sh")) {
                target.toFile().setExecutable(true);
            }
            out.println("created " + file.getValue());
        }
        ConfigOptions repository = new ConfigOptions();
        repository.root = dir;
        try {
            for (Path schema : SchemaCommand.write(repository, List.of(), dir.resolve(".mesolint/schema"), err)) {
                out.println("created " + dir.relativize(schema).toString().replace('\\', '/'));
            }
        } catch (ConfigProblem e) {
            return Installed.fail(e, err);
        }
        out.println();
        out.println("Next: mesolint check " + dir.resolve("programmes").normalize()
                + "   (or 'mvn verify' in " + dir.normalize() + " once the mesolint Maven plugin is installed: "
                + "see the README's 'In a Maven build')");
        out.println("Caution: " + Mesolint.CAUTION);
        out.flush();
        return 0;
    }

    private static String template(String name) throws IOException {
        try (InputStream in = InitCommand.class.getResourceAsStream(TEMPLATES + name)) {
            if (in == null) {
                throw new IllegalStateException("the init template " + name + " is missing from the jar");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).replace("@MESOLINT_VERSION@",
                    Mesolint.version()).replace("@RULES_VERSION@", Mesolint.RULE_SET_VERSION);
        }
    }
}
