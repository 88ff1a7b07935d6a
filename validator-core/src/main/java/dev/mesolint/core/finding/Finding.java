package dev.mesolint.core.finding;

import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.source.Location;
import java.util.Objects;
import java.util.Optional;

/**
 * One thing a rule found: where, how severe, what was measured against which limit, and how to fix it.
 *
 * @param file   the file's path relative to the checked root, with '/' separators
 * @param fix    a concrete change that would resolve the finding
 * @param waiver the waiver that accepts this finding, if the author waived it
 */
public record Finding(String ruleId, Severity severity, String file, Location location, String message, String fix,
        Optional<Waiver> waiver) {

    public Finding {
        Objects.requireNonNull(ruleId, "ruleId");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(location, "location");
        Objects.requireNonNull(message, "message");
        Objects.requireNonNull(fix, "fix");
        Objects.requireNonNull(waiver, "waiver");
    }

    public boolean waived() {
        return waiver.isPresent();
    }

    public Finding waivedBy(Waiver w) {
        return new Finding(ruleId, severity, file, location, message, fix, Optional.of(w));
    }

    /**
     * Identity that survives edits that only move lines: rule, file, YAML path and message, without line numbers.
     */
    public String fingerprint() {
        return ruleId + "|" + file + "|" + location.pointer() + "|" + message;
    }
}
