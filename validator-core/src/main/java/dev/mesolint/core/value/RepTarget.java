package dev.mesolint.core.value;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reps per set: a number ({@code 8}), a range ({@code 8-12}) or {@code amrap} (as many as possible, to failure).
 */
public record RepTarget(int min, int max, boolean amrap) {
    public static final String HINT = "write a whole number such as 8, a range such as 8-12, or amrap";
    public static final int MAX_REPS = 100;
    public static final RepTarget AMRAP = new RepTarget(0, 0, true);

    private static final Pattern RANGE = Pattern.compile("(\\d+)\\s*-\\s*(\\d+)");

    public RepTarget {
        if (!amrap && (min < 1 || max < min || max > MAX_REPS)) {
            throw new IllegalArgumentException("bad rep range " + min + "-" + max);
        }
    }

    public static RepTarget exactly(int reps) {
        return new RepTarget(reps, reps, false);
    }

    public static RepTarget parse(String text) throws InvalidValueException {
        String s = text == null ? "" : text.trim();
        if (s.equalsIgnoreCase("amrap")) {
            return AMRAP;
        }
        if (s.matches("\\d+")) {
            return exactly(checked(text, WholeNumbers.parse(s, Integer.MAX_VALUE, text, HINT)));
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

    public boolean isRange() {
        return !amrap && max > min;
    }

    /** The midpoint, used for time and volume (a range's middle is what a lifter does on average). */
    public double midpoint() {
        return (min + max) / 2.0;
    }

    @Override
    public String toString() {
        return amrap ? "amrap" : isRange() ? min + "-" + max : Integer.toString(min);
    }
}
