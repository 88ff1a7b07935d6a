package dev.mesolint.core.rule;

import dev.mesolint.core.finding.Edit;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.yaml.Pointers;
import java.util.Optional;

/** Builds the machine-applicable fixes rules attach to findings ({@link Edit}). */
public final class Edits {
    private Edits() {
    }

    /**
     * Sets the value at {@code written} (a location whose pointer names key {@code key}, as the binder records
     * values) to {@code text}; empty when {@code written} is not that key's value (the value was not written there).
     */
    public static Optional<Edit> set(Location written, String key, String text) {
        String pointer = written.pointer();
        String suffix = Pointers.child("", key);
        if (!pointer.endsWith(suffix)) {
            return Optional.empty();
        }
        return Optional.of(new Edit(pointer.substring(0, pointer.length() - suffix.length()), key, text, written));
    }
}
