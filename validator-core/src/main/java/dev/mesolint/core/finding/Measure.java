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
    // equals and hashCode written out with the record's own values (see Location for why)
    @Override
    public boolean equals(Object o) {
        return this == o || o instanceof Measure m && Double.compare(value, m.value) == 0
                && Double.compare(limit, m.limit) == 0 && unit.equals(m.unit);
    }

    @Override
    public int hashCode() {
        return (Double.hashCode(value) * 31 + Double.hashCode(limit)) * 31 + unit.hashCode();
    }


    public Measure {
        Objects.requireNonNull(unit, "unit");
    }
}
