package dev.mesolint.core.report;

import java.nio.file.Path;
import java.util.Objects;

/**
 * A report to write: its format and its file, as given on the command line ({@code sarif=target/mesolint.sarif}).
 */
public record ReportTarget(ReportFormat format, Path path) {
    /** The path that stands for standard output, as in most command-line tools. */
    public static final String STDOUT = "-";

    public ReportTarget {
        Objects.requireNonNull(format, "format");
        Objects.requireNonNull(path, "path");
    }

    /**
     * Reads {@code FORMAT=PATH}.
     *
     * @throws IllegalArgumentException with a message fit for the user when the text is not of that form
     */
    public static ReportTarget parse(String text) {
        int eq = text == null ? -1 : text.indexOf('=');
        if (eq <= 0 || eq == text.length() - 1) {
            throw new IllegalArgumentException("a report is written FORMAT=PATH, e.g. sarif=target/mesolint.sarif, not '"
                    + text + "'");
        }
        String name = text.substring(0, eq);
        ReportFormat format = ReportFormat.parse(name).orElseThrow(() -> new IllegalArgumentException(
                "unknown report format '" + name + "'; use one of " + ReportFormat.names()));
        return new ReportTarget(format, Path.of(text.substring(eq + 1)));
    }

    /** True when the report goes to standard output: {@code -}, or {@code /dev/stdout} (which cannot be renamed over). */
    public boolean toStdout() {
        String p = path.toString();
        return p.equals(STDOUT) || p.equals("/dev/stdout");
    }

    @Override
    public String toString() {
        return format.id() + "=" + path;
    }
}
