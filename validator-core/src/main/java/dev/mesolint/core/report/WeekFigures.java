package dev.mesolint.core.report;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * One week's figures.
 *
 * @param muscles per muscle name (as the catalogue writes it, e.g. {@code side-delts}), in display order
 */
public record WeekFigures(int week, boolean deload, Map<String, MuscleWeek> muscles, List<SessionFigures> sessions) {

    public WeekFigures {
        muscles = Collections.unmodifiableMap(new LinkedHashMap<>(muscles));
        sessions = List.copyOf(sessions);
    }

    /** The week's hard sets for {@code muscle}; 0 when not trained. */
    public double hardSets(String muscle) {
        MuscleWeek m = muscles.get(muscle);
        return m == null ? 0 : m.hardSets();
    }
}
