package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import java.util.List;

/** Every working set states how hard it is: reps in reserve, RPE, a load, or AMRAP. */
public final class EffortMissingRule implements Rule {
    public static final String ID = "effort-missing";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Every working set states its effort: rir, rpe or load (amrap counts).", Severity.WARNING,
            RuleMetadata.Category.EFFORT, List.of(),
            "How close a set ends to failure decides whether it builds muscle or strength at all: sets stopped far "
                    + "from failure give little, sets to failure cost the most recovery. A set that states only its "
                    + "reps leaves that to the lifter's mood on the day. Such a set is never counted as a hard set, "
                    + "so the weekly volume figures and the checks that read them undercount it; state reps in "
                    + "reserve (rir), an RPE on the reps-in-reserve scale, or a load.",
            "Refalo et al. 2023, Sports Med 53(3):649-665 and Robinson et al. 2024, Sports Med 54:2209-2231 "
                    + "(proximity to failure); Zourdos et al. 2016, JSCR 30(1):267-275 (RIR-based RPE)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        if (!context.index().sets().effortUnstated()) {
            return;
        }
        Occurrences.SetHits<SetMetrics> groups = new Occurrences.SetHits<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                for (SetMetrics set : session.sets()) {
                    if (!set.prescription().statesEffort()) {
                        groups.add(week, session, set, set.location(), EffortText.reps(set.prescription()), set);
                    }
                }
            }
        }
        Occurrences found = new Occurrences();
        for (Occurrences.Group<SetMetrics> group : groups.groups()) {
            group.add(found, context.severity(), group.label() + ": "
                    + EffortText.reps(group.first().prescription())
                    + " with no effort stated (rir, rpe or load), so these sets never count as hard sets",
                    "add rir: 2 (or rpe: 8, or a load such as load: 70%)");
        }
        found.report(context);
    }
}
