package dev.mesolint.core.value;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reps per set: a number ({@code 8}), a range ({@code 8-12}), {@code amrap} (as many as possible, to failure) or
 * {@code 5+} (at least 5, then as many as possible: to failure once the stated minimum is done).
 *
 * <p>{@code 5+} is an AMRAP set with a floor: {@link #amrap()} is true and {@link #min()} is 5. A plain
 * {@code amrap} has no floor ({@code min} 0).
 */
public record RepTarget(int min, int max, boolean amrap) {
    // equals and hashCode written out with the record's own values (see Location for why)
    @Override
    public boolean equals(Object o) {
        return this == o || o instanceof RepTarget r && min == r.min && max == r.max && amrap == r.amrap;
    }

    @Override
    public int hashCode() {
        return (min * 31 + max) * 31 + Boolean.hashCode(amrap);
    }

    public static final String HINT = "write a whole number such as 8, a range such as 8-12, 5+ (at least 5, then as many as possible) or amrap";
    public static final int MAX_REPS = 100;
    public static final RepTarget AMRAP = new RepTarget(0, 0, true);

    private static final Pattern RANGE = Pattern.compile("(\\d+)\\s*-\\s*(\\d+)");
    private static final Pattern AT_LEAST = Pattern.compile("(\\d+)\\s*\\+");

    public RepTarget {
        if (!amrap && (min < 1 || max < min || max > MAX_REPS)) {
            throw new IllegalArgumentException("bad rep range " + min + "-" + max);
        }
    }

    public static RepTarget exactly(int reps) {
        return new RepTarget(reps, reps, false);
    }

    /** {@code n+}: at least {@code n} reps, then as many as possible. */
    public static RepTarget atLeast(int reps) {
        if (reps < 1 || reps > MAX_REPS) {
            throw new IllegalArgumentException("bad rep floor " + reps);
        }
        return new RepTarget(reps, reps, true);
    }

    public static RepTarget parse(String text) throws InvalidValueException {
        String s = text == null ? "" : text.trim();
        if (s.equalsIgnoreCase("amrap")) {
            return AMRAP;
        }
        if (WholeNumbers.digitsOnly(s)) {
            return exactly(checked(text, WholeNumbers.parse(s, Integer.MAX_VALUE, text, HINT)));
        }
        Matcher floor = AT_LEAST.matcher(s);
        if (floor.matches()) {
            return atLeast(checked(text, Integer.parseInt(floor.group(1))));
        }
        Matcher m = RANGE.matcher(s);
        if (m.matches()) {
            int lo = checked(text, WholeNumbers.parse(m.group(1), Integer.MAX_VALUE, text, HINT));
            int hi = checked(text, WholeNumbers.parse(m.group(2), Integer.MAX_VALUE, text, HINT));
            if (hi <= lo) {
                throw new InvalidValueException("rep range '" + text + "' must go from fewer to more reps",
                        "write the lower number first, e.g. " + Math.min(lo, hi) + "-" + Math.max(lo, hi));
            }
            return new RepTarget(lo, hi, false);
        }
        throw new InvalidValueException("'" + text + "' is not a rep count", HINT);
    }

    private static int checked(String text, int reps) throws InvalidValueException {
        if (reps < 1 || reps > MAX_REPS) {
            throw new InvalidValueException("reps '" + text + "' must lie between 1 and " + MAX_REPS, HINT);
        }
        return reps;
    }

    /** True for {@code 5+}: an AMRAP set with a stated minimum. */
    public boolean hasFloor() {
        return amrap && min > 0;
    }

    /** The same target without its "as many as possible" part: {@code 5+} becomes {@code 5}. */
    public RepTarget withoutAmrap() {
        return hasFloor() ? exactly(min) : this;
    }

    public boolean isRange() {
        return !amrap && max > min;
    }

    /** The midpoint, used for time and volume (a range's middle is what a lifter does on average). */
    public double midpoint() {
        return (min + max) / 2.0;
    }

    @Override
    public String toString() {
        return hasFloor() ? min + "+" : amrap ? "amrap" : isRange() ? min + "-" + max : Integer.toString(min);
    }
}
