package dev.mesolint.core.programme;

import dev.mesolint.core.catalogue.Named;

/** The block's main aim; selects the default rule profile. */
public enum Goal implements Named {
    HYPERTROPHY, STRENGTH, GENERAL_FITNESS
}
