package dev.mesolint.core.report;

import dev.mesolint.core.model.ProgrammeMetrics;
import java.util.Objects;

/**
 * A programme's metrics with the file they came from, as reports list them.
 *
 * @param file the programme file's path, relative to where the tool was run, with forward slashes
 */
public record FileMetrics(String file, ProgrammeMetrics metrics) {
    public FileMetrics {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(metrics, "metrics");
    }
}
