package dev.mesolint.core.catalogue;

/**
 * An exercise's job in a session: a {@code main} lift (heavy compound or power work the session is built around)
 * or {@code assistance} work that supports it. Rest guidance differs by role (ACSM 2009 progression models).
 */
public enum Role implements Named {
    MAIN, ASSISTANCE
}
