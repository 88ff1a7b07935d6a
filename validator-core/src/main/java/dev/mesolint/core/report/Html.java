package dev.mesolint.core.report;

import java.util.Locale;

/** Escaping and number formatting for the HTML report: every piece of text goes through {@link #esc}. */
final class Html {
    private Html() {
    }

    /** Escapes text for element content and double- or single-quoted attribute values. */
    static String esc(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder out = new StringBuilder(text.length() + 16);
        text.codePoints().forEach(c -> {
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> {
                    if (c < 0x20 && c != '\n' && c != '\t' || c == 0x7F) {
                        out.append('\uFFFD');
                    } else {
                        out.appendCodePoint(c);
                    }
                }
            }
        });
        return out.toString();
    }

    /** A figure as charts print it: at most one decimal, none when whole ({@code 9}, {@code 9.5}). */
    static String num(double value) {
        double rounded = Math.round(value * 10) / 10.0;
        return rounded == Math.rint(rounded) ? Long.toString((long) rounded)
                : String.format(Locale.ROOT, "%.1f", rounded);
    }

    /** A weight as loaded: up to two decimals, none when whole ({@code 107.5}, {@code 1.25}, {@code 100}). */
    static String weight(double value) {
        double rounded = Math.round(value * 100) / 100.0;
        return rounded == Math.rint(rounded) ? Long.toString((long) rounded)
                : java.math.BigDecimal.valueOf(rounded).stripTrailingZeros().toPlainString();
    }

    /** A coordinate for SVG attributes: two decimals at most, always a dot. */
    static String px(double value) {
        double rounded = Math.round(value * 100) / 100.0;
        return rounded == Math.rint(rounded) ? Long.toString((long) rounded)
                : String.format(Locale.ROOT, "%.2f", rounded);
    }

    /** A catalogue muscle name for people: {@code side-delts} → {@code side delts}. */
    static String muscle(String name) {
        return name.replace('-', ' ').replace('_', ' ').toLowerCase(Locale.ROOT);
    }
}
