package dev.mesolint.core.catalogue;

import java.util.concurrent.ConcurrentHashMap;

/**
 * One shared instance of each exercise id: a programme names the same few exercises on every week, and the model and
 * the rules look each entry up by its id many times per file. With the programme's ids and the catalogue's the
 * same instance, those lookups match by reference instead of comparing the text a byte at a time (the JIT a check
 * runs with has no faster string comparison). A map of its own rather than the JVM's shared strings: it reads the
 * hash a string keeps, where {@code String.intern} works it out again in the VM on every call. Bounded in ids and
 * length, so that made-up text cannot fill it; past the bounds an id is used as it is.
 */
public final class ExerciseIds {
    private static final int MAX_IDS = 8192;
    private static final int MAX_LENGTH = 80;
    private static final ConcurrentHashMap<String, String> SHARED = new ConcurrentHashMap<>();

    private ExerciseIds() {
    }

    /** The shared instance of {@code id}; null stays null. */
    public static String shared(String id) {
        if (id == null) {
            return null;
        }
        String known = SHARED.get(id);
        if (known != null) {
            return known;
        }
        if (id.length() > MAX_LENGTH || SHARED.size() >= MAX_IDS) {
            return id;
        }
        known = SHARED.putIfAbsent(id, id);
        return known == null ? id : known;
    }
}
