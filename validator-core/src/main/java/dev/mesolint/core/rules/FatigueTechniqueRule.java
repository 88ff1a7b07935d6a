package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Technique;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/** Drop sets, rest-pause sets, and supersets whose items share a prime mover. */
public final class FatigueTechniqueRule implements Rule {
    public static final String ID = "fatigue-technique";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Drop sets, rest-pause sets, and supersets whose items share a prime mover.", Severity.WARNING,
            RuleMetadata.Category.FATIGUE, List.of(),
            "A drop set or rest-pause set carries a set on past failure; a superset of two exercises for the same "
                    + "prime mover starts the second one with that muscle already tired. Each adds fatigue and "
                    + "recovery cost, while going to or past failure adds little or no measurable growth over "
                    + "stopping a rep or two short. They save time, which can be the point: then waive the finding "
                    + "with that reason. Supersets of exercises for different muscles (a push with a pull) are "
                    + "not reported.",
            "Refalo et al. 2023 (Sports Med 53(3):649-665): training to failure gave at most a small extra "
                    + "hypertrophy over non-failure training; sharing a prime mover in a superset: common practice");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        Occurrences found = new Occurrences();
        ExerciseVisits.each(context.programme(), (week, session, work, superset) -> {
            for (SetPrescription set : work.sets()) {
                set.technique().ifPresent(t -> found.add(week, session, work.exerciseId(),
                        context.fieldLocation(set, "technique"), set.waivers(),
                        new Occurrences.Step(superset == null ? "set" : "round", Integer.toString(set.number())),
                        describe(t, context.profileName()), "remove technique: " + t.yamlName()
                                + "; if more volume is wanted, add one straight set at the same effort"));
            }
            if (superset != null) {
                sharedPrimeMover(context, superset, work).ifPresent(detail -> found.add(week, session,
                        work.exerciseId(), work.exerciseLocation(), work.waivers(), Occurrences.Step.NONE, detail,
                        "pair exercises for different muscles (e.g. a push with a pull), or do them as straight sets "
                                + "with rest"));
            }
        });
        found.report(context);
    }

    private static String describe(Technique t, String profile) {
        String what = t == Technique.DROP_SET
                ? "drop set: more reps past failure at a lighter load"
                : "rest-pause: mini-sets after short pauses at failure";
        return what + " add fatigue for little extra stimulus; the " + profile + " profile reports fatigue techniques";
    }

    /** Describes the earlier item that {@code item} shares a prime mover with, if any. */
    private static Optional<String> sharedPrimeMover(RuleContext context, Superset superset, ExerciseWork item) {
        Set<Muscle> mine = primeMovers(context, item);
        for (ExerciseWork earlier : superset.items()) {
            if (earlier == item) {
                return Optional.empty();
            }
            Set<Muscle> shared = primeMovers(context, earlier);
            shared.retainAll(mine);
            if (!shared.isEmpty()) {
                return Optional.of("done right after " + earlier.exerciseId() + " in a superset, and both have "
                        + String.join(" and ", shared.stream().map(Muscle::yamlName).toList()) + " as prime mover: "
                        + "each set starts with that muscle already tired, adding fatigue for less stimulus; the "
                        + context.profileName() + " profile reports such pairs");
            }
        }
        return Optional.empty();
    }

    private static Set<Muscle> primeMovers(RuleContext context, ExerciseWork work) {
        Set<Muscle> movers = EnumSet.noneOf(Muscle.class);
        context.exercise(work.exerciseId()).map(Exercise::muscles).orElse(Map.of()).forEach((m, credit) -> {
            if (credit >= Exercise.PRIME_MOVER) {
                movers.add(m);
            }
        });
        return movers;
    }
}
