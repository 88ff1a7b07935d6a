package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Skill;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.AgreementStatus;
import dev.mesolint.core.model.EffortSource;
import dev.mesolint.core.model.OneRepMaxRelation;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.programme.Level;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.value.Load;
import java.util.List;

/** A novice lifting a high-skill exercise at heavy loads. */
public final class NoviceHeavyComplexRule implements Rule {
    public static final String ID = "novice-heavy-complex";
    static final String MAX_EFFORT_REPS = "max-effort-reps";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "A novice programme keeps sets of high-skill lifts (catalogue skill: high) lighter than a "
                    + "{max-effort-reps}-rep max (reps + RIR above {max-effort-reps}).",
            Severity.WARNING, RuleMetadata.Category.SAFETY,
            List.of(RuleParameter.integer(MAX_EFFORT_REPS, 6, 1, 15,
                    "Reps plus reps in reserve (the set's reps to failure) at or below which a set of a high-skill "
                            + "lift is heavy; 6 is about 85% of 1RM in NSCA Table 17.7.")),
            "High-skill lifts (the Olympic lifts and their variations, back and front squats, deadlifts, overhead "
                    + "squats) need many practice reps before heavy loads are safe and useful: under a load a lifter "
                    + "can move only about six times, a technique that is not yet automatic breaks down first. The "
                    + "position stands start novices at moderate loads (about 60-70% of 1RM, 8-12 reps) and increase "
                    + "them as technique allows. The rule reads the set's reps plus reps in reserve, or the reps its "
                    + "load allows when that is lower; it applies to programmes whose level is novice.",
            "ACSM 2009 position stand (Ratamess et al., MSSE 41(3):687-708), novice loading; Haff & Triplett 2016, "
                    + "NSCA Essentials 4th ed., Ch. 17, Table 17.7 (6 reps at about 85% of 1RM)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    /**
     * A weight the 1RM in force says cannot be lifted for the prescribed reps: the 1RM has risen or is wrong
     * (effort-conflict reports which), so the load tells nothing about how heavy the set is for the lifter; only a
     * stated reserve does. A novice's linear progression past the 1RM stated at the start reads this way (common
     * practice).
     */
    private static boolean staleOneRepMax(SetMetrics set) {
        return set.agreement().status() == AgreementStatus.INFEASIBLE
                && set.prescription().load().orElse(null) instanceof Load.Absolute;
    }

    @Override
    public void check(RuleContext context) {
        if (context.programme().info().level() != Level.NOVICE) {
            return;
        }
        double max = context.param(MAX_EFFORT_REPS);
        OneRepMaxRelation relation = context.metrics().parameters().oneRepMaxRelation();
        Occurrences.SetHits<Double> groups = new Occurrences.SetHits<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                for (SetMetrics set : session.sets()) {
                    Exercise exercise = context.exerciseOrNull(set.exerciseId());
                    boolean highSkill = exercise != null && exercise.skill() == Skill.HIGH;
                    boolean stale = staleOneRepMax(set);
                    if (!highSkill || !set.effortKnown() || stale && set.effortSource() == EffortSource.LOAD) {
                        continue;
                    }
                    double effort = set.reps() + set.rir().getAsDouble();
                    if (!stale && set.agreement().repsToFailure().isPresent()) {
                        effort = Math.min(effort, set.agreement().repsToFailure().getAsDouble());
                    }
                    if (effort <= max) {
                        groups.add(week, session, set, EffortText.effortLocation(context, set),
                                Texts.num(effort) + EffortText.prescription(set.prescription()), effort);
                    }
                }
            }
        }
        Occurrences found = new Occurrences();
        for (Occurrences.Group<Double> group : groups.groups()) {
            SetMetrics set = group.first();
            double effort = group.values().get(0);
            int lightest = (int) max + 1;
            int rir = (int) Math.max(0, Math.ceil(lightest - set.reps()));
            group.add(found, context.severity(), group.label() + ": "
                    + EffortText.prescription(set.prescription()) + " is " + Texts.effort(effort) + " (about "
                    + Texts.percent(Relations.shareFor(relation, effort)) + " of 1RM) on a high-skill lift in a novice "
                    + "programme; the " + context.profileName() + " profile keeps novices above "
                    + context.shown(MAX_EFFORT_REPS) + " reps to failure on such lifts",
                    (set.prescription().load().isPresent() ? "load: " + Relations.loadFor(relation, lightest)
                            + " with " : "") + "rir: " + rir + " (" + Texts.num(set.reps()) + " reps + " + rir
                            + " in reserve = " + Texts.effort(lightest) + ", about " + Relations.loadFor(relation,
                            lightest) + " of 1RM), or a lower-skill variation until the technique is sound");
        }
        found.report(context);
    }
}
