package dev.mesolint.core.report;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;

/**
 * The shapes beside severities and outcomes, so that none is told by colour alone: a cross for errors, a triangle for
 * warnings, a dot for information, a ring for waived findings; a tick for a programme that passes.
 */
final class HtmlMarks {
    private HtmlMarks() {
    }

    static String glyph(Severity s) {
        return switch (s) {
            case ERROR -> "✖";
            case WARNING -> "▲";
            case INFO, OFF -> "●";
        };
    }

    static String glyph(Finding f) {
        return f.waived() ? "○" : glyph(f.severity());
    }

    /** True when the file has an active finding at or above the run's fail level. */
    static boolean fails(FileReport file, Severity failOn) {
        return file.active().stream().anyMatch(f -> f.severity().atLeast(failOn));
    }
}
