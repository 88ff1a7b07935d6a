package dev.mesolint.core.review;

import dev.mesolint.core.finding.Anchor;
import dev.mesolint.core.finding.Finding;

/**
 * The identity of a finding across two revisions: its fingerprint (rule, programme id, logical anchor, subject), with
 * a file-anchored finding (a file without a readable id) read as if found in the head's file, so that a programme
 * renamed or moved keeps its findings matched either way.
 */
final class RevisionFingerprint {
    private static final String FILE = "file:";

    private RevisionFingerprint() {
    }

    static String of(Finding finding, String headPath) {
        Anchor anchor = finding.anchor();
        if (anchor.programme().startsWith(FILE)) {
            anchor = Anchor.ofFile(headPath, anchor.path());
        }
        return Finding.fingerprint(finding.ruleId(), anchor, finding.subject().identity());
    }
}
