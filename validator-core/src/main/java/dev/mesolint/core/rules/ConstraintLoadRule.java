package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Region;
import dev.mesolint.core.finding.ConstraintReasons;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.OneRepMaxRelation;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.programme.AthleteConstraint;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.source.Location;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * No set loads a region above the share of 1RM the athlete's clinician capped it at.
 *
 * <p>Two severities: a set over the cap takes the rule's configured severity ({@code error}); a set of a capped
 * region whose load cannot be told is at most a {@code warning}.
 */
public final class ConstraintLoadRule implements Rule {
    public static final String ID = "constraint-load";
    /** Loads are compared to a hundredth of a percent: 70% written is not "over" a 70% cap. */
    private static final double ROUNDING = 1e-4;
    private static final String CLINICIAN = "; any change to the cap is for the athlete's clinician to decide";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "No set loads a region above the athlete's cap for it (athlete.constraints[].max-load), whether the load "
                    + "is stated or inferred from reps and RIR.",
            Severity.ERROR, RuleMetadata.Category.SAFETY, List.of(),
            "A load cap for a region (say, 70% of 1RM for the shoulder while a sprain heals) is a limit set by the "
                    + "athlete's clinician, so any set above it is an error. The load is the set's stated share of "
                    + "1RM (or its weight over the known 1RM); a set that states only reps and reserve is read "
                    + "through the model's %1RM relation (Brzycki by default: 8 reps at RIR 2 is a 10-rep effort, "
                    + "about 75% of 1RM). Every exercise whose catalogue entry loads the region counts. Inferred "
                    + "loads are estimates and reserve estimates can be off by two reps or more, so stay clear of the "
                    + "cap rather than on it. A set of a capped region whose load nothing tells (a weight without the "
                    + "athlete's 1RM and no reserve, or no effort at all) cannot be checked and is reported as a "
                    + "warning. mesolint checks the programme against the cap and never sets or relaxes it: defer to "
                    + "the athlete's physician or physiotherapist, and local licensed practice.",
            "The athlete's clinician (the cap); Haff & Triplett 2016, NSCA Essentials 4th ed., Ch. 17, Table 17.7 and "
                    + "Brzycki 1993 (%1RM from reps); Hackett et al. 2017, JSCR 31:2162-2168 (reserve estimates)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    /**
     * A set over a cap, or one whose load cannot be told: its share of 1RM (empty when unknown), whether that share
     * is inferred from reps and reserve, and the constraint.
     */
    private record Hit(OptionalDouble share, boolean inferred, AthleteConstraint constraint, Region region) {
    }

