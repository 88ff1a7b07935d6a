package dev.mesolint.core.value;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Reps in reserve at the end of a set: one value ({@code 2}) or a range ({@code 1-2}), 0..10. */
public record RirRange(double min, double max) {
    // equals and hashCode written out with the record's own values (see Location for why)
    @Override
    public boolean equals(Object o) {
        return this == o
                || o instanceof RirRange r && Double.compare(min, r.min) == 0 && Double.compare(max, r.max) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(min) * 31 + Double.hashCode(max);
    }

    public static final String HINT = "write reps in reserve from 0 to 10, e.g. 2, or a range such as 1-2";
    public static final double LIMIT = 10;

    private static final String NUMBER = "(\\d+(?:\\.5)?)";
    private static final Pattern SINGLE = Pattern.compile(NUMBER);
    private static final Pattern RANGE = Pattern.compile(NUMBER + "\\s*-\\s*" + NUMBER);

    public RirRange {
        if (min < 0 || max < min || max > LIMIT) {
            throw new IllegalArgumentException("bad RIR range " + min + "-" + max);
        }
    }

    public static RirRange of(double rir) {
        return new RirRange(rir, rir);
    }

    public static RirRange parse(String text) throws InvalidValueException {
        String s = text == null ? "" : text.trim();
        Matcher m;
        if ((m = SINGLE.matcher(s)).matches()) {
            double v = Double.parseDouble(m.group(1));
            check(text, v);
            return of(v);
        }
        if ((m = RANGE.matcher(s)).matches()) {
            double lo = Double.parseDouble(m.group(1));
            double hi = Double.parseDouble(m.group(2));
            check(text, lo);
            check(text, hi);
            if (hi <= lo) {
                throw new InvalidValueException("RIR range '" + text + "' must go from the lower to the higher value",
                        "write e.g. 1-2");
            }
            return new RirRange(lo, hi);
        }
        throw new InvalidValueException("'" + text + "' is not a reps-in-reserve value", HINT);
    }

    private static void check(String text, double v) throws InvalidValueException {
        if (v > LIMIT) {
            throw new InvalidValueException("RIR '" + text + "' is above 10", HINT);
        }
    }

    public double midpoint() {
        return (min + max) / 2.0;
    }

    public RirRange plus(double delta) {
        return new RirRange(clamp(min + delta), clamp(max + delta));
    }

    private static double clamp(double v) {
        return Math.max(0, Math.min(LIMIT, v));
    }

    @Override
    public String toString() {
        return min == max ? Durations.trim(min) : Durations.trim(min) + "-" + Durations.trim(max);
    }
}
