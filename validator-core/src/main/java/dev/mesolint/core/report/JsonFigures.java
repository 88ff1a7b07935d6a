package dev.mesolint.core.report;

import dev.mesolint.core.engine.FileReport;
import java.util.Optional;
import tools.jackson.databind.node.ObjectNode;

/** What the JSON report shows of each file's programme and figures, wherever the run holds them. */
interface JsonFigures {
    /** The {@code programme} object of {@code file}'s entry in {@code files}. */
    Optional<ObjectNode> programme(FileReport file);

    /** {@code file}'s object of the {@code metrics} list. */
    Optional<ObjectNode> metrics(FileReport file);

    /** Whether {@code file} has a {@code metrics} object, without making it. */
    boolean hasMetrics(FileReport file);

    /** The figures packed as the run went ({@link PackedFigures}), else made now from each file's model. */
    static JsonFigures of(ReportFigures figures) {
        if (figures instanceof JsonFigures packed) {
            return packed;
        }
        return new JsonFigures() {
            @Override
            public Optional<ObjectNode> programme(FileReport file) {
                return file.programme().map(JsonReport::programme);
            }

            @Override
            public Optional<ObjectNode> metrics(FileReport file) {
                return figures.of(file).map(JsonReport::metrics);
            }

            @Override
            public boolean hasMetrics(FileReport file) {
                return figures.has(file);
            }
        };
    }
}
