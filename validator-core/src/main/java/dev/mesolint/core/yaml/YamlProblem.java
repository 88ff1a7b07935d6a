package dev.mesolint.core.yaml;

import dev.mesolint.core.source.Location;

/** A file that cannot be read as a programme document: not text, too large, malformed YAML, or over a limit. */
public final class YamlProblem extends Exception {
    private static final long serialVersionUID = 1L;
    private final transient Location location;
    private final String hint;

    public YamlProblem(String message, String hint, Location location) {
        super(message);
        this.location = location;
        this.hint = hint;
    }

    public Location location() {
        return location;
    }

    public String hint() {
        return hint;
    }
}
