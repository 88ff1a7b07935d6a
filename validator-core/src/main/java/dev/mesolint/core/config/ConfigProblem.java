package dev.mesolint.core.config;

import dev.mesolint.core.source.Location;
import java.util.Optional;

/**
 * A configuration input that cannot be used (a profile, the repository configuration, a baseline, a rule pack),
 * located at the offending key or value where there is one, with a hint that shows a correct form.
 */
public final class ConfigProblem extends Exception {
    private static final long serialVersionUID = 1L;
    private final String source;
    private final transient Location location;
    private final String hint;

    /**
     * @param source   the file as shown to the user, or what else was being read ("rule pack ...")
     * @param location where in the file; null when the problem is about the whole input
     */
    public ConfigProblem(String source, Location location, String message, String hint) {
        super(message);
        this.source = source;
        this.location = location;
        this.hint = hint;
    }

    public String source() {
        return source;
    }

    public Optional<Location> location() {
        return Optional.ofNullable(location);
    }

    public String hint() {
        return hint;
    }

    /** One line for users: {@code file:line:column: message (fix: hint)}. */
    public String describe() {
        String where = location == null ? source : source + ":" + location.line() + ":" + location.column();
        return where + ": " + getMessage() + (hint == null || hint.isBlank() ? "" : " (fix: " + hint + ")");
    }

    @Override
    public String toString() {
        return describe();
    }
}
