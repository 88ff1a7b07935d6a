package dev.mesolint.core.rule;

import dev.mesolint.core.value.Durations;
import dev.mesolint.core.value.InvalidValueException;

/**
 * A typed, bounded rule parameter that profiles can override, e.g. {@code min-rest: 2min}.
 *
 * @param defaultValue in the parameter's base unit: seconds for durations, a fraction for percentages
 */
public record RuleParameter(String name, Kind kind, double defaultValue, double min, double max, String description) {

    /** How a parameter is written in a profile and shown in messages. */
    public enum Kind {
        INTEGER, NUMBER, DURATION, PERCENT
    }

    public RuleParameter {
        if (!name.matches("[a-z][a-z0-9-]*")) {
            throw new IllegalArgumentException("parameter names are lower-case with hyphens: " + name);
        }
        if (min > max || defaultValue < min || defaultValue > max) {
            throw new IllegalArgumentException(name + ": default " + defaultValue + " outside [" + min + ", " + max + "]");
        }
        if (description == null || description.isBlank()) {
            throw new IllegalArgumentException(name + ": a parameter needs a description");
        }
    }

    public static RuleParameter integer(String name, int defaultValue, int min, int max, String description) {
        return new RuleParameter(name, Kind.INTEGER, defaultValue, min, max, description);
    }

    public static RuleParameter number(String name, double defaultValue, double min, double max, String description) {
        return new RuleParameter(name, Kind.NUMBER, defaultValue, min, max, description);
    }

    public static RuleParameter seconds(String name, double defaultValue, double min, double max, String description) {
        return new RuleParameter(name, Kind.DURATION, defaultValue, min, max, description);
    }

    public static RuleParameter percent(String name, double defaultFraction, double min, double max,
            String description) {
        return new RuleParameter(name, Kind.PERCENT, defaultFraction, min, max, description);
    }

    /** Reads a value as written in a profile ({@code 2min}, {@code 30%}, {@code 12}), checking its bounds. */
    public double parse(String text) throws InvalidValueException {
        double value;
        try {
            value = switch (kind) {
                case DURATION -> Durations.seconds(Durations.parse(text));
                case PERCENT -> Double.parseDouble(text.trim().replace("%", "")) / 100.0;
                case INTEGER -> Integer.parseInt(text.trim());
                case NUMBER -> Double.parseDouble(text.trim());
            };
        } catch (NumberFormatException e) {
            throw new InvalidValueException("'" + text + "' is not a " + kind.name().toLowerCase(java.util.Locale.ROOT),
                    "write e.g. " + name + ": " + format(defaultValue));
        }
        if (value < min || value > max) {
            throw new InvalidValueException(name + " " + format(value) + " is outside " + format(min) + ".."
                    + format(max), "choose a value from " + format(min) + " to " + format(max));
        }
        return value;
    }

    /** The value as a profile would write it. */
    public String format(double value) {
        return switch (kind) {
            case DURATION -> Durations.format(java.time.Duration.ofMillis(Math.round(value * 1000))).replace(" ", "");
            case PERCENT -> trim(value * 100) + "%";
            case INTEGER -> Long.toString(Math.round(value));
            case NUMBER -> trim(value);
        };
    }

    /** The value as a sentence reads it: {@code 3 min}, {@code 60 s}, {@code 10%}, {@code 1.5}. */
    public String display(double value) {
        return kind == Kind.DURATION ? Durations.format(java.time.Duration.ofMillis(Math.round(value * 1000)))
                : format(value);
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(Math.round(v * 1000) / 1000.0);
    }
}
