package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.run.CheckRun;
import dev.mesolint.core.run.RunRequest;
import dev.mesolint.core.report.ConsoleReport;
import dev.mesolint.core.report.FileMetrics;
import dev.mesolint.core.report.MetricsCsvWriter;
import dev.mesolint.core.report.MetricsJsonWriter;
import dev.mesolint.core.report.MetricsTableFormatter;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
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

/** {@code mesolint metrics PATH...}: the figures behind the rules, per programme, as a table, JSON or CSV. */
@Command(name = "metrics", mixinStandardHelpOptions = true,
        description = {"Shows what each programme is worth: credited hard sets per muscle and week, stimulating reps, "
                + "stimulus after fatigue and diminishing returns, and session minutes.",
            "The formulas and defaults are described in docs/model.md."},
        footer = {"", ConfigOptions.PRECEDENCE, "", "Caution: " + Mesolint.CAUTION})
final class MetricsCommand implements Callable<Integer> {

    @Parameters(arity = "1..*", paramLabel = "PATH", description = "Programme files or folders.")
    List<Path> paths = new ArrayList<>();

    @Option(names = "--json", paramLabel = "FILE",
            description = "Also write the figures as JSON (per-set detail included; schema docs/schema/metrics.schema.json).")
    Path json;

    @Option(names = "--csv", paramLabel = "FILE", description = "Also write one row per set as CSV, for spreadsheets.")
    Path csv;

    @Mixin
    ConfigOptions options;

    @Mixin
    ConfigOptions.Catalogues catalogues;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** A file to write, its folders created first, as for every output of mesolint. */
    private static Writer newFile(Path file) throws IOException {
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        return Files.newBufferedWriter(file, StandardCharsets.UTF_8);
    }

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        RunReport run;
        try {
            // The same repository configuration and profiles as 'check', so the figures use the same parameters.
            InstalledRules installed = Installed.rules();
            run = CheckRun.run(RunRequest.of(options.toRunOptions(paths, catalogues.files, Optional.empty(),
                    Optional.empty()), paths).withoutBaseline(), installed.rules()).report();
        } catch (ConfigProblem e) {
            return Installed.fail(e, err);
        }
        run.missing().forEach(m -> err.println("mesolint: no such file or folder: " + m));
        List<FileMetrics> measured = new ArrayList<>();
        boolean unreadable = false;
        for (FileReport file : run.files()) {
            if (file.metrics().isPresent()) {
                measured.add(new FileMetrics(file.displayPath(), file.metrics().get()));
            } else {
                unreadable = true;
                file.active().forEach(f -> err.println(ConsoleReport.line(f)));
            }
        }
        new MetricsTableFormatter().write(measured, out);
        if (json != null) {
            try (Writer w = newFile(json)) {
                new MetricsJsonWriter().write(measured, w);
            }
        }
        if (csv != null) {
            try (Writer w = newFile(csv)) {
                new MetricsCsvWriter().write(measured, w);
            }
        }
        out.println("Note: " + Mesolint.CAUTION);
        out.flush();
        if (!run.missing().isEmpty()) {
            return MesolintCommand.EXIT_USAGE;
        }
        return unreadable ? 1 : 0;
    }
}
