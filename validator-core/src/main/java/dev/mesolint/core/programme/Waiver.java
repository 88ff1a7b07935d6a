package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;

/**
 * A coach's decision to accept a rule's findings at one place (or the whole file), with the reason why.
 *
 * <p>Waivers are compared by identity: the same written waiver copied into a repeated week is one waiver.
 */
public final class Waiver {
    private final String ruleId;
    private final String reason;
    private final Location location;
    private final boolean wholeFile;

    public Waiver(String ruleId, String reason, Location location, boolean wholeFile) {
        this.ruleId = ruleId;
        this.reason = reason;
        this.location = location;
        this.wholeFile = wholeFile;
    }

    public String ruleId() {
        return ruleId;
    }

    public String reason() {
        return reason;
    }

    public Location location() {
        return location;
    }

    public boolean wholeFile() {
        return wholeFile;
    }

    public boolean covers(String rule) {
        return ruleId.equals(rule);
    }

    @Override
    public String toString() {
        return ruleId + " (" + reason + ") at " + location;
    }
}
