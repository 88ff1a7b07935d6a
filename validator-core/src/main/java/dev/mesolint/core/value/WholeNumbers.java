package dev.mesolint.core.value;

/** Reads the digits of a value's whole-number part with its range checked first, so no digit string can overflow. */
final class WholeNumbers {
    private WholeNumbers() {
    }

    /**
     * {@code digits} (ASCII 0-9 only) as an int within {@code 0..max}.
     *
     * @throws InvalidValueException "out of range", naming {@code text} and the allowed range
     */
    static int parse(String digits, int max, String text, String hint) throws InvalidValueException {
        String significant = digits.replaceFirst("^0+(?=\\d)", "");
        // Ten digits can already exceed an int; compare as long only when it cannot overflow a long either.
        if (significant.length() > 18 || Long.parseLong(significant) > max) {
            throw new InvalidValueException("'" + text + "' is out of range: " + (significant.length() > 12
                    ? "a " + significant.length() + "-digit number" : significant) + " is over " + max, hint);
        }
        return Integer.parseInt(significant);
    }
}
