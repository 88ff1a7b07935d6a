package dev.mesolint.core.rules;

import dev.mesolint.core.model.OneRepMaxRelation;

/** The model's %1RM relation read backwards, for messages and for loads the rules infer from reps and reserve. */
final class Relations {
    /** Brzycki's relation is undefined from 37 reps; longer efforts read as this. */
    private static final double LONGEST_EFFORT = 36;

    private Relations() {
    }

    /**
     * The share of 1RM that allows {@code repsToFailure} reps to failure: the inverse of the relation's 1RM estimate
     * from a set of that many reps to failure (Brzycki: 10 reps at 75%). Efforts beyond the relation's range read as
     * 36 reps.
     */
    static double shareFor(OneRepMaxRelation relation, double repsToFailure) {
        return 1 / relation.oneRepMax(1, Math.min(LONGEST_EFFORT, Math.max(1, repsToFailure)));
    }

    /** {@link #shareFor} rounded down to the 2.5% steps loads are written in: {@code 72.5%}. */
    static String loadFor(OneRepMaxRelation relation, double repsToFailure) {
        return Texts.loadStepDown(shareFor(relation, repsToFailure));
    }

    static String name(OneRepMaxRelation relation) {
        return switch (relation) {
            case EPLEY -> "Epley";
            case BRZYCKI -> "Brzycki";
            case MEAN -> "mean of Epley and Brzycki";
        };
    }
}
