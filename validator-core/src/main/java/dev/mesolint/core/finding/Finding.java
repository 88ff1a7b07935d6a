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
 * @param waiver    the waiver that accepts this finding, if the author waived it
 * @param baselined true when the repository's baseline already holds this finding, so it does not count
 */
public record Finding(String ruleId, Severity severity, String file, Location location, String message, String fix,
        Optional<Waiver> waiver, boolean baselined) {

    public Finding {
        Objects.requireNonNull(ruleId, "ruleId");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(location, "location");
        Objects.requireNonNull(message, "message");
        Objects.requireNonNull(fix, "fix");
        Objects.requireNonNull(waiver, "waiver");
    }

    /** A finding that no baseline has matched (yet). */
    public Finding(String ruleId, Severity severity, String file, Location location, String message, String fix,
            Optional<Waiver> waiver) {
        this(ruleId, severity, file, location, message, fix, waiver, false);
    }

    public boolean waived() {
        return waiver.isPresent();
    }

    public Finding waivedBy(Waiver w) {
        return new Finding(ruleId, severity, file, location, message, fix, Optional.of(w), baselined);
    }

    /** This finding, marked as held by the baseline. */
    public Finding asBaselined() {
        return new Finding(ruleId, severity, file, location, message, fix, waiver, true);
    }

    /**
     * Identity that survives edits that only move lines: rule, file, YAML path and message, without line numbers.
     */
    public String fingerprint() {
        return fingerprint(ruleId, file, location.pointer(), message);
    }

    /** The fingerprint of a finding with these parts, e.g. one read back from a baseline file. */
    public static String fingerprint(String ruleId, String file, String pointer, String message) {
        return ruleId + "|" + file + "|" + pointer + "|" + message;
    }
}
