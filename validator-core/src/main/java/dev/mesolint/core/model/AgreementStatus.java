package dev.mesolint.core.model;

/** How a set's load agrees with its reps and stated effort; read by the effort-conflict rule. */
public enum AgreementStatus {
    /** Fewer than two effort statements to compare (or a load whose 1RM is unknown). */
    NOT_CHECKED,
    /** Everything given agrees within the tolerance. */
    AGREE,
    /** The load allows fewer reps to failure than the top of the rep range, by more than the tolerance. */
    INFEASIBLE,
    /** The reps fit the load, but not with the least reserve stated: the set will be harder than written. */
    HARDER_THAN_STATED,
    /** The load leaves far more reps in reserve than stated: the set will be easier than written. */
    MISLABELLED,
    /** Stated RIR and RPE disagree by more than the tolerance. */
    RIR_RPE_DIFFER
}
