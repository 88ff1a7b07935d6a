package dev.mesolint.core.rule;

import dev.mesolint.core.catalogue.Muscle;
import java.util.OptionalDouble;

/**
 * A rule that bounds a muscle's weekly hard sets. Reports draw its bounds on their volume charts, so a chart shows
 * the lines the rules check against, for built-in rules and rule packs alike, without naming a rule class.
 */
public interface WeeklyVolumeLimit {

    /** The fewest weekly hard sets this rule asks of {@code muscle} under {@code settings}, if it sets a floor. */
    default OptionalDouble weeklyFloor(RuleSettings settings, Muscle muscle) {
        return OptionalDouble.empty();
    }

    /** The most weekly hard sets this rule allows {@code muscle} under {@code settings}, if it sets a cap. */
    default OptionalDouble weeklyCap(RuleSettings settings, Muscle muscle) {
        return OptionalDouble.empty();
    }
}
