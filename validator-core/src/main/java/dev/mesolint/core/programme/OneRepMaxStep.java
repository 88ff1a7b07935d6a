package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Load;
import java.util.Optional;

/**
 * A point in the block from which one 1RM of an exercise is in force: a value stated for a week
 * ({@code one-rep-max} with {@code from-week}), or a 1RM test in a session, whose result the programme cannot know.
 *
 * @param week  the first week the 1RM applies to
 * @param day   the first day in that week it applies to: 1 for a stated value, the day after the test for a test
 * @param value the stated 1RM; empty after a test until a later entry states one
 */
public record OneRepMaxStep(int week, int day, Optional<Load.Absolute> value, boolean tested, Location location) {

    /** True when this step is in force at {@code week}, {@code day} or before it. */
    boolean startsBy(int atWeek, int atDay) {
        return week < atWeek || (week == atWeek && day <= atDay);
    }
}
