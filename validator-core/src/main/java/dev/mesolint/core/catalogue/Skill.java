package dev.mesolint.core.catalogue;

/** Technical demand of an exercise. */
public enum Skill implements Named {
    LOW, MODERATE, HIGH
}
