package dev.mesolint.core.model;

/** Which part of a set's prescription gave the model its reps in reserve. */
public enum EffortSource {
    /** Stated reps in reserve (a range counts at its midpoint). */
    RIR,
    /** Stated RPE, read on the RIR-based scale: RIR = 10 - RPE. */
    RPE,
    /** Derived from the load: reps to failure at that share of 1RM, minus the reps prescribed. */
    LOAD,
    /** As many reps as possible: to failure, no rep in reserve. */
    AMRAP,
    /** Nothing states the effort: the set is counted apart and never as a hard set. */
    UNKNOWN
}
