package dev.mesolint.core.run;

import dev.mesolint.core.report.ReportFormat;
import dev.mesolint.core.report.RunReports;
import java.util.Collection;
import java.util.Set;

/**
 * Which of a run's reports show the training figures, and so what each checked file keeps of its model until the
 * reports are written.
 */
public enum FigureUse {
    /** No report shows figures: each file's model is dropped once its rules ran. */
    NONE,
    /**
     * Only the JSON report does: each file's figures are packed as it is checked (a few KB a programme) and the model
     * dropped, so a JSON report of 10,000 programmes fits a small heap.
     */
    JSON,
    /** The HTML report does (charts and prescriptions read the whole model): every file keeps its model. */
    ALL;

    /** The use of the reports in {@code formats} (the report files and standard output together). */
    public static FigureUse of(Collection<ReportFormat> formats) {
        Set<ReportFormat> shown = formats.stream().filter(RunReports::needsFigures)
                .collect(java.util.stream.Collectors.toSet());
        if (shown.isEmpty()) {
            return NONE;
        }
        return shown.equals(Set.of(ReportFormat.JSON)) ? JSON : ALL;
    }
}
