package dev.mesolint.core.report;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.text.SafeText;
import java.io.PrintWriter;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;

/**
 * The console form: one finding per line as {@code path:line:column: severity rule-id: message}, the fix on the
 * next line, then a summary and the caution. Editors and CI log parsers read the first line's form. Findings held
 * by the baseline are shown on one line marked {@code baselined}, without their fix, and are not counted.
 */
public final class ConsoleReport implements ReportWriter {
    private final boolean showWaived;

    public ConsoleReport(boolean showWaived) {
        this.showWaived = showWaived;
    }

    @Override
    public void write(ReportInput input, Writer out) {
        write(input.run(), out instanceof PrintWriter p ? p : new PrintWriter(out));
    }

    public void write(RunReport run, PrintWriter out) {
        for (FileReport file : run.files()) {
            for (Finding f : file.findings()) {
                if (f.waived() && !showWaived || f.severity() == Severity.OFF) {
                    continue;
                }
                lines(f).forEach(out::println);
            }
        }
        out.println(summary(run));
        out.println("Note: " + Mesolint.CAUTION);
        out.flush();
    }

    /** The finding's first line; text from input is escaped ({@link SafeText#line}) so it cannot forge a line. */
    public static String line(Finding f) {
        return SafeText.line(f.file()) + ":" + f.location().line() + ":" + f.location().column() + ": "
                + (f.waived() ? "waived " : f.baselined() ? "baselined " : "") + f.severity().label() + " "
                + f.ruleId() + ": " + SafeText.line(f.message());
    }

    /**
     * A finding as printed: its {@link #line}, then the fix and the waiver's reason when waived; a baselined finding
     * is its line alone.
     */
    public static List<String> lines(Finding f) {
        List<String> lines = new ArrayList<>();
        lines.add(line(f));
        if (f.baselined() && !f.waived()) {
            return lines;
        }
        lines.add("    fix: " + SafeText.line(f.fix()));
        f.waiver().ifPresent(w -> lines.add("    waived at line " + w.location().line() + ": "
                + SafeText.line(w.reason())));
        return lines;
    }

    /** The closing count line, e.g. {@code 4 files checked: 1 error, 0 warnings, 0 info, 0 waived -> FAILED ...}. */
    public static String summary(RunReport run) {
        long files = run.files().size();
        long baselined = run.baselinedCount();
        return String.format("%d file%s checked: %d error%s, %d warning%s, %d info, %d waived%s%s", files,
                files == 1 ? "" : "s", run.count(Severity.ERROR), run.count(Severity.ERROR) == 1 ? "" : "s",
                run.count(Severity.WARNING), run.count(Severity.WARNING) == 1 ? "" : "s", run.count(Severity.INFO),
                run.waivedCount(), baselined == 0 ? "" : ", " + baselined + " baselined",
                run.failed() ? " -> FAILED (fail level: " + run.failOn().label() + ")" : "");
    }
}
