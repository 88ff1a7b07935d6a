package dev.mesolint.core.value;

/**
 * Effort on the RIR-based RPE scale (Zourdos et al. 2016): 10 = no rep left, 9 = one, 8 = two; halves allowed, 5..10.
 */
public record Rpe(double value) {
    public static final String HINT = "write an RPE from 5 to 10 in steps of 0.5, e.g. 8 or 8.5";

    public Rpe {
        if (value < 5 || value > 10 || value * 2 != Math.rint(value * 2)) {
            throw new IllegalArgumentException("bad RPE " + value);
        }
    }

    public static Rpe parse(String text) throws InvalidValueException {
        String s = text == null ? "" : text.trim();
        double v;
        try {
            v = Double.parseDouble(s);
        } catch (NumberFormatException e) {
            throw new InvalidValueException("'" + text + "' is not an RPE value", HINT);
        }
        if (v < 5 || v > 10) {
            throw new InvalidValueException("RPE '" + text + "' is outside 5..10", HINT);
        }
        if (v * 2 != Math.rint(v * 2)) {
            throw new InvalidValueException("RPE '" + text + "' is not a whole or half point",
                    "round to the nearest half point, e.g. " + Durations.trim(Math.round(v * 2) / 2.0));
        }
        return new Rpe(v);
    }

    // equals and hashCode written out with the values the record's generated ones give: those link through method
    // handles the first time they run, and Rpe's was the one such link left in a check (see Location).
    @Override
    public boolean equals(Object o) {
        return this == o || o instanceof Rpe r && Double.compare(value, r.value) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(value);
    }

    /** Reps in reserve on the RIR-based scale: {@code 10 - RPE}. */
    public double repsInReserve() {
        return 10 - value;
    }

    @Override
    public String toString() {
        return Durations.trim(value);
    }
}
