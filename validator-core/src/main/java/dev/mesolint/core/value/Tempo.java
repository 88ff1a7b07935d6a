package dev.mesolint.core.value;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Seconds per phase of a rep: lowering, pause at the bottom, lifting, pause at the top ({@code 3-1-1-0}).
 * {@code x} marks a phase done as fast as possible.
 */
public record Tempo(double lowering, double bottomPause, double lifting, double topPause, boolean explosiveLift) {
    public static final String HINT = "write four phases in seconds, lowering-pause-lifting-pause, e.g. 3-1-1-0 (x = explosive)";
    /** Time credited to an explosive phase (common practice: well under a second). */
    public static final double EXPLOSIVE_SECONDS = 0.5;

    private static final String PHASE = "(\\d{1,2}|[xX])";
    private static final Pattern FORM = Pattern.compile(PHASE + "-" + PHASE + "-" + PHASE + "-" + PHASE);

    public static Tempo parse(String text) throws InvalidValueException {
        Matcher m = FORM.matcher(text == null ? "" : text.trim());
        if (!m.matches()) {
            throw new InvalidValueException("'" + text + "' is not a tempo", HINT);
        }
        return new Tempo(phase(m.group(1)), phase(m.group(2)), phase(m.group(3)), phase(m.group(4)),
                m.group(3).equalsIgnoreCase("x"));
    }

    private static double phase(String s) {
        return s.equalsIgnoreCase("x") ? EXPLOSIVE_SECONDS : Integer.parseInt(s);
    }

    /** Seconds for one rep. */
    public double secondsPerRep() {
        return lowering + bottomPause + lifting + topPause;
    }

    @Override
    public String toString() {
        return fmt(lowering) + "-" + fmt(bottomPause) + "-" + (explosiveLift ? "x" : fmt(lifting)) + "-" + fmt(topPause);
    }

    private static String fmt(double v) {
        return Durations.trim(v);
    }
}
