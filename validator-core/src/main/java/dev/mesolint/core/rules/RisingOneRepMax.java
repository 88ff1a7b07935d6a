package dev.mesolint.core.rules;

import dev.mesolint.core.model.OneRepMaxRelation;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.programme.Level;
import dev.mesolint.core.programme.OneRepMaxStep;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.value.Load;
import java.util.List;
import java.util.Optional;

/**
 * Reads an absolute load that the 1RM in force cannot carry for the prescribed reps as a 1RM that has risen since
 * it was stated: the e1RM the set implies, and the gain per week that takes, against what a lifter of the
 * programme's level can plausibly gain.
 *
 * <p>A percentage load is never read this way: the coach wrote the share of the 1RM, so a share too heavy for the
 * reps stays impossible whatever the 1RM is.
 */
final class RisingOneRepMax {
    static final String MAX_GAIN_NOVICE = "max-weekly-gain-novice";
    static final String MAX_GAIN_INTERMEDIATE = "max-weekly-gain-intermediate";
    static final String MAX_GAIN_ADVANCED = "max-weekly-gain-advanced";

    private RisingOneRepMax() {
    }

    /**
     * What one set implies.
     *
     * @param inForce     the 1RM in force for the session, in the programme's unit
     * @param implied     the e1RM the set as written needs (its top reps plus its least stated reserve, to failure)
     * @param statedWeek  the week the 1RM in force was stated for (or tested before)
     * @param statedDay   the day in that week it applies from
     * @param weeks       weeks from then to the set's session (days count as sevenths); 0 in that very session
     * @param gainPerWeek the rise of the 1RM per week as a share of the 1RM in force; infinite when weeks is 0
     * @param bound       the most the programme's level gains per week
     */
    record Reading(double inForce, double implied, int statedWeek, int statedDay, double weeks, double gainPerWeek,
            double bound) {
        boolean plausible() {
            return gainPerWeek <= bound;
        }

        double gain() {
            return implied / inForce - 1;
        }
    }

    /**
     * The bounds per level: the most a lifter's 1RM rises per week, so that an absolute load past the stated 1RM
     * reads as a 1RM out of date, not an impossible set.
     */
    static List<RuleParameter> parameters() {
        return List.of(RuleParameter.percent(MAX_GAIN_NOVICE, 0.10, 0.005, 0.5,
                        "Most a novice's 1RM rises per week (share of the 1RM in force) for a load past it to read as "
                                + "a 1RM out of date (info) instead of an impossible set (error)."),
                RuleParameter.percent(MAX_GAIN_INTERMEDIATE, 0.05, 0.005, 0.5,
                        "The same bound for an intermediate lifter."),
                RuleParameter.percent(MAX_GAIN_ADVANCED, 0.025, 0.005, 0.5,
                        "The same bound for an advanced lifter."));
    }

    /** Words for the rule's rationale and source. */
    static final String RATIONALE = "An absolute load past what the stated 1RM allows for the prescribed reps is "
            + "read first as a 1RM that has risen since it was stated: the set implies an e1RM (the configured "
            + "relation, from the top of the rep range plus the least reserve stated), and the gain per week since "
            + "the 1RM was stated (or tested) is compared with what a lifter of the programme's level gains: up to "
            + "10% a week for a novice, 5% for an intermediate, 2.5% for an advanced lifter. Within that, the "
            + "finding is an info, 1RM out of date, asking for a per-week 1RM or a test; beyond it, or in the "
            + "session the 1RM was stated for, the set is impossible as written (error). A percentage load too "
            + "heavy for its reps is always an error.";

    static final String SOURCE = "weekly 1RM gain bounds: common practice, from memory (a novice linear progression "
            + "adds 2.5-5 kg a session three times a week, about 5-10% of the 1RM a week; intermediates progress "
            + "week to week, advanced lifters month to month; ACSM 2009 load increments of 2-10%)";

    /** The reading for an infeasible set with an absolute load and a known 1RM; empty for any other set. */
    static Optional<Reading> of(RuleContext context, int week, int day, SetMetrics set, OneRepMaxRelation relation) {
        if (!(set.prescription().load().orElse(null) instanceof Load.Absolute)
                || set.effort().loadFraction().isEmpty() || set.effort().absoluteLoad().isEmpty()) {
            return Optional.empty();
        }
        double weight = set.effort().absoluteLoad().getAsDouble();
        double inForce = weight / set.effort().loadFraction().getAsDouble();
        double repsToFailure = set.prescription().reps().max() + EffortConflictRule.leastStated(set.prescription());
        double implied = relation.oneRepMax(weight, Math.min(36, Math.max(1, repsToFailure)));
        if (implied <= inForce) {
            return Optional.empty();
        }
        int[] stated = statedAt(context, set.exerciseId(), week, day);
        double weeks = Math.max(0, (week - stated[0]) + (day - stated[1]) / 7.0);
        double gain = implied / inForce - 1;
        double perWeek = weeks == 0 ? Double.POSITIVE_INFINITY : gain / weeks;
        return Optional.of(new Reading(inForce, implied, stated[0], stated[1], weeks, perWeek,
                bound(context, context.programme().info().level())));
    }

    private static double bound(RuleContext context, Level level) {
        return context.param(switch (level) {
            case NOVICE -> MAX_GAIN_NOVICE;
            case INTERMEDIATE -> MAX_GAIN_INTERMEDIATE;
            case ADVANCED -> MAX_GAIN_ADVANCED;
        });
    }

    /** Week and day from which the 1RM in force applies: its step, else the start of the block. */
    private static int[] statedAt(RuleContext context, String exerciseId, int week, int day) {
        int[] at = {context.programme().weeks().stream().mapToInt(Week::number).min().orElse(1), 1};
        for (OneRepMaxStep step : context.programme().athlete().steps(exerciseId)) {
            if (step.week() < week || (step.week() == week && step.day() <= day)) {
                at = new int[] {step.week(), step.day()};
            }
        }
        return at;
    }
}
