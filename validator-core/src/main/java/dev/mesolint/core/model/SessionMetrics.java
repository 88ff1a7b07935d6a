package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.source.Location;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The model's figures for one session.
 *
 * @param minutes    estimated duration: reps, rests, warm-up sets and changeovers
 * @param muscles    per muscle trained, in muscle order
 * @param sets       working sets in the order they are done (sets of exercises missing from the catalogue left out)
 * @param volumeLoad reps x weight over the sets whose weight is known, in the programme's unit
 * @param lifts      per lift (exercise), in the order each first appears: reps per intensity zone
 */
public record SessionMetrics(int day, String name, Location location, double minutes, Map<Muscle, MuscleSession> muscles,
        List<SetMetrics> sets, double volumeLoad, List<LiftSession> lifts) {

    public SessionMetrics {
        muscles = muscles.isEmpty() ? Map.of() : Collections.unmodifiableMap(new EnumMap<>(muscles));
        sets = List.copyOf(sets);
        lifts = WorkedOutList.keep(lifts);
    }

    /** The lift's reps per intensity zone in this session; empty when the session does not do it. */
    public Optional<LiftSession> lift(String exerciseId) {
        return lifts.stream().filter(l -> l.exerciseId().equals(exerciseId)).findFirst();
    }

    /** Credited hard sets for a muscle; 0 when the session does not train it. */
    public double hardSets(Muscle muscle) {
        MuscleSession m = muscles.get(muscle);
        return m == null ? 0 : m.hardSets();
    }

    /** A muscle's effective sets in this session (after the per-session plateau); 0 when it is not trained. */
    public double stimulus(Muscle muscle) {
        MuscleSession m = muscles.get(muscle);
        return m == null ? 0 : m.stimulus();
    }
}
