package dev.mesolint.core.catalogue;

import java.util.HashMap;
import java.util.Map;
import java.util.function.Function;

/**
 * What one computation (a file's rules, a programme's model) made of each exercise id, made once per id. A plain hash
 * map: a string keeps its hash, and the map tries the key's reference before its characters. So what is made is
 * kept under the catalogue entry's own id string, the one the model's figures carry on every set: a rule's walk
 * over the sets finds each without comparing text, which the JIT the check runs with does a byte at a time (an
 * identity map would cost more: that JIT calls into the VM for an object's identity hash). An id the catalogue does
 * not know is remembered too. Confined to the thread of that computation.
 *
 * @param <V> what is made of an exercise id (null when there is nothing to make)
 */
public final class ExerciseLookups<V> {
    /** Stands for an id {@code make} gave nothing for, so that misses are remembered too. */
    private static final Object NOTHING = new Object();

    private final Function<String, V> make;
    /** The catalogue's id string of what was made; null to keep it under the string it was asked for. */
    private final Function<V, String> idOf;
    private final Map<String, Object> made = new HashMap<>();

    public ExerciseLookups(Function<String, V> make) {
        this(make, null);
    }

    /** Lookups that keep what {@code make} gives under {@code idOf} of it, when that spells the id asked for. */
    public ExerciseLookups(Function<String, V> make, Function<V, String> idOf) {
        this.make = make;
        this.idOf = idOf;
    }

    /** What was made of {@code id}; null when {@code make} gave nothing. */
    public V get(String id) {
        Object known = made.get(id);
        if (known == null) {
            V value = make.apply(id);
            known = value == null ? NOTHING : value;
            String own = value == null || idOf == null ? id : idOf.apply(value);
            made.put(own != null && own.equals(id) ? own : id, known);
        }
        @SuppressWarnings("unchecked") // only make's values and NOTHING are stored
        V value = known == NOTHING ? null : (V) known;
        return value;
    }
}
