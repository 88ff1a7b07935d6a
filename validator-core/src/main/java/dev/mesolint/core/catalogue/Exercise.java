package dev.mesolint.core.catalogue;

import dev.mesolint.core.source.Location;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.EnumSet;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * One catalogue entry: what an exercise is and which muscles a hard set of it credits.
 *
 * @param muscles credit per hard set: 1 for a prime mover, 0.5 for a synergist
 * @param origin  where the entry was written (built-in, a repository file, or the programme itself)
 */
public record Exercise(String id, String name, ExerciseKind kind, MovementPattern pattern, Stability stability,
        Skill skill, Map<Muscle, Double> muscles, Set<Region> regions, String origin, Location location) {

    public static final double PRIME_MOVER = 1.0;
    public static final double SYNERGIST = 0.5;

    public Exercise {
        // insertion order kept: the first muscle written with credit 1 is the prime mover
        muscles = Collections.unmodifiableMap(new LinkedHashMap<>(muscles));
        regions = regions.isEmpty() ? Set.of() : Collections.unmodifiableSet(EnumSet.copyOf(regions));
    }

    /** The muscle with credit 1; the first one written when several have it (a back squat: quadriceps). */
    public Optional<Muscle> primeMover() {
        return muscles.entrySet().stream().filter(e -> e.getValue() >= PRIME_MOVER).map(Map.Entry::getKey).findFirst();
    }

    public double credit(Muscle muscle) {
        return muscles.getOrDefault(muscle, 0.0);
    }

    public boolean isCompound() {
        return kind == ExerciseKind.COMPOUND;
    }
}
