package dev.mesolint.maven;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.report.ConsoleReport;
import java.util.function.Consumer;
import org.apache.maven.plugin.logging.Log;

/**
 * Logs findings in the console form ({@code file:line:column: severity rule-id: message}), at their severity; waived
 * and baselined findings, which never fail the build, at info.
 */
final class FindingLog {
    private final Log log;
    private final boolean showWaived;

    FindingLog(Log log, boolean showWaived) {
        this.log = log;
        this.showWaived = showWaived;
    }

    /** Every finding, then the count line. */
    void write(RunReport run) {
        for (FileReport file : run.files()) {
            for (Finding f : file.findings()) {
                if (f.severity() == Severity.OFF || f.waived() && !showWaived) {
                    continue;
                }
                ConsoleReport.lines(f).forEach(level(f));
            }
        }
        String summary = "mesolint: " + ConsoleReport.summary(run);
        if (run.failed()) {
            log.error(summary);
        } else {
            log.info(summary);
        }
    }

    private Consumer<CharSequence> level(Finding f) {
        if (f.waived() || f.baselined()) {
            return log::info;
        }
        return switch (f.severity()) {
            case ERROR -> log::error;
            case WARNING -> log::warn;
            default -> log::info;
        };
    }
}
