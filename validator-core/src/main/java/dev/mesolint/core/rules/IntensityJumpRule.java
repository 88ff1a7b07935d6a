package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.model.LiftWeek;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A lift's top set jumps in share of 1RM from one training week to the next by more than a stated step: the
 * intensity side of progression, which {@link VolumeSpikeRule} (sets only) leaves alone.
 */
public final class IntensityJumpRule implements Rule {
    public static final String ID = "intensity-jump";
    static final String MAX_STEP = "max-step";
    /** Shares of 1RM are compared to a hundredth of a percent, so a step of exactly max-step is not over it. */
    private static final double ROUNDING = 1e-4;

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "A lift's top set rises by at most 10 points of 1RM from one training week to the next.",
            Severity.WARNING, RuleMetadata.Category.EFFORT,
            List.of(RuleParameter.percent(MAX_STEP, 0.10, 0.025, 0.5,
                    "Largest rise of a lift's top-set share of 1RM over the last training week that did the lift, "
                            + "in points of 1RM (80% to 90% is 10 points).")),
            "Load is progressed in steps: the ACSM position stand advises raising it by about 2-10% once the "
                    + "current load is lifted for one or two reps over the target, and the NSCA's guidance is "
                    + "similar. The rule reads each lift's top set, the heaviest set's share of 1RM in the week "
                    + "(the model's topSetFraction, from the 1RM that applies that week), and compares it with the "
                    + "last earlier week that did the lift and is not a deload, so that coming back from a deload "
                    + "is not a jump. A rise of more than the step in one week is more often a typing slip (70% "
                    + "written for 7.0%, a stale 1RM) than a plan; when it is the plan (a test week, a taper to a "
                    + "meet), waive the finding with that reason. Sets whose share of 1RM is unknown are not read. "
                    + "It judges intensity only: more sets are volume-spike's.",
            "ACSM position stand 2009 (Ratamess et al., Med Sci Sports Exerc 41(3):687-708): load increments of "
                    + "2-10%; Haff & Triplett 2016, NSCA Essentials 4th ed., Ch. 17 (the 2-for-2 rule, increments "
                    + "of about 2.5-10%)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        double maxStep = context.param(MAX_STEP);
        Map<String, LiftWeek> last = new HashMap<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            if (week.deload()) {
                continue;
            }
            for (LiftWeek lift : week.lifts()) {
                if (lift.topSetFraction().isEmpty()) {
                    continue;
                }
                LiftWeek before = last.put(lift.exerciseId(), lift);
                if (before == null) {
                    continue;
                }
                double from = before.topSetFraction().getAsDouble();
                double to = lift.topSetFraction().getAsDouble();
                if (to - from > maxStep + ROUNDING) {
                    report(context, week, lift, before, maxStep);
                }
            }
        }
    }

    private static void report(RuleContext context, WeekMetrics week, LiftWeek lift, LiftWeek before,
            double maxStep) {
        double from = before.topSetFraction().getAsDouble();
        double to = lift.topSetFraction().getAsDouble();
        String message = lift.exerciseId() + ", week " + week.number() + ": top set " + Texts.percent(to)
                + " of 1RM, " + Texts.num((to - from) * 100) + " points over the " + Texts.percent(from)
                + " of week " + before.week() + "; the " + context.profileName() + " profile flags rises over "
                + context.shown(MAX_STEP).replace("%", "") + " points a week";
        String fix = "load: " + Texts.loadStepDown(from + maxStep) + " for the top set this week, and the rest of "
                + "the rise next week";
        for (SessionMetrics session : week.sessions()) {
            for (SetMetrics set : session.sets()) {
                boolean top = set.exerciseId().equals(lift.exerciseId()) && set.effort().loadFraction().isPresent()
                        && Math.abs(set.effort().loadFraction().getAsDouble() - to) < ROUNDING;
                if (top && set.prescription().load().isPresent()) {
                    context.report(context.fieldLocation(set.prescription(), "load"), set.prescription().waivers(),
                            context.severity(), message, fix, Facts.about(Subject.exercise(lift.exerciseId())));
                    return;
                }
            }
        }
        Places.reportWeek(context, week, message, fix, Facts.about(Subject.exercise(lift.exerciseId())));
    }
}
