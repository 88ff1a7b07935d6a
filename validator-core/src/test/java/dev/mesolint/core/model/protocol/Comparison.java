package dev.mesolint.core.model.protocol;

import java.util.Locale;
import java.util.function.DoubleSupplier;

/**
 * One outcome a study reports, as a ratio of two arms' growth, with the band the model's ratio must fall in.
 *
 * @param study     author and year, as cited in docs/model.md
 * @param arms      the arms, as the study ran them (our encoding in the protocol programmes)
 * @param published what the study found, with "from memory" where the figure was not checked against the paper
 * @param low       lowest ratio accepted (inclusive)
 * @param high      highest ratio accepted (inclusive); {@code Double.POSITIVE_INFINITY} for a direction only
 * @param model     the model's ratio: block stimulus of the second arm over the first
 */
record Comparison(String study, String arms, String published, double low, double high, DoubleSupplier model) {

    boolean holds(double ratio) {
        return ratio >= low && ratio <= high;
    }

    String band() {
        if (high == Double.POSITIVE_INFINITY) {
            return String.format(Locale.ROOT, "≥ %.2f", low);
        }
        if (low == 0) {
            return String.format(Locale.ROOT, "≤ %.2f", high);
        }
        return String.format(Locale.ROOT, "%.2f–%.2f", low, high);
    }
}
