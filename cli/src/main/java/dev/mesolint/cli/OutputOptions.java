package dev.mesolint.cli;

import dev.mesolint.core.report.ConsoleReport;
import dev.mesolint.core.report.ConsoleStyle;
import dev.mesolint.core.report.ReportFormat;
import dev.mesolint.core.report.ReportTarget;
import java.util.List;
import java.util.Optional;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/**
 * What {@code check} prints on standard output and how: exactly one document there (the console form unless
 * {@code --format} or a {@code --report FORMAT=-} names another), so that it can be piped; quiet; colour.
 */
final class OutputOptions {
    /** {@code --color}: colour the console form on a terminal, always, or never. */
    enum ColorMode {
        AUTO, ALWAYS, NEVER
    }

    /** {@code --progress}: a progress line on standard error on a terminal, always, or never. */
    enum ProgressMode {
        AUTO, ALWAYS, NEVER
    }

    @Option(names = "--format", paramLabel = "FORMAT",
            description = "What standard output carries: console (default), json, sarif, junit or html. With any "
                    + "but console, nothing else is printed there, so the output can be piped.")
    ReportFormat format;

    @Option(names = {"-q", "--quiet"},
            description = "Console form: print only the findings that fail the run, then the caution; nothing when "
                    + "the run is clean.")
    boolean quiet;

    @Option(names = "--color", paramLabel = "WHEN", defaultValue = "auto",
            description = "Colour the console form: auto (on a terminal, unless the NO_COLOR environment variable is "
                    + "set), always or never. Default: ${DEFAULT-VALUE}.")
    ColorMode color;

    @Option(names = "--progress", paramLabel = "WHEN", defaultValue = "auto",
            description = "On runs over a second, keep one line on standard error up to date (files checked of the "
                    + "total, findings so far): auto (on a terminal, unless --quiet), always or never. "
                    + "Default: ${DEFAULT-VALUE}.")
    ProgressMode progress;

    /**
     * The one format standard output carries: {@code --format}, else that of a report sent to {@code -}, else the
     * console form. Two different documents for standard output are a usage error.
     */
    ReportFormat stdoutFormat(List<ReportTarget> reports, CommandLine commandLine) {
        List<ReportFormat> piped = reports.stream().filter(ReportTarget::toStdout).map(ReportTarget::format)
                .distinct().toList();
        Optional<ReportFormat> chosen = Optional.ofNullable(format);
        for (ReportFormat f : piped) {
            if (chosen.isPresent() && chosen.get() != f) {
                throw new CommandLine.ParameterException(commandLine, "standard output can carry one report, not "
                        + chosen.get().id() + " and " + f.id() + "; write the other to a file (--report "
                        + f.id() + "=PATH)");
            }
            chosen = Optional.of(f);
        }
        return chosen.orElse(ReportFormat.CONSOLE);
    }

    /** The progress line these options want, drawn on {@code err}. */
    dev.mesolint.core.engine.RunProgress progress(java.io.PrintWriter err) {
        return ProgressLine.choose(progress, quiet, System.console() != null, err);
    }

    /** The console form as these options want it; {@code showWaived} from the command. */
    ConsoleReport console(boolean showWaived) {
        boolean terminal = System.console() != null;
        return new ConsoleReport(showWaived, quiet, ConsoleStyle.choose(color.name().toLowerCase(java.util.Locale.ROOT),
                terminal, System.getenv("NO_COLOR")));
    }
}
