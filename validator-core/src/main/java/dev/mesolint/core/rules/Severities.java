package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;

/** The second severities some model rules document for one kind of finding. */
final class Severities {
    private Severities() {
    }

    /** The configured severity, but never above {@code cap}: a profile may still lower it. */
    static Severity atMost(Severity configured, Severity cap) {
        return configured.compareTo(cap) >= 0 ? configured : cap;
    }
}
