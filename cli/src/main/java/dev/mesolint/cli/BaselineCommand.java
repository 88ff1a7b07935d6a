package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.baseline.Baseline;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.ProgrammeFiles;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.engine.Workspace;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code mesolint baseline PATH...}: records today's findings so that later checks fail only on new ones. */
@Command(name = "baseline", mixinStandardHelpOptions = true,
        description = {"Checks the programmes and writes every active finding to a baseline file (JSON).",
            "'mesolint check' with that baseline shows those findings as baselined and fails only on new ones.",
            "Findings match by rule, file, YAML path and message, not by line: edits that only move lines keep "
                    + "them matched."},
        footer = {"", ConfigOptions.PRECEDENCE, "",
            "Exit codes: 0 written, 2 usage, configuration or internal error.", "", "Caution: " + Mesolint.CAUTION})
final class BaselineCommand implements Callable<Integer> {
    static final String DEFAULT_FILE = ".mesolint-baseline.json";

    @Parameters(arity = "1..*", paramLabel = "PATH", description = "Programme files or folders.")
    List<Path> paths = new ArrayList<>();

    @Mixin
    ConfigOptions options;

    @Mixin
    ConfigOptions.Catalogues catalogues;

    @Option(names = "--output", paramLabel = "FILE",
            description = "Where to write (default: baseline in the configuration, else " + DEFAULT_FILE
                    + " in the root).")
    Path output;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        try {
            InstalledRules installed = Installed.rules();
            Workspace workspace = Workspace.open(options.toRunOptions(paths, catalogues.files, Optional.empty(), Optional.empty()),
                    installed.rules());
            RunReport report = new Checker(workspace.request(paths), installed.rules()).run();
            if (!report.missing().isEmpty()) {
                report.missing().forEach(m -> spec.commandLine().getErr().println(
                        "mesolint: no such file or folder: " + m));
                return MesolintCommand.EXIT_USAGE;
            }
            Path file = output != null ? output
                    : workspace.baselineFile().orElse(workspace.root().resolve(DEFAULT_FILE));
            Baseline baseline = Baseline.of(report);
            baseline.write(file);
            spec.commandLine().getOut().printf("Wrote %d finding%s from %d file%s to %s%n", baseline.size(),
                    baseline.size() == 1 ? "" : "s", report.files().size(), report.files().size() == 1 ? "" : "s",
                    ProgrammeFiles.display(workspace.root(), file));
            spec.commandLine().getOut().flush();
            return 0;
        } catch (ConfigProblem e) {
            return Installed.fail(e, spec.commandLine().getErr());
        }
    }
}
