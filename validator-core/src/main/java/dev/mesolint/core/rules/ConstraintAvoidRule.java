package dev.mesolint.core.rules;

import dev.mesolint.core.finding.ConstraintReasons;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.AthleteConstraint;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.yaml.Pointers;
import java.util.List;

/** Exercises that the athlete's constraints exclude. */
public final class ConstraintAvoidRule implements Rule {
    public static final String ID = "constraint-avoid";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "An exercise that the athlete's constraints exclude (athlete.constraints[].avoid).", Severity.ERROR,
            RuleMetadata.Category.SAFETY, List.of(),
            "A constraint records a decision by the athlete's clinician or coach, with its reason; programming the "
                    + "excluded exercise anyway goes against it. The finding names the constraint and its reason. "
                    + "Whether and when the exercise can return is for the athlete's clinician to decide, not for "
                    + "this tool or a waiver written without them.",
            "common practice: follow the restrictions set by the athlete's physician or physiotherapist");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        List<AthleteConstraint> constraints = context.programme().athlete().constraints();
        if (constraints.isEmpty()) {
            return;
        }
        Occurrences found = new Occurrences();
        ExerciseVisits.each(context.programme(), (week, session, work, superset) -> {
            for (AthleteConstraint c : constraints) {
                if (c.avoid().contains(work.exerciseId())) {
                    found.add(week, session, work.exerciseId(), work.exerciseLocation(), work.waivers(),
                            Occurrences.Step.NONE, "the athlete's constraint " + Pointers.readable(
                                    c.location().pointer()) + " excludes this exercise " + ConstraintReasons.MARK
                                    + c.reason() + ")", "remove it or swap it for an exercise the athlete's clinician has cleared; "
                                            + "their advice comes before any general guidance");
                }
            }
        });
        found.report(context);
    }
}
