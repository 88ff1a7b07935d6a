package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.MovementPattern;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.List;

/** Compound sets that more work follows get enough rest; squat and hinge sets may be asked for more. */
public final class ShortRestCompoundRule implements Rule {
    public static final String ID = "short-rest-compound";
    static final String MIN_REST = "min-rest";
    static final String MIN_REST_SQUAT_HINGE = "min-rest-squat-hinge";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Rest after a compound set that more work in the session follows is at least 2 min (in the strength "
                    + "profile, 3 min after squat and hinge sets).",
            Severity.WARNING, RuleMetadata.Category.REST,
            List.of(RuleParameter.seconds(MIN_REST, 120, 30, 600,
                            "Shortest rest after a compound set that more work follows."),
                    RuleParameter.seconds(MIN_REST_SQUAT_HINGE, 120, 30, 600,
                            "Shortest rest after a compound set of the squat or hinge pattern.")),
            "A compound set loads several large muscles and the whole body. With short rests the next sets are done "
                    + "with fewer reps or a lighter load, so the same session yields less strength and muscle for "
                    + "the same time under the bar. Rest is judged where the programme writes it: after each set of "
                    + "straight sets, including the last set when another exercise follows; in a superset, the "
                    + "superset's rest after each round plus the changeovers between its items. A set without a "
                    + "written rest is not judged.",
            "ACSM position stand 2009 (Ratamess et al., Med Sci Sports Exerc 41(3):687-708): at least 2-3 min for "
                    + "heavy core lifts; Schoenfeld et al. 2016 (J Strength Cond Res 30(7):1805-1812): 3 min rest "
                    + "gave more strength and thigh muscle thickness than 1 min");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        boolean separate = context.param(MIN_REST_SQUAT_HINGE) != context.param(MIN_REST);
        RestGaps.check(context, e -> e.isCompound() ? limit(e, separate) : null);
    }

    private static RestGaps.Limit limit(Exercise e, boolean separate) {
        boolean squatOrHinge = e.pattern() == MovementPattern.SQUAT || e.pattern() == MovementPattern.HINGE;
        if (!squatOrHinge) {
            return new RestGaps.Limit(MIN_REST, "compound sets");
        }
        return new RestGaps.Limit(MIN_REST_SQUAT_HINGE, separate ? "squat and hinge sets" : "compound sets");
    }
}
