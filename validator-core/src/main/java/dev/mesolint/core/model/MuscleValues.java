package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Muscle;
import java.util.AbstractMap;
import java.util.AbstractSet;
import java.util.Iterator;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;
import java.util.function.BiConsumer;

/**
 * An unmodifiable muscle-to-figure map over an array indexed by muscle ordinal, iterating in muscle order like an
 * {@code EnumMap}. The model fills one per set (fatigue before it, stimulus per muscle); reports read few of them,
 * so a set pays for an array, not for a map of boxed values.
 */
final class MuscleValues extends AbstractMap<Muscle, Double> {
    private static final Muscle[] MUSCLES = Muscle.values();

    static {
        if (MUSCLES.length > Long.SIZE) {
            throw new IllegalStateException("a muscle set is held in one long: at most 64 muscles");
        }
    }

    /** The figure of each muscle in {@code present}, by ordinal; owned by this map once it is built. */
    private final double[] byOrdinal;
    /** Bit {@code i} is set when muscle {@code i} has a figure. */
    private final long present;

    /** Takes {@code byOrdinal} over: the caller must not change it afterwards. */
    MuscleValues(double[] byOrdinal, long present) {
        this.byOrdinal = byOrdinal;
        this.present = present;
    }

    static int muscleCount() {
        return MUSCLES.length;
    }

    static long bit(int ordinal) {
        return 1L << ordinal;
    }

    /** The figure of the muscle with this ordinal; 0 when it has none. */
    double at(int ordinal) {
        return (present & bit(ordinal)) != 0 ? byOrdinal[ordinal] : 0;
    }

    @Override
    public int size() {
        return Long.bitCount(present);
    }

    @Override
    public boolean isEmpty() {
        return present == 0;
    }

    @Override
    public boolean containsKey(Object key) {
        return key instanceof Muscle m && (present & bit(m.ordinal())) != 0;
    }

    @Override
    public Double get(Object key) {
        return containsKey(key) ? byOrdinal[((Muscle) key).ordinal()] : null;
    }

    @Override
    public void forEach(BiConsumer<? super Muscle, ? super Double> action) {
        for (long left = present; left != 0; left &= left - 1) {
            int i = Long.numberOfTrailingZeros(left);
            action.accept(MUSCLES[i], byOrdinal[i]);
        }
    }

    @Override
    public Set<Map.Entry<Muscle, Double>> entrySet() {
        return new AbstractSet<>() {
            @Override
            public int size() {
                return MuscleValues.this.size();
            }

            @Override
            public Iterator<Map.Entry<Muscle, Double>> iterator() {
                return new Iterator<>() {
                    private long left = present;

                    @Override
                    public boolean hasNext() {
                        return left != 0;
                    }

                    @Override
                    public Map.Entry<Muscle, Double> next() {
                        if (left == 0) {
                            throw new NoSuchElementException();
                        }
                        int i = Long.numberOfTrailingZeros(left);
                        left &= left - 1;
                        return new AbstractMap.SimpleImmutableEntry<>(MUSCLES[i], byOrdinal[i]);
                    }
                };
            }
        };
    }
}
