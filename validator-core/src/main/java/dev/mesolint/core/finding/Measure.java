package dev.mesolint.core.finding;

import java.util.Objects;

/**
 * What a rule measured against which limit, as numbers: {@code 24} credited sets against a limit of {@code 20}
 * {@code sets}. Not part of the fingerprint: a changed limit in a profile keeps a baselined finding matched.
 *
 * @param value the measured value, in {@code unit}
 * @param limit the limit the value broke, in {@code unit}
 * @param unit  the base unit, lower case: {@code sets}, {@code s} (seconds), {@code min}, {@code share} (0-1),
 *              {@code kg}, {@code reps}, {@code hours}
 */
public record Measure(double value, double limit, String unit) {

    public Measure {
        Objects.requireNonNull(unit, "unit");
    }
}
