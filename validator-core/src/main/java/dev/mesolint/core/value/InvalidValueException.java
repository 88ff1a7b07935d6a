package dev.mesolint.core.value;

/**
 * A prescription value that cannot be read, with a hint that shows a correct form.
 */
public final class InvalidValueException extends Exception {
    private static final long serialVersionUID = 1L;
    private final String hint;

    public InvalidValueException(String message, String hint) {
        super(message);
        this.hint = hint;
    }

    /** How to write the value correctly, e.g. {@code "write 90s, 2min, 2.5min or 2:30"}. */
    public String hint() {
        return hint;
    }
}
