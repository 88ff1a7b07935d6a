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
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
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
        // Repeated weeks visit the same exercise again: word its finding once (the alternative is a catalogue search).
        Map<Exercise, Wording> wordings = new IdentityHashMap<>();
        ExerciseVisits.each(context.programme(), (week, session, work, superset) -> {
            Exercise e = context.exerciseOrNull(work.exerciseId());
            if (e == null || e.stability() != Stability.UNSTABLE) {
                return;
            }
            Wording wording = wordings.computeIfAbsent(e, x -> wording(context, x));
            found.add(week, session, e.id(), work.exerciseLocation(), work.waivers(), Occurrences.Step.NONE,
                    wording.detail(), wording.fix());
        });
        found.report(context);
    }

    /** What a finding on an exercise says, and its fix. */
    private record Wording(String detail, String fix) {
    }

    private static Wording wording(RuleContext context, Exercise e) {
        String target = e.primeMover().map(Muscle::yamlName).orElse("the target muscle");
        return new Wording("done on an unstable surface (catalogue stability: unstable): balance demand caps how hard "
                + target + " can be driven, so the " + context.profileName() + " profile reports it as "
                + "low-yield for hypertrophy and strength",
                stableAlternative(context, e).map(id -> "use a stable version such as " + id).orElse(
                        "use a stable version of the movement")
                        + ", or waive this rule with the reason if balance work is the aim");
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
