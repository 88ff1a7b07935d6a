package dev.mesolint.core.catalogue;

import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

/**
 * What is worked out of a catalogue entry (the model's per-exercise figures, a rule's credit arrays), made once per
 * entry for the whole run rather than once per file: the built-in entries are the same objects in every file. Kept
 * by the entry's id (one shared instance, {@link ExerciseIds}) and given back only for that very entry, so a
 * repository or programme entry that reuses an id gets its own. Thread-safe; the values must be immutable. Bounded,
 * past which values are made and not kept.
 *
 * @param <V> what is made of an entry
 */
public final class PerEntry<V> {
    private static final int MAX_ENTRIES = 4096;

    private final Function<Exercise, V> make;
    private final Function<V, Exercise> entryOf;
    private final ConcurrentHashMap<String, V> made = new ConcurrentHashMap<>();

    /** {@code entryOf} gives back the entry a value was made of. */
    public PerEntry(Function<Exercise, V> make, Function<V, Exercise> entryOf) {
        this.make = make;
        this.entryOf = entryOf;
    }

    /** What was made of {@code entry}, made now if this entry has none yet. */
    public V of(Exercise entry) {
        V known = made.get(entry.id());
        if (known != null && entryOf.apply(known) == entry) {
            return known;
        }
        V value = make.apply(entry);
        if (made.size() < MAX_ENTRIES) {
            made.put(entry.id(), value);
        }
        return value;
    }
}
