package dev.mesolint.core.finding;

import java.util.Locale;
import java.util.Optional;

/** How much a finding matters. Ordered from most to least severe; {@code OFF} disables a rule. */
public enum Severity {
    ERROR, WARNING, INFO, OFF;

    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** True when this severity is at least as severe as {@code level}. */
    public boolean atLeast(Severity level) {
        return this != OFF && compareTo(level) <= 0;
    }

    /** A level a run can fail on: error, warning or info (never off). */
    public static Optional<Severity> parseFailLevel(String text) {
        return parse(text).filter(s -> s != OFF);
    }

    public static Optional<Severity> parse(String text) {
        for (Severity s : values()) {
            if (s.label().equalsIgnoreCase(text == null ? "" : text.trim())) {
                return Optional.of(s);
            }
        }
        return Optional.empty();
    }
}
