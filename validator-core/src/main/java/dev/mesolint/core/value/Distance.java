package dev.mesolint.core.value;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A distance covered in one set, such as a loaded carry: {@code 40m}.
 *
 * <p>Metres only: a carry is marked out on the gym floor, and one unit keeps every file comparable.
 */
public record Distance(double metres) {
    public static final String HINT = "write the distance in metres, e.g. 40m";
    /** 400 m: a longer carry is a conditioning piece, not a set. */
    public static final double MAX_METRES = 400;

    private static final Pattern METRES = Pattern.compile("(\\d+(?:\\.\\d+)?)\\s*m");

    public Distance {
        if (!(metres > 0) || metres > MAX_METRES) {
            throw new IllegalArgumentException("bad distance " + metres);
        }
    }

    public static Distance parse(String text) throws InvalidValueException {
        String s = text == null ? "" : text.trim();
        Matcher m = METRES.matcher(s);
        if (!m.matches()) {
            throw new InvalidValueException("'" + text + "' is not a distance", HINT);
        }
        double metres = Double.parseDouble(m.group(1));
        if (metres <= 0 || metres > MAX_METRES) {
            throw new InvalidValueException("distance '" + text + "' must be more than 0 m and at most "
                    + (int) MAX_METRES + " m", HINT);
        }
        return new Distance(metres);
    }

    @Override
    public String toString() {
        return Durations.trim(metres) + "m";
    }
}
