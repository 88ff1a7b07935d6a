package dev.mesolint.core.report;

import dev.mesolint.core.engine.FileReport;
import java.util.Optional;

/**
 * The training figures of a run's programmes, for the HTML charts and the JSON {@code metrics}. The training model
 * supplies them; reports that only need findings ignore them.
 */
@FunctionalInterface
public interface ReportFigures {
    /** No figures: reports show findings only. */
    ReportFigures NONE = file -> Optional.empty();

    /** The figures of one checked file; empty when the file did not load or no figures were computed. */
    Optional<ProgrammeFigures> of(FileReport file);

    /** Whether {@link #of} gives figures for {@code file}; implementations that can tell without making them do. */
    default boolean has(FileReport file) {
        return of(file).isPresent();
    }
}
