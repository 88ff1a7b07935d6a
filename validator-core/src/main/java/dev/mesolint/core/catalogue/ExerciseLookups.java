package dev.mesolint.core.catalogue;

import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.Map;
import java.util.function.Function;

/**
 * What one computation (a file's rules, a programme's model) made of each exercise id, made once per id. Looked up by
 * the id string's reference first: a file's sets share a few id strings (the programme's and the catalogue's), so
 * most lookups never compare characters. An id the catalogue does not know is remembered too. Confined to the thread
 * of that computation.
 *
 * @param <V> what is made of an exercise id (null when there is nothing to make)
 */
public final class ExerciseLookups<V> {
    /** Stands for an id {@code make} gave nothing for, so that misses are remembered too. */
    private static final Object NOTHING = new Object();

    private final Function<String, V> make;
    private final Map<String, Object> byText = new HashMap<>();
    private final Map<String, Object> byReference = new IdentityHashMap<>();

    public ExerciseLookups(Function<String, V> make) {
        this.make = make;
    }

    /** What was made of {@code id}; null when {@code make} gave nothing. */
    public V get(String id) {
        Object known = byReference.get(id);
        if (known == null) {
            known = byText.get(id);
            if (known == null) {
                V made = make.apply(id);
                known = made == null ? NOTHING : made;
                byText.put(id, known);
            }
            byReference.put(id, known);
        }
        @SuppressWarnings("unchecked") // only make's values and NOTHING are stored
        V value = known == NOTHING ? null : (V) known;
        return value;
    }
}
