package dev.mesolint.core.git;

import java.util.Objects;
import java.util.Optional;

/**
 * One file that differs between two revisions, paths relative to the checked root with '/' separators.
 *
 * @param before the path at the base; empty for an added file
 * @param after  the path at the head; empty for a deleted file
 */
public record PathChange(Kind kind, Optional<String> before, Optional<String> after) {

    /** What happened to the file. */
    public enum Kind {
        ADDED, DELETED, MODIFIED, RENAMED
    }

    public PathChange {
        Objects.requireNonNull(kind, "kind");
        if (before.isEmpty() && after.isEmpty()) {
            throw new IllegalArgumentException("a change has a path before or after");
        }
    }
}
