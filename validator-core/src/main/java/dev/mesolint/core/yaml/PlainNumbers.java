package dev.mesolint.core.yaml;

/**
 * Recognises the plain scalars YAML 1.2's core schema reads as numbers, by hand rather than by regular expression
 * (this runs for every scalar of every file): integers {@code [-+]?(0|[1-9][0-9]*)} and decimals
 * {@code [-+]?([0-9]+\.[0-9]*|\.[0-9]+)([eE][-+]?[0-9]+)?}.
 */
final class PlainNumbers {
    enum Kind { INTEGER, DECIMAL, TEXT }

    private PlainNumbers() {
    }

    static Kind kind(String s) {
        int n = s.length();
        int i = 0;
        if (i < n && (s.charAt(i) == '-' || s.charAt(i) == '+')) {
            i++;
        }
        int intStart = i;
        while (i < n && digit(s.charAt(i))) {
            i++;
        }
        int intDigits = i - intStart;
        if (i == n) {
            // no leading zero unless the number is 0 itself
            return intDigits == 0 || (intDigits > 1 && s.charAt(intStart) == '0') ? Kind.TEXT : Kind.INTEGER;
        }
        if (s.charAt(i) != '.') {
            return Kind.TEXT;
        }
        i++;
        int fractionStart = i;
        while (i < n && digit(s.charAt(i))) {
            i++;
        }
        if (intDigits == 0 && i == fractionStart) {
            return Kind.TEXT;
        }
        if (i == n) {
            return Kind.DECIMAL;
        }
        if (s.charAt(i) != 'e' && s.charAt(i) != 'E') {
            return Kind.TEXT;
        }
        i++;
        if (i < n && (s.charAt(i) == '-' || s.charAt(i) == '+')) {
            i++;
        }
        int exponentStart = i;
        while (i < n && digit(s.charAt(i))) {
            i++;
        }
        return i == n && i > exponentStart ? Kind.DECIMAL : Kind.TEXT;
    }

    private static boolean digit(char c) {
        return c >= '0' && c <= '9';
    }
}
