package dev.mesolint.core.catalogue;

/** Compound (several joints move) or isolation (one joint moves). */
public enum ExerciseKind implements Named {
    COMPOUND, ISOLATION
}
