package dev.mesolint.core.finding;

import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.source.Location;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * One thing a rule found, as data: the rule, how severe, where (start and end), what about ({@link Facts}: subject,
 * measured value and limit, an applicable fix), the message and fix rendered for a reader, and its identity
 * ({@link Anchor}) from which the fingerprint is made.
 *
 * @param file      the file's path relative to the checked root, with '/' separators
 * @param fix       a concrete change that would resolve the finding, in words
 * @param waiver    the waiver that accepts this finding, if the author waived it
 * @param baselined true when the repository's baseline already holds this finding, so it does not count
 * @param facts     the subject, measure and machine-applicable edit the rule supplied
 * @param anchor    the finding's place in terms that survive edits elsewhere in the file
 */
public record Finding(String ruleId, Severity severity, String file, Location location, String message, String fix,
        Optional<Waiver> waiver, boolean baselined, Facts facts, Anchor anchor) {

    public Finding {
        Objects.requireNonNull(ruleId, "ruleId");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(location, "location");
        Objects.requireNonNull(message, "message");
        Objects.requireNonNull(fix, "fix");
        Objects.requireNonNull(waiver, "waiver");
        Objects.requireNonNull(facts, "facts");
        Objects.requireNonNull(anchor, "anchor");
    }

    /** A finding that no baseline has matched (yet), anchored at its file and pointer, with no facts. */
    public Finding(String ruleId, Severity severity, String file, Location location, String message, String fix,
            Optional<Waiver> waiver) {
        this(ruleId, severity, file, location, message, fix, waiver, false, Facts.NONE,
                Anchor.ofFile(file, location.pointer()));
    }

    public boolean waived() {
        return waiver.isPresent();
    }

    /** True for a finding that says its file did not load (see {@link FrameworkRules#LOAD_FAILURES}). */
    public boolean loadFailure() {
        return FrameworkRules.LOAD_FAILURES.contains(ruleId);
    }

    public Subject subject() {
        return facts.subject();
    }

    public Optional<Measure> measure() {
        return facts.measure();
    }

    public Optional<Edit> edit() {
        return facts.edit();
    }

    public Finding waivedBy(Waiver w) {
        return new Finding(ruleId, severity, file, location, message, fix, Optional.of(w), baselined, facts, anchor);
    }

    /** This finding, marked as held by the baseline. */
    public Finding asBaselined() {
        return new Finding(ruleId, severity, file, location, message, fix, waiver, true, facts, anchor);
    }

    public Finding withFacts(Facts f) {
        return new Finding(ruleId, severity, file, location, message, fix, waiver, baselined, f, anchor);
    }

    public Finding withAnchor(Anchor a) {
        return new Finding(ruleId, severity, file, location, message, fix, waiver, baselined, facts, a);
    }

    /**
     * Identity that survives edits elsewhere: rule, programme, logical path and the subject's muscle, exercise and
     * day. Never the message, the line, the limit or the weeks, so rewording, moving lines or the file, renaming a
     * session, changing a limit or adding a repeat week keep it.
     */
    public String fingerprint() {
        return fingerprint(ruleId, anchor, subject().identity());
    }

    /** The fingerprint of a finding with these parts, e.g. one read back from a baseline file. */
    public static String fingerprint(String ruleId, Anchor anchor, String subject) {
        return String.join("|", List.of(ruleId, anchor.programme(), anchor.path(), subject));
    }
}
