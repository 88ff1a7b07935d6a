package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Region;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.OneRepMaxRelation;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.programme.AthleteConstraint;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.source.Location;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/** No set loads a region above the share of 1RM the athlete's clinician capped it at. */
public final class ConstraintLoadRule implements Rule {
    public static final String ID = "constraint-load";

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
                    + "cap rather than on it. mesolint checks the programme against the cap and never sets or "
                    + "relaxes it: defer to the athlete's physician or physiotherapist, and local licensed practice.",
            "The athlete's clinician (the cap); Haff & Triplett 2016, NSCA Essentials 4th ed., Ch. 17, Table 17.7 and "
                    + "Brzycki 1993 (%1RM from reps); Hackett et al. 2017, JSCR 31:2162-2168 (reserve estimates)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    /** A set over a cap: its share of 1RM, whether that share is inferred, and the constraint it breaks. */
    private record Hit(double share, boolean inferred, AthleteConstraint constraint, Region region) {
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
        SetGroups<Hit> groups = new SetGroups<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                for (SetMetrics set : session.sets()) {
                    Optional<Exercise> exercise = context.exercise(set.exerciseId());
                    OptionalDouble share = share(set, relation);
                    if (exercise.isEmpty() || share.isEmpty()) {
                        continue;
                    }
                    boolean inferred = set.effort().loadFraction().isEmpty();
                    for (AthleteConstraint cap : caps) {
                        Region region = cap.region().get();
                        if (exercise.get().regions().contains(region) && share.getAsDouble() > cap.maxLoad().get() + 1e-9) {
                            Location where = inferred ? EffortText.effortLocation(context, set)
                                    : context.fieldLocation(set.prescription(), "load");
                            groups.add(week, session, set, where, List.of(region, Texts.percent(share.getAsDouble())),
                                    new Hit(share.getAsDouble(), inferred, cap, region));
                        }
                    }
                }
            }
        }
        for (SetGroups.Group<Hit> group : groups.groups()) {
            report(context, relation, group);
        }
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

    private static void report(RuleContext context, OneRepMaxRelation relation, SetGroups.Group<Hit> group) {
        SetMetrics set = group.first();
        Hit hit = group.values().get(0);
        double cap = hit.constraint().maxLoad().get();
        String region = hit.region().yamlName();
        String load = hit.inferred()
                ? "about " + Texts.percent(hit.share()) + " of 1RM, inferred from "
                        + EffortText.prescription(set.prescription()) + " (a " + Texts.num(set.reps()
                        + set.rir().getAsDouble()) + "-rep effort, " + Relations.name(relation) + ")"
                : Texts.percent(hit.share()) + " of 1RM" + (set.prescription().load().filter(
                        l -> !l.toString().endsWith("%")).map(l -> " (" + l + ")").orElse(""));
        double lightest = relation.repsToFailure(cap);
        String fix = hit.inferred()
                ? "keep reps + rir at " + Texts.num(Math.ceil(lightest)) + " or more (e.g. rir: "
                        + Texts.num(Math.max(0, Math.ceil(lightest - set.reps()))) + "), or state load: "
                        + Texts.loadStepDown(cap)
                : "load: " + Texts.loadStepDown(cap) + " or lighter";
        group.report(context, context.severity(), group.label() + ": load " + load
                + " is above the athlete's " + Texts.percent(cap) + " cap for the " + region + " (reason given: "
                + hit.constraint().reason() + "); this exercise loads the " + region,
                fix + "; any change to the cap is for the athlete's clinician to decide");
    }
}
