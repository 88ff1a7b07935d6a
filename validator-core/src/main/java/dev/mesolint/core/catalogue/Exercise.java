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
 * @param muscles   credit per hard set: 1 for a prime mover, 0.5 for a synergist
 * @param ballistic a ballistic or Olympic lift (cleans, snatches, jerks, jumps, throws): a set ends with a
 *                  technical miss, not muscular failure, so no reps in reserve are inferred from its load
 * @param role      the role written on the entry; empty = derived, see {@link #defaultRole()}
 * @param origin    where the entry was written (built-in, a repository file, or the programme itself)
 */
public record Exercise(String id, String name, ExerciseKind kind, MovementPattern pattern, Stability stability,
        Skill skill, Map<Muscle, Double> muscles, Set<Region> regions, boolean ballistic, Optional<Role> role,
        String origin, Location location) {

    public static final double PRIME_MOVER = 1.0;
    public static final double SYNERGIST = 0.5;

    public Exercise {
        id = ExerciseIds.shared(id);
        // insertion order kept: the first muscle written with credit 1 is the prime mover
        muscles = Collections.unmodifiableMap(new LinkedHashMap<>(muscles));
        regions = regions.isEmpty() ? Set.of() : Collections.unmodifiableSet(EnumSet.copyOf(regions));
    }

    /** An entry that is not ballistic and states no role. */
    public Exercise(String id, String name, ExerciseKind kind, MovementPattern pattern, Stability stability,
            Skill skill, Map<Muscle, Double> muscles, Set<Region> regions, String origin, Location location) {
        this(id, name, kind, pattern, stability, skill, muscles, regions, false, Optional.empty(), origin, location);
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

    /**
     * The role a programme gets when its entry states none: the entry's own {@code role}, else {@code main} for a
     * ballistic lift or a high-skill compound (squats, deadlifts, Olympic lifts), else {@code assistance}.
     */
    public Role defaultRole() {
        return role.orElse(ballistic || (isCompound() && skill == Skill.HIGH) ? Role.MAIN : Role.ASSISTANCE);
    }
}
