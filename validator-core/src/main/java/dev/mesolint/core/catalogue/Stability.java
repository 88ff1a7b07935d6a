package dev.mesolint.core.catalogue;

/** Whether the exercise is done on a stable base or on an unstable surface or implement. */
public enum Stability implements Named {
    STABLE, UNSTABLE
}
