package dev.mesolint.core.source;

import java.util.Objects;

/**
 * A place in a programme file: where the YAML node starts and ends (1-based lines and columns; the end is the
 * position just after the node's last character) and the node's JSON Pointer.
 *
 * <p>The pointer survives edits that only move lines, so waivers match on it. A location known only by its start
 * (a problem the YAML parser points at) ends where it starts.
 */
public record Location(int line, int column, int endLine, int endColumn, String pointer) {

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
        // An end before the start (a caller that knows only the start) is the start.
        if (endLine < line || (endLine == line && endColumn < column)) {
            endLine = line;
            endColumn = column;
        }
    }

    /** A place known by its start only: it ends where it starts. */
    public Location(int line, int column, String pointer) {
        this(line, column, line, column, pointer);
    }

    /** The same span under another pointer (a key's place reported for the value it names). */
    public Location withPointer(String other) {
        return new Location(line, column, endLine, endColumn, other);
    }

    // equals and hashCode written out, with the values the record's generated ones give: those go through method
    // handles that the launcher's C1-only JIT does not inline, and locations key the maps that merge findings.
    @Override
    public boolean equals(Object o) {
        return this == o || o instanceof Location l && line == l.line && column == l.column && endLine == l.endLine
                && endColumn == l.endColumn && pointer.equals(l.pointer);
    }

    @Override
    public int hashCode() {
        return (((line * 31 + column) * 31 + endLine) * 31 + endColumn) * 31 + pointer.hashCode();
    }

    @Override
    public String toString() {
        return line + ":" + column;
    }
}
