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
 *
 * <p>Quiet, only the findings that fail the run are printed, then the caution; a clean run prints nothing.
 */
public final class ConsoleReport implements ReportWriter {
    private final boolean showWaived;
    private final boolean quiet;
    private final ConsoleStyle style;

    public ConsoleReport(boolean showWaived) {
        this(showWaived, false, ConsoleStyle.PLAIN);
    }

    public ConsoleReport(boolean showWaived, boolean quiet, ConsoleStyle style) {
        this.showWaived = showWaived;
        this.quiet = quiet;
        this.style = style;
    }

    @Override
    public void write(ReportInput input, Writer out) {
        write(input.run(), out instanceof PrintWriter p ? p : new PrintWriter(out));
    }

    public void write(RunReport run, PrintWriter out) {
        boolean printed = false;
        for (FileReport file : run.files()) {
            for (Finding f : file.findings()) {
                if (!shown(f, run)) {
                    continue;
                }
                List<String> lines = lines(f);
                out.println(styled(f, lines.get(0)));
                lines.subList(1, lines.size()).forEach(l -> out.println(style.detail(l)));
                printed = true;
            }
        }
        if (!quiet) {
            out.println(summary(run));
        }
        if (!quiet || printed) {
            out.println("Note: " + Mesolint.CAUTION);
        }
        out.flush();
    }

    private boolean shown(Finding f, RunReport run) {
        if (f.severity() == Severity.OFF) {
            return false;
        }
        if (quiet) {
            return !f.waived() && !f.baselined() && f.severity().atLeast(run.failOn());
        }
        return !f.waived() || showWaived;
    }

    /** The first line with the path and the severity word styled; the text is that of {@link #line}. */
    private String styled(Finding f, String line) {
        if (style == ConsoleStyle.PLAIN) {
            return line;
        }
        String word = (f.waived() ? "waived " : f.baselined() ? "baselined " : "") + f.severity().label();
        String place = ":" + f.location().line() + ":" + f.location().column() + ": ";
        int pathEnd = line.indexOf(place + word);
        if (pathEnd < 0) {
            return line;
        }
        int wordStart = pathEnd + place.length();
        int wordEnd = wordStart + word.length();
        return style.path(line.substring(0, pathEnd + place.length() - 2)) + ": "
                + style.severity(f.severity(), f.waived() || f.baselined(), word) + line.substring(wordEnd);
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

    /**
     * The closing count line, e.g. {@code 4 files checked: 1 error, 0 warnings, 0 info, 0 waived -> FAILED ...}; with
     * a baseline, what it still accepts by severity: {@code , 3 baselined (1 error, 2 warnings)}.
     */
    public static String summary(RunReport run) {
        long files = run.files().size();
        return String.format("%d file%s checked: %s, %d waived%s%s", files, files == 1 ? "" : "s",
                count(run.count(Severity.ERROR), Severity.ERROR) + ", "
                        + count(run.count(Severity.WARNING), Severity.WARNING) + ", "
                        + count(run.count(Severity.INFO), Severity.INFO), run.waivedCount(), baselined(run),
                run.failed() ? " -> FAILED (fail level: " + run.failOn().label() + ")" : "");
    }

    /** {@code , 3 baselined (1 error, 2 warnings)}; {@code , 0 baselined} with a baseline that holds nothing here. */
    private static String baselined(RunReport run) {
        long baselined = run.baselinedCount();
        if (baselined == 0) {
            return run.baselineApplied() ? ", 0 baselined" : "";
        }
        List<String> parts = new ArrayList<>();
        for (Severity s : List.of(Severity.ERROR, Severity.WARNING, Severity.INFO)) {
            long n = run.baselinedCount(s);
            if (n > 0) {
                parts.add(count(n, s));
            }
        }
        return ", " + baselined + " baselined (" + String.join(", ", parts) + ")";
    }

    /** {@code 1 error}, {@code 2 warnings}, {@code 3 info}. */
    private static String count(long n, Severity severity) {
        return n + " " + severity.label() + (n == 1 || severity == Severity.INFO ? "" : "s");
    }
}
