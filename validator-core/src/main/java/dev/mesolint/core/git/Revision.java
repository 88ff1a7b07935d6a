package dev.mesolint.core.git;

import java.util.Objects;

/**
 * A commit, as the user named it and as git knows it.
 *
 * @param shown  what the user wrote ({@code main}, {@code HEAD~1}), or how it was found ("merge base with main")
 * @param commit the full commit id
 */
public record Revision(String shown, String commit) {

    public Revision {
        Objects.requireNonNull(shown, "shown");
        Objects.requireNonNull(commit, "commit");
    }

    /** The abbreviated commit id, as people quote it. */
    public String shortCommit() {
        return commit.substring(0, Math.min(10, commit.length()));
    }

    /** {@code main (3f2a9c1d0b)}. */
    public String label() {
        return shown.equals(commit) ? shortCommit() : shown + " (" + shortCommit() + ")";
    }
}
