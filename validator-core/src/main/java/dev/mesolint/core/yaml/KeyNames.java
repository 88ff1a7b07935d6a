package dev.mesolint.core.yaml;

import java.util.concurrent.ConcurrentHashMap;

/**
 * One shared instance of each mapping key name ({@code sets}, {@code reps}, {@code rest}), the same instance as
 * the string constants the schema, the binders and the rules look keys up with. A key is then looked up many times
 * per document (schema, duplicate check, binding) and each lookup matches by reference instead of comparing
 * characters. Bounded, so that a document of made-up keys cannot grow it.
 */
final class KeyNames {
    private static final int MAX_NAMES = 4096;
    private static final int MAX_LENGTH = 64;
    private static final ConcurrentHashMap<String, String> KNOWN = new ConcurrentHashMap<>();

    private KeyNames() {
    }

    static String canonical(String name) {
        String known = KNOWN.get(name);
        if (known != null) {
            return known;
        }
        if (name.length() > MAX_LENGTH || KNOWN.size() >= MAX_NAMES) {
            return name;
        }
        String shared = name.intern(); // the JVM's instance: the one every string constant of that text is
        KNOWN.putIfAbsent(shared, shared);
        return shared;
    }
}
