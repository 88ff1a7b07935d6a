package dev.mesolint.core.report;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/** The forms a run can be reported in; each has exactly one writer. */
public enum ReportFormat {
    /** The terminal form: one finding per line, a summary and the caution. */
    CONSOLE,
    /** One JSON document with the findings and, when available, the training figures. */
    JSON,
    /** SARIF 2.1.0 for code-scanning dashboards. */
    SARIF,
    /** JUnit XML for CI test views: one suite per file, one case per rule. */
    JUNIT,
    /** One self-contained HTML page with charts, for coaches. */
    HTML,
    /** The athlete's sheet: the prescription with worked-out loads only, a week per printed page. */
    HTML_SHEET;

    /** The name used on the command line and in build configuration: {@code sarif}, {@code html-sheet}. */
    public String id() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** A new writer for this format; {@code destination} is where the report will be written (for relative links). */
    public ReportWriter writer(Path destination) {
        return switch (this) {
            case CONSOLE -> new ConsoleReport(true);
            case JSON -> new JsonReport();
            case SARIF -> new SarifReport();
            case JUNIT -> new JunitReport();
            case HTML -> new HtmlReport(destination == null ? null : destination.toAbsolutePath().getParent());
            case HTML_SHEET -> new HtmlSheet();
        };
    }

    public static Optional<ReportFormat> parse(String text) {
        return Arrays.stream(values()).filter(f -> f.id().equalsIgnoreCase(text == null ? "" : text.trim()))
                .findFirst();
    }

    /** The accepted names, for usage messages: {@code console, json, sarif, junit, html, html-sheet}. */
    public static String names() {
        return Arrays.stream(values()).map(ReportFormat::id).collect(Collectors.joining(", "));
    }
}
