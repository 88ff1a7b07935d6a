package dev.mesolint.core.finding;

import dev.mesolint.core.source.Location;
import java.util.Objects;

/**
 * A fix a tool can apply without understanding the rule: set key {@code key} of the mapping at {@code pointer} to
 * the YAML text {@code text} (adding the key when it is absent). {@code location} is where the key or, when it is
 * absent, the mapping was written. The human {@link Finding#fix()} says the same in words.
 *
 * @param pointer JSON Pointer of the mapping to change, as written (never a copied, repeated week)
 * @param key     the key to set
 * @param text    the new value as YAML text ({@code 2min}, {@code 3})
 */
public record Edit(String pointer, String key, String text, Location location) {

    public Edit {
        Objects.requireNonNull(pointer, "pointer");
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(location, "location");
    }

    // equals and hashCode as the record's generated ones give them, without their method handles (see Location).
    @Override
    public boolean equals(Object o) {
        return this == o || o instanceof Edit e && Objects.equals(pointer, e.pointer) && Objects.equals(key, e.key)
                && Objects.equals(text, e.text) && Objects.equals(location, e.location);
    }

    @Override
    public int hashCode() {
        return ((Objects.hashCode(pointer) * 31 + Objects.hashCode(key)) * 31 + Objects.hashCode(text)) * 31
                + Objects.hashCode(location);
    }
}
