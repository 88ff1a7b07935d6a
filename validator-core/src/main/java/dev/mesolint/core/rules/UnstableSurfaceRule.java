package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.catalogue.Stability;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.apache.commons.text.similarity.LevenshteinDistance;

/** Exercises done on an unstable surface or implement, in a programme for muscle or strength. */
public final class UnstableSurfaceRule implements Rule {
    public static final String ID = "unstable-surface";
    private static final LevenshteinDistance DISTANCE = LevenshteinDistance.getDefaultInstance();

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Exercises on an unstable surface (catalogue stability: unstable), which are low-yield for hypertrophy "
                    + "and strength.",
            Severity.WARNING, RuleMetadata.Category.EFFORT, List.of(),
            "On a ball, dome, board or straps much of the effort goes into balance: the load that can be handled "
                    + "drops, and with it how hard the target muscle can be driven. For building muscle or maximal "
                    + "strength a stable version of the movement does more with the same effort. Balance and "
                    + "trunk-control work are valid aims of their own (the general-fitness profile turns this rule "
                    + "off); waive it with that reason where it is the point.",
            "Behm, Drinkwater, Willardson & Cowley 2010, Canadian Society for Exercise Physiology position stand "
                    + "(Appl Physiol Nutr Metab 35(1):109-112): unstable devices are not recommended as the primary "
                    + "exercises for hypertrophy, absolute strength or power");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        Occurrences found = new Occurrences();
        ExerciseVisits.each(context.programme(), (week, session, work, superset) -> {
            Optional<Exercise> exercise = context.exercise(work.exerciseId());
            if (exercise.isEmpty() || exercise.get().stability() != Stability.UNSTABLE) {
                return;
            }
            Exercise e = exercise.get();
            String target = e.primeMover().map(Muscle::yamlName).orElse("the target muscle");
            found.add(week, session, e.id(), work.exerciseLocation(), work.waivers(), Occurrences.Step.NONE,
                    "done on an unstable surface (catalogue stability: unstable): balance demand caps how hard "
                            + target + " can be driven, so the " + context.profileName() + " profile reports it as "
                            + "low-yield for hypertrophy and strength",
                    stableAlternative(context, e).map(id -> "use a stable version such as " + id).orElse(
                            "use a stable version of the movement")
                            + ", or waive this rule with the reason if balance work is the aim");
        });
        found.report(context);
    }

    /**
     * The stable exercise of the same pattern, kind and prime mover whose id shares most words with {@code e}'s
     * ({@code dumbbell}, {@code press}), then is nearest by edit distance.
     */
    private static Optional<String> stableAlternative(RuleContext context, Exercise e) {
        List<String> words = List.of(e.id().split("-"));
        return context.catalogue().entries().stream()
                .filter(c -> c.stability() == Stability.STABLE && c.pattern() == e.pattern() && c.kind() == e.kind()
                        && c.primeMover().equals(e.primeMover()))
                .map(Exercise::id)
                .min(Comparator.comparingLong((String id) -> -Arrays.stream(id.split("-")).filter(words::contains)
                        .count()).thenComparingInt(id -> DISTANCE.apply(id, e.id())).thenComparing(id -> id));
    }
}
