package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Edits;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.source.Location;
import java.util.ArrayDeque;
import java.util.Comparator;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A lift's top set jumps in share of 1RM from one training week to the next by more than a stated step: the
 * intensity side of progression, which {@link VolumeSpikeRule} (sets only) leaves alone.
 */
public final class IntensityJumpRule implements Rule {
    public static final String ID = "intensity-jump";
    static final String MAX_STEP = "max-step";
    /** Shares of 1RM are compared to a hundredth of a percent, so a step of exactly max-step is not over it. */
    private static final double ROUNDING = 1e-4;
    /** How many earlier sessions of the lift the heaviest is taken from: a light day between heavy ones is no dip. */
    private static final int SESSIONS_BEFORE = 3;

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "A lift's top set rises by at most {max-step} of 1RM, in percentage points, over the heaviest of its "
                    + "last three sessions (deload weeks left out).",
            Severity.WARNING, RuleMetadata.Category.EFFORT,
            List.of(RuleParameter.percent(MAX_STEP, 0.10, 0.025, 0.5,
                    "Largest rise of a lift's top-set share of 1RM over the heaviest top set of its last three "
                            + "sessions, in points of 1RM (80% to 90% is 10 points).")),
            "Load is progressed in steps: the ACSM position stand advises raising it by about 2-10% once the "
                    + "current load is lifted for one or two reps over the target, and the NSCA's guidance is "
                    + "similar. The rule reads each lift's top set in each session, the heaviest set's share of 1RM "
                    + "(from the 1RM that applies that week), and compares it with the heaviest top set of the "
                    + "lift's last three sessions outside deload weeks: coming back from a deload is not a jump, a "
                    + "light day between two heavy ones is not a dip, and a lift done once one week and twice the "
                    + "next (an A/B rotation) is compared session by session. A rise of more than the step in one week is more often a typing slip (70% "
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

    /** A lift's heaviest set in one session: its share of 1RM and where it is written. */
    private record Top(int week, SessionMetrics session, SetMetrics set, double share) {
    }

    @Override
    public void check(RuleContext context) {
        double maxStep = context.param(MAX_STEP);
        Map<String, Deque<Top>> recent = new HashMap<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            if (week.deload()) {
                continue;
            }
            for (SessionMetrics session : week.sessions()) {
                for (Top top : tops(week.number(), session)) {
                    Deque<Top> before = recent.computeIfAbsent(top.set().exerciseId(), k -> new ArrayDeque<>());
                    Optional<Top> heaviest = before.stream().max(Comparator.comparingDouble(Top::share));
                    if (heaviest.isPresent() && top.share() - heaviest.get().share() > maxStep + ROUNDING) {
                        report(context, top, heaviest.get(), maxStep);
                    }
                    before.addLast(top);
                    if (before.size() > SESSIONS_BEFORE) {
                        before.removeFirst();
                    }
                }
            }
        }
    }

    /** Each lift's heaviest set of known share in the session, in the order the lifts first appear. */
    private static List<Top> tops(int week, SessionMetrics session) {
        Map<String, Top> tops = new LinkedHashMap<>();
        for (SetMetrics set : session.sets()) {
            if (set.effort().loadFraction().isEmpty() || set.prescription().load().isEmpty()) {
                continue;
            }
            double share = set.effort().loadFraction().getAsDouble();
            tops.merge(set.exerciseId(), new Top(week, session, set, share), (a, b) -> b.share() > a.share() ? b : a);
        }
        return List.copyOf(tops.values());
    }

    private static void report(RuleContext context, Top top, Top before, double maxStep) {
        String message = top.set().exerciseId() + ", week " + top.week() + " " + Places.day(top.session())
                + ": top set " + Texts.percent(top.share()) + " of 1RM, " + Texts.num((top.share() - before.share())
                * 100) + " points over the " + Texts.percent(before.share()) + " of week " + before.week() + " "
                + Places.day(before.session()) + "; the " + context.profileName() + " profile flags rises over "
                + context.shown(MAX_STEP).replace("%", "") + " points";
        String fix = "load: " + Texts.loadStepDown(before.share() + maxStep) + " for the top set this session, and "
                + "the rest of the rise next time";
        String load = Texts.loadStepDown(before.share() + maxStep);
        Location at = context.fieldLocation(top.set().prescription(), "load");
        context.report(at, top.set().prescription().waivers(), context.severity(), message, fix,
                Facts.about(Subject.exercise(top.set().exerciseId()))
                        .measured(top.share() - before.share(), maxStep, "share")
                        .withEdit(Edits.set(at, "load", load).orElse(null)));
    }
}
