package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Technique;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * Drop sets and rest-pause sets that more work for the same muscle follows, and supersets in which an item is done
 * right after one that shares its prime mover.
 */
public final class FatigueTechniqueRule implements Rule {
    public static final String ID = "fatigue-technique";
    static final String MAX_RECRUITMENT = "max-next-recruitment";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Drop sets and rest-pause sets that more sets for the same muscle follow in the session, starting under "
                    + "{max-next-recruitment} of a fresh set's recruitment, and supersets in which an item comes right "
                    + "after one with the same prime mover.", Severity.WARNING,
            RuleMetadata.Category.FATIGUE,
            List.of(RuleParameter.percent(MAX_RECRUITMENT, 0.90, 0.5, 1.0,
                    "A technique set is reported when the next set for its muscle starts below this share of a "
                            + "fresh set's recruitment (the model's figure); a longer rest before it, or fewer sets "
                            + "after it, lets more of the fatigue clear.")),
            "A drop set or rest-pause set carries a set on past failure with short mini-sets. As a way to grow "
                    + "muscle it works: one set with drops grew the triceps at least as much as three straight sets "
                    + "(Fink et al. 2018), and the meta-analysis of Coleman et al. (2022) finds drop sets about as "
                    + "good as traditional sets for growth, in less time. The model credits them that way. Their "
                    + "cost is fatigue: the mini-sets are done with almost no recovery and leave more of it, so the "
                    + "sets that follow for the same muscle start with fewer motor units in reach and give less. "
                    + "The rule therefore reports a technique only when more sets for its muscle (the prime mover of "
                    + "the set, credited by a later exercise) follow in the session and the next of them starts "
                    + "below 90% of a fresh set's recruitment in the model, and names that set and the figure; on "
                    + "the last set for a muscle, or with enough rest after it, it is not reported. Likewise an item of a superset or circuit done right after an item with the same "
                    + "prime mover starts with that muscle already tired; items further apart in the circuit, and "
                    + "pairs for different muscles (a push with a pull), are not reported. When saving time is the "
                    + "point, waive the finding with that reason.",
            "Fink et al. 2018 (J Sports Med Phys Fitness 58(5):597-605): one 12RM set with drops vs 3 x 12RM; "
                    + "Coleman et al. 2022 (Int J Strength Cond 2(1), meta-analysis): drop sets vs traditional sets "
                    + "for hypertrophy; the fatigue they add to later sets: the "
                    + "model's techniqueFatigueFactor (docs/model.md); sharing a prime mover in a superset: "
                    + "common practice");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        Occurrences found = new Occurrences();
        reportTechniques(context, found);
        ExerciseVisits.each(context.programme(), (week, session, work, superset) -> {
            if (superset != null) {
                sharedPrimeMover(context, superset, work).ifPresent(detail -> found.add(week, session,
                        work.exerciseId(), work.exerciseLocation(), work.waivers(), Occurrences.Step.NONE, detail,
                        "pair exercises for different muscles (e.g. a push with a pull), or do them as straight sets "
                                + "with rest"));
            }
        });
        found.report(context);
    }

    /** A technique set and the next set that its muscle does after it in the session. */
    private record Followed(Technique technique, Muscle muscle, SetMetrics next) {
    }

    private static void reportTechniques(RuleContext context, Occurrences found) {
        if (!context.index().sets().technique()) {
            return;
        }
        Occurrences.SetHits<Followed> groups = new Occurrences.SetHits<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                List<SetMetrics> sets = session.sets();
                for (int i = 0; i < sets.size(); i++) {
                    SetMetrics set = sets.get(i);
                    if (set.prescription().technique().isEmpty() || set.primeMover().isEmpty()) {
                        continue;
                    }
                    Muscle muscle = set.primeMover().get();
                    Optional<SetMetrics> next = nextFor(context, sets.subList(i + 1, sets.size()), muscle);
                    if (next.isPresent() && next.get().recruitment() < context.param(MAX_RECRUITMENT)) {
                        Technique t = set.prescription().technique().get();
                        groups.add(week, session, set, context.fieldLocation(set.prescription(), "technique"),
                                List.of(t, next.get().exerciseId(), next.get().setNumber(),
                                        Texts.percent(next.get().recruitment())),
                                new Followed(t, muscle, next.get()));
                    }
                }
            }
        }
        for (Occurrences.Group<Followed> group : groups.groups()) {
            Followed f = group.values().get(0);
            String muscle = Texts.muscle(f.muscle());
            String what = f.technique() == Technique.DROP_SET ? "drop set" : "rest-pause";
            group.add(found, context.severity(), group.label() + ": " + what + ": its mini-sets to failure grow "
                    + "muscle about as well as more straight sets, in less time, but leave extra fatigue: the next "
                    + muscle + " set (" + f.next().exerciseId() + " set " + f.next().setNumber() + ") starts at "
                    + Texts.percent(f.next().recruitment()) + " of a fresh set's recruitment; the "
                    + context.profileName() + " profile reports techniques whose next " + muscle
                    + " set starts under " + context.shown(MAX_RECRUITMENT),
                    "put the " + what + " on the last " + muscle + " set of the session, rest longer after it, "
                            + "or remove technique: " + f.technique().yamlName());
        }
    }

    /** The first of {@code later} whose exercise credits {@code muscle}. */
    private static Optional<SetMetrics> nextFor(RuleContext context, List<SetMetrics> later, Muscle muscle) {
        for (SetMetrics s : later) {
            Exercise exercise = context.exerciseOrNull(s.exerciseId());
            if (exercise != null && exercise.credit(muscle) > 0) {
                return Optional.of(s);
            }
        }
        return Optional.empty();
    }

    /**
     * Describes the item done right before {@code item} in the superset's round when the two share a prime mover.
     * Only that neighbour counts: in a circuit, a station two places back has had a station's time to recover.
     */
    private static Optional<String> sharedPrimeMover(RuleContext context, Superset superset, ExerciseWork item) {
        int at = superset.items().indexOf(item);
        if (at <= 0) {
            return Optional.empty();
        }
        ExerciseWork before = superset.items().get(at - 1);
        Set<Muscle> shared = primeMovers(context, before);
        shared.retainAll(primeMovers(context, item));
        if (shared.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of("done right after " + before.exerciseId() + " in a superset, and both have "
                + String.join(" and ", shared.stream().map(Muscle::yamlName).toList()) + " as prime mover: "
                + "each set starts with that muscle already tired, adding fatigue for less stimulus; the "
                + context.profileName() + " profile reports such pairs");
    }

    private static Set<Muscle> primeMovers(RuleContext context, ExerciseWork work) {
        Set<Muscle> movers = EnumSet.noneOf(Muscle.class);
        Exercise exercise = context.exerciseOrNull(work.exerciseId());
        if (exercise != null) {
            movers.addAll(context.index().primeMovers(exercise));
        }
        return movers;
    }
}
