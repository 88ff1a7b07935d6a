package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.List;

/**
 * Long sets (reps + reserve of 15 or more) taken close to failure.
 *
 * <p>Two severities: on compound lifts the rule's configured severity ({@code warning}); on isolation lifts at most
 * {@code info}, or the configured severity when a profile sets it lower.
 */
public final class HighRepFatigueRule implements Rule {
    public static final String ID = "high-rep-fatigue";
    static final String MIN_EFFORT_REPS = "min-effort-reps";
    static final String MAX_RIR = "max-rir";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Sets with reps + RIR of 15 or more taken to RIR 2 or closer: warning on compound lifts, info on "
                    + "isolation lifts.",
            Severity.WARNING, RuleMetadata.Category.FATIGUE,
            List.of(RuleParameter.integer(MIN_EFFORT_REPS, 15, 8, 40,
                            "Reps plus reps in reserve (the set's reps to failure) from which a set is long."),
                    RuleParameter.number(MAX_RIR, 2, 0, 5,
                            "Most reps in reserve at which a long set counts as taken close to failure.")),
            "Past about fifteen reps, a set close to failure piles up fatigue (breathing, metabolites, "
                    + "concentration) faster than it adds growth stimulus: only the last few reps before failure "
                    + "stimulate much, whatever the set's length, while the fatigue keeps rising with every rep and "
                    + "lowers the quality of the sets that follow. On squats, deadlifts and other compound lifts that "
                    + "fatigue also costs technique, so the rule warns; on isolation lifts long sets are a sound "
                    + "choice for some muscles and joints, so it only informs. Heavier loads for fewer reps, or "
                    + "stopping further from failure, keep most of the stimulus for less fatigue.",
            "Haff & Triplett 2016, NSCA Essentials 4th ed., Ch. 17 (Table 17.7, %1RM and reps); Refalo et al. 2023, "
                    + "Sports Med 53(3):649-665; the 15-rep threshold is common practice");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        double minEffort = context.param(MIN_EFFORT_REPS);
        double maxRir = context.param(MAX_RIR);
        Occurrences.SetHits<SetMetrics> groups = new Occurrences.SetHits<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                for (SetMetrics set : session.sets()) {
                    if (!set.effortKnown()) {
                        continue;
                    }
                    double rir = set.rir().getAsDouble();
                    if (rir <= maxRir && set.reps() + rir >= minEffort) {
                        groups.add(week, session, set, context.fieldLocation(set.prescription(), "reps"),
                                EffortText.prescription(set.prescription()), set);
                    }
                }
            }
        }
        Occurrences found = new Occurrences();
        for (Occurrences.Group<SetMetrics> group : groups.groups()) {
            SetMetrics set = group.first();
            boolean compound = context.exercise(set.exerciseId()).map(Exercise::isCompound).orElse(false);
            Severity severity = compound ? context.severity() : Severities.atMost(context.severity(), Severity.INFO);
            double effort = set.reps() + set.rir().getAsDouble();
            group.add(found, severity, group.label() + ": "
                    + EffortText.prescription(set.prescription()) + " is " + Texts.effort(effort)
                    + " taken close to failure on " + (compound ? "a compound" : "an isolation")
                    + " lift; the " + context.profileName() + " profile flags sets of "
                    + context.shown(MIN_EFFORT_REPS) + " or more reps to failure taken to RIR "
                    + context.shown(MAX_RIR) + " or closer",
                    "reps: 8-12 with a heavier load, or rir: " + ((int) Math.floor(maxRir) + 1)
                            + " (stop further from failure)");
        }
        found.report(context);
    }
}
