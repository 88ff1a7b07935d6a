package dev.mesolint.core.source;

import java.util.Objects;

/**
 * A place in a programme file: 1-based line and column, and the JSON Pointer of the YAML node.
 *
 * <p>The pointer survives edits that only move lines, so baselines and waivers match on it.
 */
public record Location(int line, int column, String pointer) {

    /** The start of a file, for findings about the file as a whole. */
    public static final Location START = new Location(1, 1, "");

    public Location {
        if (line < 1) {
            throw new IllegalArgumentException("line must be >= 1, was " + line);
        }
        if (column < 1) {
            throw new IllegalArgumentException("column must be >= 1, was " + column);
        }
        Objects.requireNonNull(pointer, "pointer");
    }

    @Override
    public String toString() {
        return line + ":" + column;
    }
}