    @Override
    public void check(RuleContext context) {
        List<AthleteConstraint> caps = context.programme().athlete().constraints().stream()
                .filter(c -> c.region().isPresent() && c.maxLoad().isPresent())
                .toList();
        if (caps.isEmpty()) {
            return;
        }
        OneRepMaxRelation relation = context.metrics().parameters().oneRepMaxRelation();
        Occurrences.SetHits<Hit> groups = new Occurrences.SetHits<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                for (SetMetrics set : session.sets()) {
                    Optional<Exercise> exercise = context.exercise(set.exerciseId());
                    if (exercise.isEmpty()) {
                        continue;
                    }
                    OptionalDouble share = share(set, relation);
                    boolean inferred = set.effort().loadFraction().isEmpty();
                    for (AthleteConstraint cap : caps) {
                        Region region = cap.region().get();
                        boolean over = share.isEmpty() || share.getAsDouble() > cap.maxLoad().get() + ROUNDING;
                        if (exercise.get().regions().contains(region) && over) {
                            Location where = set.prescription().load().isPresent()
                                    ? context.fieldLocation(set.prescription(), "load")
                                    : EffortText.effortLocation(context, set);
                            String key = region + " " + (share.isPresent() ? Texts.percent(share.getAsDouble()) : "?");
                            groups.add(week, session, set, where, key, new Hit(share, inferred, cap, region));
                        }
                    }
                }
            }
        }
        Occurrences found = new Occurrences();
        for (Occurrences.Group<Hit> group : groups.groups()) {
            Hit hit = group.values().get(0);
            if (hit.share().isPresent()) {
                reportOver(context, found, relation, group, hit);
            } else {
                reportUnknown(context, found, group, hit);
            }
        }
        found.report(context);
    }

    /** The set's share of 1RM: stated (or a weight over the known 1RM), else inferred from reps and reserve. */
    static OptionalDouble share(SetMetrics set, OneRepMaxRelation relation) {
        if (set.effort().loadFraction().isPresent()) {
            return set.effort().loadFraction();
        }
        if (!set.effortKnown()) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(Relations.shareFor(relation, set.reps() + set.rir().getAsDouble()));
    }

    private static void reportOver(RuleContext context, Occurrences found, OneRepMaxRelation relation,
            Occurrences.Group<Hit> group, Hit hit) {
        SetMetrics set = group.first();
        double share = hit.share().getAsDouble();
        double cap = hit.constraint().maxLoad().get();
        String load = hit.inferred()
                ? "about " + Texts.percent(share) + " of 1RM, inferred from "
                        + EffortText.prescription(set.prescription()) + " ("
                        + Texts.effort(set.reps() + set.rir().getAsDouble()) + ", " + Relations.name(relation) + ")"
                : Texts.percent(share) + " of 1RM" + set.prescription().load()
                        .filter(l -> !l.toString().endsWith("%")).map(l -> " (" + l + ")").orElse("");
        String fix;
        if (!hit.inferred()) {
            fix = cappedLoadFix(set, relation, cap);
        } else {
            // The lightest effort that stays within the cap: the reps to failure the capped load allows.
            int effort = (int) Math.ceil(relation.repsToFailure(cap) - ROUNDING);
            int reps = set.prescription().reps().amrap() ? (int) Math.floor(set.reps())
                    : set.prescription().reps().max();
            int rir = Math.max(0, effort - reps);
            fix = (set.prescription().reps().amrap() ? "reps: " + reps + " with " : "") + "rir: " + rir + " ("
                    + Texts.effort(reps + rir) + " or longer), or state load: " + Texts.loadStepDown(cap);
        }
        group.add(found, context.severity(), group.label() + ": load " + load + " is above "
                + cap(hit, cap), fix + CLINICIAN);
    }

    /**
     * The capped load; when the set also states a reserve that the lighter load would leave far behind, the fix names
     * the reserve to write with it as well, in words: a load change alone would leave a mislabelled set.
     */
    private static String cappedLoadFix(SetMetrics set, OneRepMaxRelation relation, double cap) {
        double capped = Math.floor(cap * 1000 / 25) * 2.5 / 100;
        String load = Texts.loadStepDown(cap);
        if (set.agreement().statedRir().isEmpty()) {
            return "load: " + load + " or lighter";
        }
        double reserve = relation.repsToFailure(capped) - set.reps();
        if (reserve - set.agreement().statedRir().getAsDouble() <= set.agreement().tolerance()) {
            return "load: " + load + " or lighter";
        }
        return "lighten to " + load + " of 1RM or less and write the reserve that leaves: about rir: "
                + Math.round(reserve) + " for " + Texts.num(set.reps()) + " reps (or more reps at that load)";
    }

    /** A set of a capped region whose load nothing tells: it cannot be checked, which matters for a safety limit. */
    private static void reportUnknown(RuleContext context, Occurrences found, Occurrences.Group<Hit> group,
            Hit hit) {
        SetMetrics set = group.first();
        double cap = hit.constraint().maxLoad().get();
        String why = set.prescription().load().isPresent()
                ? set.prescription().load().get() + " without the athlete's 1RM for " + set.exerciseId()
                        + " and without a stated reserve"
                : "no load and no reserve stated";
        String fix = set.prescription().load().isPresent()
                ? "add " + set.exerciseId() + " to athlete.one-rep-max, or state rir: on these sets"
                : "state load: " + Texts.loadStepDown(cap) + " or lighter, or rir: on these sets";
        group.add(found, Severities.atMost(context.severity(), Severity.WARNING), group.label()
                + ": the load cannot be checked against " + cap(hit, cap) + ": " + why, fix + CLINICIAN);
    }

    private static String cap(Hit hit, double cap) {
        String region = hit.region().yamlName();
        return "the athlete's " + Texts.percent(cap) + " cap for the " + region + " " + ConstraintReasons.MARK
                + hit.constraint().reason() + "); this exercise loads the " + region;
    }
}
