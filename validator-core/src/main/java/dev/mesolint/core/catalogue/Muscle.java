package dev.mesolint.core.catalogue;

/** The muscles (or muscle groups) that sets are credited to. */
public enum Muscle implements Named {
    CHEST, LATS, UPPER_BACK, TRAPS, FRONT_DELTS, SIDE_DELTS, REAR_DELTS, BICEPS, TRICEPS, FOREARMS,
    ABS, OBLIQUES, LOWER_BACK, GLUTES, QUADRICEPS, HAMSTRINGS, ADDUCTORS, CALVES
}
