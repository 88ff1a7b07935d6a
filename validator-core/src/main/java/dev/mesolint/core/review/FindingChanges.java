package dev.mesolint.core.review;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A programme's findings sorted by what the change did to them, matched by fingerprint (never by line): new at the
 * head, resolved (at the base only), unchanged (at both). Waived findings and findings of rules that are off are left
 * out: they do not count on either side.
 *
 * @param introduced findings at the head that the base did not have
 * @param resolved   findings at the base that the head no longer has, shown with the base's location
 * @param unchanged  findings at both, shown with the head's location
 */
public record FindingChanges(List<Finding> introduced, List<Finding> resolved, List<Finding> unchanged) {
    public static final FindingChanges NONE = new FindingChanges(List.of(), List.of(), List.of());

    public FindingChanges {
        introduced = List.copyOf(introduced);
        resolved = List.copyOf(resolved);
        unchanged = List.copyOf(unchanged);
    }

    /**
     * Matches {@code before} (found at the base in {@code basePath}) against {@code after} (found at the head in
     * {@code headPath}); a finding's file is read as the head's, so that a renamed programme keeps its findings.
     * Identical findings are matched one for one.
     */
    public static FindingChanges match(List<Finding> before, List<Finding> after, String headPath) {
        Map<String, List<Finding>> waiting = new HashMap<>();
        for (Finding f : counted(before)) {
            waiting.computeIfAbsent(RevisionFingerprint.of(f, headPath), k -> new ArrayList<>()).add(f);
        }
        List<Finding> introduced = new ArrayList<>();
        List<Finding> unchanged = new ArrayList<>();
        for (Finding f : counted(after)) {
            List<Finding> same = waiting.get(RevisionFingerprint.of(f, headPath));
            if (same != null && !same.isEmpty()) {
                same.remove(0);
                unchanged.add(f);
            } else {
                introduced.add(f);
            }
        }
        List<Finding> resolved = new ArrayList<>();
        for (Finding f : counted(before)) {
            List<Finding> left = waiting.get(RevisionFingerprint.of(f, headPath));
            if (left.remove(f)) {
                resolved.add(f);
            }
        }
        return new FindingChanges(introduced, resolved, unchanged);
    }

    /** The findings that count on one side: not waived, not off. */
    static List<Finding> counted(List<Finding> findings) {
        return findings.stream().filter(f -> !f.waived() && f.severity() != Severity.OFF).toList();
    }

    public boolean changed() {
        return !introduced.isEmpty() || !resolved.isEmpty();
    }
}
