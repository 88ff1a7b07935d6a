package dev.mesolint.core.value;

import java.time.Duration;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads rest and other durations: {@code 90s}, {@code 2min}, {@code 2.5min}, {@code 2:30}.
 *
 * <p>A bare number is refused on purpose: {@code rest: 2} could mean seconds or minutes.
 */
public final class Durations {
    public static final String HINT = "write a duration with its unit: 90s, 2min, 2.5min or 2:30";
    /** One hour: longer rests are almost certainly a typo (e.g. 90min for 90s). */
    public static final Duration MAX = Duration.ofHours(1);

    private static final Pattern SECONDS = Pattern.compile("(\\d+(?:\\.\\d+)?)\\s*s");
    private static final Pattern MINUTES = Pattern.compile("(\\d+(?:\\.\\d+)?)\\s*min");
    private static final Pattern CLOCK = Pattern.compile("(\\d+):(\\d{2})");

    private Durations() {
    }

    public static Duration parse(String text) throws InvalidValueException {
        String s = text == null ? "" : text.trim().toLowerCase(java.util.Locale.ROOT);
        Duration result;
        Matcher m;
        if ((m = SECONDS.matcher(s)).matches()) {
            result = ofSeconds(Double.parseDouble(m.group(1)));
        } else if ((m = MINUTES.matcher(s)).matches()) {
            result = ofSeconds(Double.parseDouble(m.group(1)) * 60);
        } else if ((m = CLOCK.matcher(s)).matches()) {
            int seconds = WholeNumbers.parse(m.group(2), 99, text, HINT);
            if (seconds >= 60) {
                throw new InvalidValueException("'" + text + "' has " + seconds + " seconds after the colon",
                        "seconds after the colon run from 00 to 59, e.g. 2:30");
            }
            // Over an hour is refused below; the cap keeps a long minute count from overflowing first.
            int minutes = WholeNumbers.parse(m.group(1), 24 * 60, text, "a rest is at most an hour, e.g. 2:30");
            result = Duration.ofSeconds(minutes * 60L + seconds);
        } else if (s.matches("\\d+(\\.\\d+)?")) {
            throw new InvalidValueException("'" + text + "' has no unit", "write " + s + "s or " + s + "min");
        } else {
            throw new InvalidValueException("'" + text + "' is not a duration", HINT);
        }
        if (result.compareTo(MAX) > 0) {
            throw new InvalidValueException("'" + text + "' is longer than one hour", "check the unit: 90s, not 90min");
        }
        return result;
    }

    /** Ten minutes: the longest timed hold a set may prescribe. */
    public static final Duration MAX_HOLD = Duration.ofMinutes(10);

    /** A timed hold ({@code hold: 30s}): a duration of at most {@link #MAX_HOLD}. */
    public static Duration parseHold(String text) throws InvalidValueException {
        Duration d = parse(text);
        if (d.isZero() || d.compareTo(MAX_HOLD) > 0) {
            throw new InvalidValueException("a hold of '" + text + "' is not between 1 s and 10 min",
                    "write a hold such as 30s or 1min; a longer effort is a conditioning piece, not a set");
        }
        return d;
    }

    private static Duration ofSeconds(double seconds) {
        return Duration.ofMillis(Math.round(seconds * 1000));
    }

    /** Seconds as a decimal number, for the training model. */
    public static double seconds(Duration d) {
        return d.toMillis() / 1000.0;
    }

    /** A short human form: {@code 75 s}, {@code 2 min}, {@code 2.5 min}. */
    public static String format(Duration d) {
        double s = seconds(d);
        if (s < 120 && s % 60 != 0) {
            return trim(s) + " s";
        }
        return trim(s / 60) + " min";
    }

    static String trim(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(Math.round(v * 100) / 100.0);
    }
}
