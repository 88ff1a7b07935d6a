package dev.mesolint.core.review;

import dev.mesolint.core.finding.Finding;

/**
 * The identity of a finding across two revisions: its fingerprint as if it had been found in the head's file, so a
 * programme that was renamed or moved keeps its findings matched.
 */
final class RevisionFingerprint {
    private RevisionFingerprint() {
    }

    static String of(Finding finding, String headPath) {
        return Finding.fingerprint(finding.ruleId(), headPath, finding.location().pointer(), finding.message());
    }
}
