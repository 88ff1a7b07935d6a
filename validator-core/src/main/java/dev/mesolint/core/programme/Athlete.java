package dev.mesolint.core.programme;

import dev.mesolint.core.value.Load;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The individual a programme is written for: known 1RMs and limits set by their clinician or coach. */
public record Athlete(Map<String, Load.Absolute> oneRepMax, List<AthleteConstraint> constraints) {
    public static final Athlete NONE = new Athlete(Map.of(), List.of());

    public Athlete {
        oneRepMax = Map.copyOf(oneRepMax);
        constraints = List.copyOf(constraints);
    }

    public Optional<Load.Absolute> oneRepMax(String exerciseId) {
        return Optional.ofNullable(oneRepMax.get(exerciseId));
    }
}
