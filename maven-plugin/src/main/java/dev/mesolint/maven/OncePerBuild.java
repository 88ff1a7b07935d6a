package dev.mesolint.maven;

import java.util.Collections;
import java.util.Map;
import java.util.WeakHashMap;

/** Remembers what was already done in a build, so the caution is logged once however many executions run. */
final class OncePerBuild {
    private static final Map<Object, Boolean> DONE = Collections.synchronizedMap(new WeakHashMap<>());

    private OncePerBuild() {
    }

    /**
     * True the first time it is called for {@code build} (an object that lives as long as one build, such as the
     * session's execution request); a {@code null} build always answers true.
     */
    static boolean first(Object build) {
        return build == null || DONE.putIfAbsent(build, Boolean.TRUE) == null;
    }
}
