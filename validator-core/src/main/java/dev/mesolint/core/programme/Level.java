package dev.mesolint.core.programme;

import dev.mesolint.core.catalogue.Named;

/** The lifter's training age. */
public enum Level implements Named {
    NOVICE, INTERMEDIATE, ADVANCED
}
