package dev.mesolint.core.programme;

import dev.mesolint.core.value.Load;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The individual a programme is written for: known 1RMs and limits set by their clinician or coach.
 *
 * @param oneRepMax the 1RM by exercise id: for the whole programme, the first value stated; for one session
 *                  ({@link #atSession}), the value in force there
 * @param steps     by exercise id, every 1RM stated per week or tested in a session, in block order
 */
public record Athlete(Map<String, Load.Absolute> oneRepMax, List<AthleteConstraint> constraints,
        Map<String, List<OneRepMaxStep>> steps) {
    public static final Athlete NONE = new Athlete(Map.of(), List.of());

    public Athlete {
        oneRepMax = Map.copyOf(oneRepMax);
        constraints = List.copyOf(constraints);
        Map<String, List<OneRepMaxStep>> copy = new LinkedHashMap<>();
        steps.forEach((id, list) -> copy.put(id, List.copyOf(list)));
        steps = Map.copyOf(copy);
    }

    /** An athlete whose 1RMs stay the same through the block. */
    public Athlete(Map<String, Load.Absolute> oneRepMax, List<AthleteConstraint> constraints) {
        this(oneRepMax, constraints, Map.of());
    }

    public Optional<Load.Absolute> oneRepMax(String exerciseId) {
        return Optional.ofNullable(oneRepMax.get(exerciseId));
    }

    /**
     * The 1RM in force for a session: the latest value stated for that week or earlier, unless a test came
     * after it (then empty: the programme cannot know the result, see docs/format.md). An exercise with a single
     * stated 1RM keeps it throughout.
     */
    public Optional<Load.Absolute> oneRepMax(String exerciseId, int week, int day) {
        List<OneRepMaxStep> list = steps.get(exerciseId);
        if (list == null || list.isEmpty()) {
            return oneRepMax(exerciseId);
        }
        OneRepMaxStep inForce = null;
        for (OneRepMaxStep step : list) {
            if (step.startsBy(week, day)) {
                inForce = step;
            }
        }
        return inForce == null ? Optional.empty() : inForce.value();
    }

    /** Every 1RM stated or tested for an exercise, in block order; empty when it has a single stated value. */
    public List<OneRepMaxStep> steps(String exerciseId) {
        return steps.getOrDefault(exerciseId, List.of());
    }

    /** This athlete as seen by one session: {@link #oneRepMax(String)} gives the 1RMs in force there. */
    public Athlete atSession(int week, int day) {
        if (steps.isEmpty()) {
            return this;
        }
        Map<String, Load.Absolute> inForce = new LinkedHashMap<>(oneRepMax);
        for (String id : steps.keySet()) {
            Optional<Load.Absolute> value = oneRepMax(id, week, day);
            if (value.isPresent()) {
                inForce.put(id, value.get());
            } else {
                inForce.remove(id);
            }
        }
        return new Athlete(inForce, constraints, steps);
    }
}
