package dev.mesolint.core.model;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.mesolint.core.catalogue.Muscle;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The array-backed per-set maps read as the unmodifiable enum maps they replace. */
class MuscleValuesTests {

    private static MuscleValues of(Map<Muscle, Double> values) {
        double[] byOrdinal = new double[MuscleValues.muscleCount()];
        long present = 0;
        for (Map.Entry<Muscle, Double> e : values.entrySet()) {
            byOrdinal[e.getKey().ordinal()] = e.getValue();
            present |= MuscleValues.bit(e.getKey().ordinal());
        }
        return new MuscleValues(byOrdinal, present);
    }

    @Test
    void readsLikeAnEnumMapInMuscleOrder() {
        Map<Muscle, Double> expected = new EnumMap<>(Muscle.class);
        expected.put(Muscle.CALVES, 0.25);
        expected.put(Muscle.CHEST, 0.0); // a muscle credited nothing still has its entry
        expected.put(Muscle.TRICEPS, 0.5);
        MuscleValues values = of(expected);
        List<Muscle> order = new ArrayList<>();
        values.forEach((muscle, value) -> order.add(muscle));
        assertAll(
                () -> assertEquals(expected, values),
                () -> assertEquals(values, expected),
                () -> assertEquals(expected.hashCode(), values.hashCode()),
                () -> assertEquals(expected.toString(), values.toString()),
                () -> assertEquals(List.of(Muscle.CHEST, Muscle.TRICEPS, Muscle.CALVES), order),
                () -> assertEquals(List.copyOf(expected.keySet()), List.copyOf(values.keySet())),
                () -> assertEquals(3, values.size()),
                () -> assertEquals(0.5, values.get(Muscle.TRICEPS)),
                () -> assertNull(values.get(Muscle.LATS)),
                () -> assertFalse(values.containsKey(Muscle.LATS)),
                () -> assertEquals(0.0, values.at(Muscle.LATS.ordinal())));
    }

    @Test
    void cannotBeChanged() {
        MuscleValues values = of(Map.of(Muscle.QUADRICEPS, 0.4));
        assertAll(
                () -> assertThrows(UnsupportedOperationException.class, () -> values.put(Muscle.GLUTES, 0.1)),
                () -> assertThrows(UnsupportedOperationException.class, () -> values.remove(Muscle.QUADRICEPS)),
                () -> assertThrows(UnsupportedOperationException.class,
                        () -> values.entrySet().iterator().next().setValue(1.0)),
                () -> assertThrows(UnsupportedOperationException.class, values::clear));
    }
}
