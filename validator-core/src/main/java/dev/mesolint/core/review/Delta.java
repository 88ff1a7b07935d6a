package dev.mesolint.core.review;

import java.util.OptionalDouble;

/**
 * One figure at the base and at the head; a side is empty where the figure does not exist there (a session added).
 *
 * @param step the precision the figure is shown and compared at (0.1 for sets): smaller differences are no change
 */
public record Delta(OptionalDouble before, OptionalDouble after, double step) {

    public static Delta of(double before, double after, double step) {
        return new Delta(OptionalDouble.of(before), OptionalDouble.of(after), step);
    }

    /** After minus before, rounded to the step; 0 when either side is missing. */
    public double change() {
        if (before.isEmpty() || after.isEmpty()) {
            return 0;
        }
        return round(after.getAsDouble()) - round(before.getAsDouble());
    }

    /** True when the figure appears, disappears, or moves by at least one step. */
    public boolean changed() {
        if (before.isPresent() != after.isPresent()) {
            return true;
        }
        return before.isPresent() && Math.abs(change()) >= step / 2;
    }

    /** {@code value} rounded to the step. */
    public double round(double value) {
        return Math.round(value / step) * step;
    }
}
