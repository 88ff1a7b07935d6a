package dev.mesolint.core.report;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * The figures of one programme that reports chart: per week and muscle the credited hard sets (against the profile's
 * floor and cap), per session the stimulus before and after the fatigue discount, and the session minutes against the
 * programme's budget.
 */
public interface ProgrammeFigures {

    /** The programme file's path as findings show it ({@code FileReport.displayPath()}). */
    String file();

    /** The programme's {@code id}. */
    String programmeId();

    /** The expanded weeks, in order. */
    List<WeekFigures> weeks();

    /** The weekly hard-set floor and cap for {@code muscle} under the file's profile. */
    VolumeBounds weeklySetBounds(String muscle);

    /** The planned session length in minutes ({@code session-minutes}), when the programme gives one. */
    OptionalDouble sessionBudgetMinutes();

    /** Every muscle credited in any week, in first-seen order. */
    default List<String> muscles() {
        Set<String> all = new LinkedHashSet<>();
        weeks().forEach(w -> all.addAll(w.muscles().keySet()));
        return List.copyOf(all);
    }
}
