package dev.mesolint.core.model;

/**
 * Prilepin's total reps in a session for the intensity zones 1 to 4 (55-70%, 70-80%, 80-90%, 90% and over, the
 * default bounds {@code intensityZone1From..4From}), in the version docs/model.md gives: the one most often
 * reproduced in English, from memory. It summarises what elite weightlifters did in the competition lifts.
 */
public final class PrilepinTable {
    private static final int[][] SESSION_REPS = {{18, 30}, {12, 24}, {10, 20}, {4, 10}};

    private PrilepinTable() {
    }

    /** Fewest total reps in a session for zone {@code zone} (1 to 4). */
    public static int minReps(int zone) {
        return SESSION_REPS[zone - 1][0];
    }

    /** Most total reps in a session for zone {@code zone} (1 to 4). */
    public static int maxReps(int zone) {
        return SESSION_REPS[zone - 1][1];
    }
}
