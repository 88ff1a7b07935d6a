package dev.mesolint.core.engine;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.programme.Programme;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * The outcome of checking one file.
 *
 * @param displayPath the path relative to the checked root, '/'-separated
 * @param programme   present when the file loaded (even if rules then found problems) and the run keeps the model
 *                    for a report that shows it ({@link CheckRequest#keepFigures()}); see {@link #loaded()}
 * @param profile     the rule profile the file was checked under
 * @param metrics     the training-model figures, present when the programme loaded
 * @param timing      how long the check took, in all and per rule ({@link FileTiming#NONE} when reused or unknown)
 * @param identity    the programme's id and where it is written, present when the programme loaded (also when the
 *                    findings come from a cache that does not keep the programme)
 * @param checkedAs   present when the file is one of mesolint's own (a catalogue, profile or configuration found
 *                    among the programmes) and was checked as that
 */
public record FileReport(String displayPath, Optional<Programme> programme, String profile, List<Finding> findings,
        Optional<ProgrammeMetrics> metrics, FileTiming timing, Optional<ProgrammeIdentity> identity,
        Optional<OwnFileKind> checkedAs) {

    private static final Comparator<Finding> ORDER = Comparator.comparingInt((Finding f) -> f.location().line())
            .thenComparingInt(f -> f.location().column()).thenComparing(Finding::ruleId)
            .thenComparing(Finding::message);

    public FileReport {
        findings = inOrder(findings);
        java.util.Objects.requireNonNull(timing, "timing");
        java.util.Objects.requireNonNull(identity, "identity");
        java.util.Objects.requireNonNull(checkedAs, "checkedAs");
    }

    /** {@code findings} in {@link #ORDER}; a list already in it (a report remade with its timing, say) as it is. */
    private static List<Finding> inOrder(List<Finding> findings) {
        for (int i = 1; i < findings.size(); i++) {
            if (ORDER.compare(findings.get(i - 1), findings.get(i)) > 0) {
                return findings.stream().sorted(ORDER).toList();
            }
        }
        return findings.stream().toList(); // the same unmodifiable copy as before, without the sort
    }

    /** The report of a programme file (or of a file that did not load as one). */
    public FileReport(String displayPath, Optional<Programme> programme, String profile, List<Finding> findings,
            Optional<ProgrammeMetrics> metrics, FileTiming timing, Optional<ProgrammeIdentity> identity) {
        this(displayPath, programme, profile, findings, metrics, timing, identity, Optional.empty());
    }

    /** The report of one of mesolint's own files found among the programmes, checked as {@code kind}. */
    public static FileReport ownFile(String displayPath, String profile, List<Finding> findings, OwnFileKind kind) {
        return new FileReport(displayPath, Optional.empty(), profile, findings, Optional.empty(), FileTiming.NONE,
                Optional.empty(), Optional.of(kind));
    }

    /** A report whose programme's id is taken from the programme, located at its header. */
    public FileReport(String displayPath, Optional<Programme> programme, String profile, List<Finding> findings,
            Optional<ProgrammeMetrics> metrics, FileTiming timing) {
        this(displayPath, programme, profile, findings, metrics, timing,
                programme.map(p -> new ProgrammeIdentity(p.info().id(), p.info().location())));
    }

    public FileReport(String displayPath, Optional<Programme> programme, String profile, List<Finding> findings,
            Optional<ProgrammeMetrics> metrics) {
        this(displayPath, programme, profile, findings, metrics, FileTiming.NONE);
    }

    /** This report with its timing. */
    public FileReport withTiming(FileTiming newTiming) {
        return new FileReport(displayPath, programme, profile, findings, metrics, newTiming, identity, checkedAs);
    }

    /** This report with other findings, all else the same. */
    public FileReport withFindings(List<Finding> other) {
        return new FileReport(displayPath, programme, profile, other, metrics, timing, identity, checkedAs);
    }

    /** A report without training-model figures (the file did not load, or figures were not asked for). */
    public FileReport(String displayPath, Optional<Programme> programme, String profile, List<Finding> findings) {
        this(displayPath, programme, profile, findings, Optional.empty());
    }

    /**
     * Whether the file loaded as what it is: a programme (also when its findings come from the cache, or the run did
     * not keep the model), or one of mesolint's own files checked as that.
     */
    public boolean loaded() {
        return programme.isPresent() || identity.isPresent() || checkedAs.isPresent() && findings.isEmpty();
    }

    /** Findings that count (not waived, not off, not held by the baseline). */
    public List<Finding> active() {
        return findings.stream().filter(f -> !f.waived() && !f.baselined() && f.severity() != Severity.OFF).toList();
    }

    /** Findings that the baseline holds (and no waiver accepts): shown, not counted. */
    public List<Finding> baselined() {
        return findings.stream().filter(f -> f.baselined() && !f.waived() && f.severity() != Severity.OFF).toList();
    }

    public List<Finding> waived() {
        return findings.stream().filter(Finding::waived).toList();
    }
}
