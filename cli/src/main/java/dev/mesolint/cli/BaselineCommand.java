package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.baseline.Baseline;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.ProgrammeFiles;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.run.CheckRun;
import dev.mesolint.core.run.RunRequest;
import dev.mesolint.core.run.RunResult;
import java.io.IOException;
import java.io.PrintWriter;
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
        description = {"Checks the programmes and writes their active warnings and info findings to a baseline "
                + "file (JSON); errors only with --include-errors.",
            "'mesolint check' with that baseline shows those findings as baselined and fails only on new ones.",
            "Findings match by rule, programme id, place (written weeks by their order, sessions by day, "
                    + "exercises by id) and subject, never by line or message: moving lines or the file, renaming "
                    + "a session, rewording, a changed limit or an added repeat week keep them matched. Files that "
                    + "do not load are never covered."},
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

    @Option(names = "--include-errors",
            description = "Record errors too (a load over an athlete's cap, an unknown exercise). Without it, errors "
                    + "are left out and keep failing 'mesolint check'.")
    boolean includeErrors;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        try {
            InstalledRules installed = Installed.rules();
            // Recorded as found: a baseline is never compared with itself.
            RunResult result = CheckRun.run(RunRequest.of(options.toRunOptions(paths, catalogues.files,
                    Optional.empty(), Optional.empty()), paths).withoutBaseline().withFigures(false), installed.rules());
            Workspace workspace = result.workspace();
            RunReport report = result.report();
            if (!report.missing().isEmpty()) {
                report.missing().forEach(m -> spec.commandLine().getErr().println(
                        "mesolint: no such file or folder: " + m));
                return MesolintCommand.EXIT_USAGE;
            }
            Path file = output != null ? output
                    : workspace.baselineFile().orElse(workspace.root().resolve(DEFAULT_FILE));
            Baseline.Recorded recorded = Baseline.record(report, includeErrors);
            Baseline baseline = recorded.baseline();
            baseline.write(file);
            PrintWriter out = spec.commandLine().getOut();
            out.printf("Wrote %d finding%s from %d file%s to %s%n", baseline.size(),
                    baseline.size() == 1 ? "" : "s", report.files().size(), report.files().size() == 1 ? "" : "s",
                    ProgrammeFiles.display(workspace.root(), file));
            if (recorded.errorsLeftOut() > 0) {
                out.printf("Left out %d error%s: they keep failing 'mesolint check'. Fix them, or record them with "
                        + "--include-errors if the team accepts them.%n", recorded.errorsLeftOut(),
                        recorded.errorsLeftOut() == 1 ? "" : "s");
            }
            if (recorded.unloadedLeftOut() > 0) {
                out.printf("Left out %d finding%s of files that did not load (yaml-syntax, schema, internal-error): "
                        + "a baseline never covers such a file; fix it so that it is checked.%n",
                        recorded.unloadedLeftOut(), recorded.unloadedLeftOut() == 1 ? "" : "s");
            }
            out.flush();
            return 0;
        } catch (ConfigProblem e) {
            return Installed.fail(e, spec.commandLine().getErr());
        }
    }
}
