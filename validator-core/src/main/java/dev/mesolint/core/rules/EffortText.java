package dev.mesolint.core.rules;

import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.source.Location;
import java.util.ArrayList;
import java.util.List;

/** How the model rules quote a set's prescription and where they point for its effort. */
final class EffortText {
    private EffortText() {
    }

    /** {@code 8 reps}, {@code 8-12 reps}, {@code AMRAP}. */
    static String reps(SetPrescription set) {
        if (set.reps().amrap()) {
            return "AMRAP";
        }
        return set.reps() + (set.reps().max() == 1 ? " rep" : " reps");
    }

    /** What the set states about its effort: {@code RIR 2}, {@code RPE 8}, {@code 75% of 1RM}, joined with "and". */
    static String stated(SetPrescription set) {
        List<String> parts = new ArrayList<>();
        set.load().ifPresent(l -> parts.add(l.toString().endsWith("%") ? l + " of 1RM" : l.toString()));
        set.rir().ifPresent(r -> parts.add("RIR " + r));
        set.rpe().ifPresent(r -> parts.add("RPE " + r));
        return String.join(" and ", parts);
    }

    /** {@code 8 reps at 75% of 1RM and RIR 2}; {@code AMRAP} alone when nothing else is stated. */
    static String prescription(SetPrescription set) {
        String stated = stated(set);
        return stated.isEmpty() ? reps(set) : reps(set) + " at " + stated;
    }

    /** The key that gave the model its reserve, for pointing at it. */
    static String effortKey(SetMetrics set) {
        return switch (set.effortSource()) {
            case RIR -> "rir";
            case RPE -> "rpe";
            case LOAD -> "load";
            case AMRAP, UNKNOWN -> "reps";
        };
    }

    /** Where the set's effort was written (inherited from its entry when the set does not state it). */
    static Location effortLocation(RuleContext context, SetMetrics set) {
        return context.fieldLocation(set.prescription(), effortKey(set));
    }
}
