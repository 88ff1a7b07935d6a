package dev.mesolint.core.value;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** A load: a share of the lifter's 1RM ({@code 75%}) or an absolute weight ({@code 80kg}, {@code 175lb}). */
public sealed interface Load permits Load.Relative, Load.Absolute {

    String HINT = "write a share of 1RM such as 75%, or a weight with its unit such as 80kg or 175lb";

    /** A share of 1RM; {@code fraction} 0.75 for {@code 75%}. */
    record Relative(double fraction) implements Load {
        // equals and hashCode written out with the record's own values (see Location for why)
        @Override
        public boolean equals(Object o) {
            return this == o || o instanceof Relative r && Double.compare(fraction, r.fraction) == 0;
        }

        @Override
        public int hashCode() {
            return Double.hashCode(fraction);
        }

        public Relative {
            if (!(fraction > 0 && fraction <= 1.0)) {
                throw new IllegalArgumentException("fraction must be in (0, 1], was " + fraction);
            }
        }

        @Override
        public String toString() {
            return Durations.trim(fraction * 100) + "%";
        }
    }

    /** An absolute weight. */
    record Absolute(double amount, LoadUnit unit) implements Load {
        @Override
        public boolean equals(Object o) {
            return this == o || o instanceof Absolute a && Double.compare(amount, a.amount) == 0 && unit == a.unit;
        }

        @Override
        public int hashCode() {
            return Double.hashCode(amount) * 31 + unit.hashCode();
        }

        public Absolute {
            if (!(amount > 0)) {
                throw new IllegalArgumentException("amount must be > 0, was " + amount);
            }
        }

        public double in(LoadUnit target) {
            return unit.convert(amount, target);
        }

        @Override
        public String toString() {
            return Durations.trim(amount) + unit.symbol();
        }
    }

    Pattern FORM = Pattern.compile("(\\d+(?:\\.\\d+)?)\\s*(%|kg|lb)");

    static Load parse(String text) throws InvalidValueException {
        String s = text == null ? "" : text.trim().toLowerCase(Locale.ROOT);
        Matcher m = FORM.matcher(s);
        if (!m.matches()) {
            if (s.matches("\\d+(\\.\\d+)?")) {
                throw new InvalidValueException("load '" + text + "' has no unit", "write " + s + "% for a share of 1RM, or "
                        + s + "kg / " + s + "lb for a weight");
            }
            throw new InvalidValueException("'" + text + "' is not a load", HINT);
        }
        double amount = Double.parseDouble(m.group(1));
        if (amount <= 0) {
            throw new InvalidValueException("load '" + text + "' must be above zero", HINT);
        }
        if (m.group(2).equals("%")) {
            if (amount > 100) {
                throw new InvalidValueException("load '" + text + "' is above 100% of 1RM, which no set of full reps can use",
                        "use at most 100%; write supramaximal eccentric work as a note");
            }
            return new Relative(amount / 100.0);
        }
        return new Absolute(amount, LoadUnit.fromSymbol(m.group(2)));
    }
}
