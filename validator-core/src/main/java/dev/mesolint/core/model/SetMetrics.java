package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.source.Location;
import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The model's figures for one working set.
 *
 * @param round           1-based superset round, or 0 outside a superset
 * @param primeMover      the muscle {@code recruitment} and {@code stimulus} refer to: the prime mover, or the
 *                        most-credited muscle when the exercise has none; empty when it credits no muscle
 * @param hard            effort known and reps in reserve at most {@code hardSetMaxRir}
 * @param stimulatingReps stimulating reps of the set and of any mini-sets its technique adds (not credited)
 * @param extraReps       reps added by a drop set or rest-pause technique
 * @param recruitment     share of the prime mover's pool reachable at the start of the set, 1 - fatigue
 * @param stimulus        the prime mover's stimulus, in units of one fresh hard set, before diminishing returns
 * @param muscleStimulus  stimulus per credited muscle (credit applied), before diminishing returns
 * @param fatigueBefore   residual fatigue per muscle at the start of the set (muscles with none left out)
 * @param restAfterSeconds rest after the set; 0 for the session's last set
 * @param volumeLoad      reps x weight in the programme's unit, mini-sets included; empty when the weight is unknown
 */
public record SetMetrics(String exerciseId, int setNumber, int round, Location location, SetPrescription prescription,
        ExerciseWork work, Optional<Muscle> primeMover, Effort effort, boolean hard, double stimulatingReps, double extraReps,
        double recruitment, double stimulus, Map<Muscle, Double> muscleStimulus, Map<Muscle, Double> fatigueBefore,
        double restAfterSeconds, OptionalDouble volumeLoad) {

    public SetMetrics {
        Objects.requireNonNull(effort, "effort");
        muscleStimulus = copy(muscleStimulus);
        fatigueBefore = copy(fatigueBefore);
    }

    private static Map<Muscle, Double> copy(Map<Muscle, Double> map) {
        if (map.isEmpty()) {
            return Map.of();
        }
        // the model's own per-set maps are unmodifiable already: no copy per set
        return map instanceof MuscleValues ? map : Collections.unmodifiableMap(new EnumMap<>(map));
    }

    /** Reps performed, n (a range's midpoint). */
    public double reps() {
        return effort.reps();
    }

    /** Reps in reserve, r; empty when the effort is unknown. */
    public OptionalDouble rir() {
        return effort.rir();
    }

    public EffortSource effortSource() {
        return effort.source();
    }

    public EffortAgreement agreement() {
        return effort.agreement();
    }

    public boolean effortKnown() {
        return effort.known();
    }
}
