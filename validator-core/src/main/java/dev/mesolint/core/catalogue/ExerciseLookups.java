package dev.mesolint.core.catalogue;

import java.util.HashMap;
import java.util.Map;
import java.util.function.Function;

/**
 * What one computation (a file's rules, a programme's model) made of each exercise id, made once per id. A plain hash
 * map is enough: a string keeps its hash, and the map tries the key's reference before its characters, so the few id
 * strings a file's sets share are found without comparing text (an identity map would cost more: the JIT the check
 * runs with calls into the VM for an object's identity hash). An id the catalogue does not know is remembered too.
 * Confined to the thread of that computation.
 *
 * @param <V> what is made of an exercise id (null when there is nothing to make)
 */
public final class ExerciseLookups<V> {
    /** Stands for an id {@code make} gave nothing for, so that misses are remembered too. */
    private static final Object NOTHING = new Object();

    private final Function<String, V> make;
    private final Map<String, Object> made = new HashMap<>();

    public ExerciseLookups(Function<String, V> make) {
        this.make = make;
    }

    /** What was made of {@code id}; null when {@code make} gave nothing. */
    public V get(String id) {
        Object known = made.get(id);
        if (known == null) {
            V value = make.apply(id);
            known = value == null ? NOTHING : value;
            made.put(id, known);
        }
        @SuppressWarnings("unchecked") // only make's values and NOTHING are stored
        V value = known == NOTHING ? null : (V) known;
        return value;
    }
}
