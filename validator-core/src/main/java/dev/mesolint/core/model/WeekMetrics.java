package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.source.Location;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The model's figures for one week.
 *
 * @param number       the week's number in the block
 * @param deload       whether the programme marks the week as a deload
 * @param muscles      per muscle trained, in muscle order
 * @param sessions     in day order (sessions on the same day keep their written order)
 * @param volumeLoad   reps x weight over the sets whose weight is known, in the programme's unit
 * @param acuteChronic this week's hard sets over the mean of up to {@code acuteChronicWeeks} weeks before; a muscle
 *                     is missing when there is no earlier week or that mean is 0
 * @param change       relative change in hard sets from the week before ({@code 0.25} = 25% more); a muscle is
 *                     missing in the first week or when it had no hard sets the week before
 * @param lifts        per lift (exercise), in the order each first appears in the week: top set, mean intensity,
 *                     volume load and heavy reps
 */
public record WeekMetrics(int number, boolean deload, Location location, Map<Muscle, MuscleWeek> muscles,
        List<SessionMetrics> sessions, double volumeLoad, Map<Muscle, Double> acuteChronic,
        Map<Muscle, Double> change, List<LiftWeek> lifts) {

    public WeekMetrics {
        muscles = copy(muscles);
        sessions = List.copyOf(sessions);
        acuteChronic = copy(acuteChronic);
        change = copy(change);
        lifts = WorkedOutList.keep(lifts);
    }

    private static <V> Map<Muscle, V> copy(Map<Muscle, V> map) {
        return map.isEmpty() ? Map.of() : Collections.unmodifiableMap(new EnumMap<>(map));
    }

    /** Credited hard sets for a muscle; 0 when the week does not train it. */
    public double hardSets(Muscle muscle) {
        MuscleWeek m = muscles.get(muscle);
        return m == null ? 0 : m.hardSets();
    }

    /** The lift's strength figures this week; empty when the week does not do it. */
    public Optional<LiftWeek> lift(String exerciseId) {
        return lifts.stream().filter(l -> l.exerciseId().equals(exerciseId)).findFirst();
    }

    public OptionalDouble acuteChronic(Muscle muscle) {
        Double v = acuteChronic.get(muscle);
        return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
    }

    public OptionalDouble change(Muscle muscle) {
        Double v = change.get(muscle);
        return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
    }

    /** This week with its trend figures. */
    WeekMetrics withTrends(Map<Muscle, Double> acuteChronic, Map<Muscle, Double> change) {
        return new WeekMetrics(number, deload, location, muscles, sessions, volumeLoad, acuteChronic, change, lifts);
    }
}
