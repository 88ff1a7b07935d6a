package dev.mesolint.core.value;

/** Reads the digits of a value's whole-number part with its range checked first, so no digit string can overflow. */
public final class WholeNumbers {
    private WholeNumbers() {
    }

    /**
     * {@code digits} (ASCII 0-9 only) as an int within {@code 0..max}.
     *
     * @throws InvalidValueException "out of range", naming {@code text} and the allowed range
     */
    static int parse(String digits, int max, String text, String hint) throws InvalidValueException {
        String significant = withoutLeadingZeros(digits);
        // Ten digits can already exceed an int; compare as long only when it cannot overflow a long either.
        if (significant.length() > 18 || Long.parseLong(significant) > max) {
            throw new InvalidValueException("'" + text + "' is out of range: " + (significant.length() > 12
                    ? "a " + significant.length() + "-digit number" : significant) + " is over " + max, hint);
        }
        return Integer.parseInt(significant);
    }

    /** The digits without leading zeros, keeping the last digit ({@code 000} is {@code 0}). */
    private static String withoutLeadingZeros(String digits) {
        int start = 0;
        while (start < digits.length() - 1 && digits.charAt(start) == '0') {
            start++;
        }
        return digits.substring(start);
    }

    /** True for one or more ASCII digits and nothing else. */
    public static boolean digitsOnly(String s) {
        if (s.isEmpty()) {
            return false;
        }
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c < '0' || c > '9') {
                return false;
            }
        }
        return true;
    }
}
