package dev.mesolint.core.source;

import java.io.IOException;

/** A file that mesolint will not read: outside the repository root, not a regular file, or over the size limit. */
public final class FileRefusedException extends IOException {
    private static final long serialVersionUID = 1L;

    private final String hint;

    public FileRefusedException(String message, String hint) {
        super(message);
        this.hint = hint;
    }

    /** What to do about it, in the user's words. */
    public String hint() {
        return hint;
    }
}
