package dev.mesolint.core.report;

import java.math.BigDecimal;
import java.math.RoundingMode;

/** Rounds model figures for reports: three decimals are well within the model's precision. */
final class Numbers {
    static final int DECIMALS = 3;

    private Numbers() {
    }

    static double round(double value) {
        return BigDecimal.valueOf(value).setScale(DECIMALS, RoundingMode.HALF_UP).doubleValue();
    }

    /** Plain decimal text without trailing zeros: {@code 4.5}, {@code 12}, {@code 0.333}. */
    static String text(double value) {
        BigDecimal d = BigDecimal.valueOf(value).setScale(DECIMALS, RoundingMode.HALF_UP).stripTrailingZeros();
        return d.signum() == 0 ? "0" : d.toPlainString();
    }

    /** Text with a fixed number of decimals, for aligned tables. */
    static String fixed(double value, int decimals) {
        return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_UP).toPlainString();
    }
}
