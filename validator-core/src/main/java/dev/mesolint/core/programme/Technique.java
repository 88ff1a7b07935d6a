package dev.mesolint.core.programme;

import dev.mesolint.core.catalogue.Named;

/** A fatigue technique applied to the last set of an exercise. */
public enum Technique implements Named {
    DROP_SET, REST_PAUSE
}
