package dev.mesolint.core.finding;

import java.util.Objects;

/**
 * Where a finding is, in terms that do not move when a neighbour is inserted: the programme (its id; the file path
 * only where the file has no readable id) and the logical path of the node it points at
 * ({@code /weeks/week=2/sessions/day=1/work/exercise=barbell-back-squat#1/sets/2}): weeks by number, sessions by
 * day, exercises by id and occurrence within their list. Line numbers, list positions of named entries, and the
 * message are never part of it.
 *
 * @param programme {@code id:harbour-strength-a}, or {@code file:programmes/a.yaml} for a file without an id
 * @param path      the logical path; empty for the file as a whole
 */
public record Anchor(String programme, String path) {

    public Anchor {
        Objects.requireNonNull(programme, "programme");
        Objects.requireNonNull(path, "path");
    }

    /** The anchor of a programme with this id. */
    public static Anchor ofProgramme(String id, String path) {
        return new Anchor("id:" + id, path);
    }

    /** The anchor of a file whose programme id is unknown (it did not load). */
    public static Anchor ofFile(String file, String path) {
        return new Anchor("file:" + file, path);
    }
}
