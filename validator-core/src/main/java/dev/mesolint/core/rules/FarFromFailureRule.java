package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.EffortSource;
import dev.mesolint.core.model.OneRepMaxRelation;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.List;

/** Working sets stopped so far from failure that they give next to no growth stimulus. */
public final class FarFromFailureRule implements Rule {
    public static final String ID = "far-from-failure";
    static final String MIN_RIR = "min-rir";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Working sets that stop {min-rir} or more reps short of failure give next to no stimulus.", Severity.WARNING,
            RuleMetadata.Category.EFFORT,
            parameters(),
            "Growth comes mostly from the last reps before failure, when every motor unit is working and the bar "
                    + "slows. The proximity-to-failure meta-regression finds growth falling as reps in reserve rise, "
                    + "still positive but small far from failure, and the model gives a set five or more reps short "
                    + "only a small, falling share of a hard set's stimulus. Such sets still cost time and some "
                    + "fatigue. Deload weeks are not checked: easy sets are their point. Reserve estimates err by "
                    + "more than two reps far from failure, so a set written this far out may be easier still. "
                    + StrengthSets.RATIONALE,
            "Refalo et al. 2023, Sports Med 53(3):649-665; Robinson et al. 2024, Sports Med 54:2209-2231; Hackett et "
                    + "al. 2017, JSCR 31:2162-2168; strength-purpose sets: Haff & Triplett 2016, NSCA Essentials 4th "
                    + "ed., Ch. 17, Table 17.8 (strength: 6 reps or fewer), ACSM 2009 position stand (Ratamess et al., "
                    + "MSSE 41(3):687-708)");

    private static List<RuleParameter> parameters() {
        List<RuleParameter> all = new java.util.ArrayList<>();
        all.add(RuleParameter.number(MIN_RIR, 5, 3, 10,
                "Reps in reserve from which a working set is reported (the model's reserve: a range counts "
                        + "at its midpoint, a load alone gives reps to failure minus reps)."));
        all.addAll(StrengthSets.parameters());
        return List.copyOf(all);
    }

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        double minRir = context.param(MIN_RIR);
        Occurrences.SetHits<SetMetrics> groups = new Occurrences.SetHits<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            if (week.deload()) {
                continue;
            }
            for (SessionMetrics session : week.sessions()) {
                for (SetMetrics set : session.sets()) {
                    if (set.effortKnown() && set.rir().getAsDouble() >= minRir
                            && !StrengthSets.notJudged(context, set)) {
                        groups.add(week, session, set, EffortText.effortLocation(context, set),
                                EffortText.prescription(set.prescription()), set);
                    }
                }
            }
        }
        Occurrences found = new Occurrences();
        for (Occurrences.Group<SetMetrics> group : groups.groups()) {
            SetMetrics set = group.first();
            String written = EffortText.prescription(set.prescription());
            String rir = Texts.num(set.rir().getAsDouble());
            String measured = set.effortSource() == EffortSource.LOAD
                    ? written + " leaves about " + rir + " reps in reserve"
                    : written + " stops " + rir + " reps short of failure";
            group.add(found, context.severity(), group.label() + ": " + measured + "; the "
                    + context.profileName() + " profile counts sets " + context.shown(MIN_RIR)
                    + " or more reps short as giving next to no stimulus", fix(context, set));
        }
        found.report(context);
    }

    /**
     * A load that leaves about 2 in reserve; where that passes the athlete's cap or a novice's limit on a
     * high-skill lift, the fix keeps the load and offers more reps instead, in words (no edit would hold).
     */
    private static String heavierLoad(RuleContext context, SetMetrics set) {
        OneRepMaxRelation relation = context.metrics().parameters().oneRepMaxRelation();
        double share = Relations.shareFor(relation, set.reps() + 2);
        if (!LoadCeilings.over(context, set.exerciseId(), Math.floor(share * 1000 / 25) * 2.5 / 100)) {
            return "load: " + Relations.loadFor(relation, set.reps() + 2) + " for " + Texts.num(set.reps())
                    + " reps at about 2 in reserve (a heavier load)";
        }
        double reps = Math.max(set.reps(), Math.floor(set.agreement().repsToFailure().orElse(set.reps()) - 2));
        return "keep the load, which the athlete's cap or a novice's limit on this lift holds down, and do about "
                + Texts.num(reps) + " reps to leave about 2 in reserve, or write these as warm-up sets";
    }

    private static String fix(RuleContext context, SetMetrics set) {
        return switch (set.effortSource()) {
            case LOAD -> heavierLoad(context, set);
            case RPE -> "rpe: 8 with a load that leaves about two reps in reserve, or write them as warm-up sets";
            default -> "rir: 2 with a load that leaves about two reps in reserve, or write them as warm-up sets";
        };
    }
}
