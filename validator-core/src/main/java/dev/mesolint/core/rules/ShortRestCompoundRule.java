package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.MovementPattern;
import dev.mesolint.core.catalogue.Role;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.List;

/**
 * Compound sets that more work follows get enough rest, by the entry's role: main lifts (squat and hinge ones may be
 * asked for more) and power work, or assistance work.
 */
public final class ShortRestCompoundRule implements Rule {
    public static final String ID = "short-rest-compound";
    static final String MIN_REST = "min-rest";
    static final String MIN_REST_SQUAT_HINGE = "min-rest-squat-hinge";
    static final String MIN_REST_ASSISTANCE = "min-rest-assistance";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Rest after a compound set that more work in the session follows is at least {min-rest} after main "
                    + "lifts and power work, {min-rest-squat-hinge} after main squat and hinge lifts and "
                    + "{min-rest-assistance} after assistance work.",
            Severity.WARNING, RuleMetadata.Category.REST,
            List.of(RuleParameter.seconds(MIN_REST, 120, 30, 600,
                            "Shortest rest after a compound set of a main lift (or ballistic power work) that more "
                                    + "work follows."),
                    RuleParameter.seconds(MIN_REST_SQUAT_HINGE, 120, 30, 600,
                            "Shortest rest after a main lift of the squat or hinge pattern (ballistic lifts excepted: "
                                    + "they take min-rest)."),
                    RuleParameter.seconds(MIN_REST_ASSISTANCE, 120, 30, 600,
                            "Shortest rest after a compound set of assistance work (role: assistance, written or "
                                    + "the catalogue's default).")),
            "A compound set loads several large muscles and the whole body. With short rests the next sets are done "
                    + "with fewer reps or a lighter load, so the same session yields less strength and muscle for "
                    + "the same time under the bar. How much rest is enough depends on the set's job: the ACSM "
                    + "progression models ask 2-3 min or more for heavy core lifts and power work and 1-2 min for "
                    + "assistance work, and the NSCA's rest table gives 2-5 min for strength and power sets. An "
                    + "entry's role is written on it (role: main or role: assistance) or comes from the catalogue: "
                    + "main for ballistic lifts and high-skill compounds (squats, deadlifts, Olympic lifts), "
                    + "assistance otherwise, so a goblet or banded squat after the back squat is assistance. The "
                    + "hypertrophy profile asks 2 min after every compound set, where more rest gave more growth "
                    + "(Schoenfeld et al. 2016; Singer et al. 2024). Rest is judged where the programme writes it: "
                    + "after each set of straight sets, including the last set when another exercise follows; in a "
                    + "superset, the superset's rest after each round plus the changeovers between its items (15 s for "
                    + "one not written), as the session plan of docs/model.md runs it. A set or superset without a "
                    + "written rest is not judged.",
            "ACSM position stand 2009 (Ratamess et al., Med Sci Sports Exerc 41(3):687-708): 2-3 min or more for "
                    + "heavy core lifts and power work, 1-2 min for assistance exercises; Haff & Triplett 2016, NSCA "
                    + "Essentials 4th ed., Ch. 17 (rest by goal: strength and power 2-5 min); Schoenfeld et al. 2016 "
                    + "(J Strength Cond Res 30(7):1805-1812): 3 min rest gave more strength and thigh muscle "
                    + "thickness than 1 min; Singer et al. 2024 (meta-analysis): a small benefit of rests over about "
                    + "60-90 s for growth");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        boolean separateSquatHinge = context.param(MIN_REST_SQUAT_HINGE) != context.param(MIN_REST);
        boolean separateAssistance = context.param(MIN_REST_ASSISTANCE) != context.param(MIN_REST);
        RestCheck.check(context, (work, e) -> e.isCompound() || e.ballistic()
                ? limit(work, e, separateSquatHinge, separateAssistance) : null);
    }

    private static RestCheck.Limit limit(ExerciseWork work, Exercise e, boolean separateSquatHinge,
            boolean separateAssistance) {
        if (work.role(e) == Role.ASSISTANCE) {
            return new RestCheck.Limit(MIN_REST_ASSISTANCE, separateAssistance ? "assistance compound sets"
                    : "compound sets");
        }
        // Power work (cleans, snatches, jumps) rests as a main lift, not as a heavy squat or pull: 2-5 min (NSCA).
        boolean squatOrHinge = !e.ballistic()
                && (e.pattern() == MovementPattern.SQUAT || e.pattern() == MovementPattern.HINGE);
        if (!squatOrHinge) {
            return new RestCheck.Limit(MIN_REST, separateAssistance ? "main-lift sets" : "compound sets");
        }
        return new RestCheck.Limit(MIN_REST_SQUAT_HINGE, separateSquatHinge ? "main squat and hinge sets"
                : separateAssistance ? "main-lift sets" : "compound sets");
    }
}
