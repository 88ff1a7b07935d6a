package dev.mesolint.maven;

import java.util.Collections;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import java.util.WeakHashMap;

/**
 * Remembers what was already done in a build, so the caution (and the rule-set notice) is logged once however many
 * executions run.
 */
final class OncePerBuild {
    private static final Map<Object, Set<String>> DONE = Collections.synchronizedMap(new WeakHashMap<>());

    private OncePerBuild() {
    }

    /**
     * True the first time it is called for {@code build} (an object that lives as long as one build, such as the
     * session's execution request); a {@code null} build always answers true.
     */
    static boolean first(Object build) {
        return first(build, "caution");
    }

    /** True the first time {@code what} is asked about in {@code build}; a {@code null} build always answers true. */
    static boolean first(Object build, String what) {
        if (build == null) {
            return true;
        }
        synchronized (DONE) {
            return DONE.computeIfAbsent(build, b -> new HashSet<>()).add(what);
        }
    }
}
