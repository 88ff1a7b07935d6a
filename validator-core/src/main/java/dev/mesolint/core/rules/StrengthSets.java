package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleParameter;
import java.util.List;

/**
 * Which sets the proximity-to-failure checks leave alone: ballistic and Olympic lifts always (their failure is a
 * technical miss, so reps in reserve do not describe them), and, where a profile turns it on, strength-purpose sets:
 * at most {@link #MAX_REPS} reps at {@link #MIN_LOAD} of 1RM or more, the load stated or read from reps and reserve.
 */
final class StrengthSets {
    static final String MAX_REPS = "strength-set-max-reps";
    static final String MIN_LOAD = "strength-set-min-load";

    private StrengthSets() {
    }

    /** The two parameters, for the metadata of a rule that uses {@link #notJudged}; the defaults judge every set. */
    static List<RuleParameter> parameters() {
        return List.of(RuleParameter.integer(MAX_REPS, 0, 0, 12,
                        "Most reps (top of the range) of a set whose purpose is strength and that this rule therefore "
                                + "does not judge; 0 judges every set (the strength and general-fitness profiles "
                                + "use 6)."),
                RuleParameter.percent(MIN_LOAD, 0.60, 0.5, 1.0,
                        "Least share of 1RM of such a set: stated, or read from reps + reserve through the model's "
                                + "%1RM relation (6 reps at RIR 8 is a 14-rep effort, about 64%)."));
    }

    /** Words for a rationale: what the two parameters leave alone. */
    static final String RATIONALE = "Ballistic and Olympic lifts (catalogue ballistic: true) are never judged: their "
            + "sets end at a technical miss, far from muscular failure by design. Under the strength and "
            + "general-fitness profiles, strength-purpose sets are not judged either: at most 6 reps at 60% of 1RM "
            + "or more (the load stated, or read from reps and reserve). Sets of few reps are done for strength "
            + "and skill, not for the growth stimulus of their last reps, and they stay far from failure on "
            + "purpose (NSCA: strength loads of 6 reps or fewer; ACSM 2009: novices start strength training at "
            + "60-70% of 1RM, so a novice linear progression's first fives are light by design). A 3x12 at RIR 6 "
            + "is still judged under every profile.";

    /** True when the set's exercise is ballistic, or the profile leaves strength-purpose sets and this is one. */
    static boolean notJudged(RuleContext context, SetMetrics set) {
        return ballistic(context, set.exerciseId()) || strengthPurpose(context, set);
    }

    static boolean ballistic(RuleContext context, String exerciseId) {
        Exercise exercise = context.exerciseOrNull(exerciseId);
        return exercise != null && exercise.ballistic();
    }

    private static boolean strengthPurpose(RuleContext context, SetMetrics set) {
        double maxReps = context.param(MAX_REPS);
        if (maxReps <= 0 || set.prescription().reps().amrap() || set.prescription().reps().max() > maxReps) {
            return false;
        }
        double share;
        if (set.effort().loadFraction().isPresent()) {
            share = set.effort().loadFraction().getAsDouble();
        } else if (set.effortKnown()) {
            share = Relations.shareFor(context.metrics().parameters().oneRepMaxRelation(),
                    set.reps() + set.rir().getAsDouble());
        } else {
            return false;
        }
        return share >= context.param(MIN_LOAD) - 1e-4;
    }
}
