package dev.mesolint.core.engine;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The outcome of one run over many files.
 *
 * @param missing         inputs that named no file or folder (a usage error)
 * @param baselineApplied true when the run was compared with a baseline (so the summary says what it holds, even 0)
 * @param programmes      programme entries found: files checked plus entries reported as unreadable
 * @param hidden          hidden {@code .yaml} files skipped in folders, shown relative to the root
 */
public record RunReport(List<FileReport> files, Severity failOn, List<String> missing, boolean baselineApplied,
        int programmes, List<String> hidden) {

    public RunReport {
        files = List.copyOf(files);
        missing = List.copyOf(missing);
        hidden = List.copyOf(hidden);
    }

    /** A report whose every file is a programme entry, with nothing hidden. */
    public RunReport(List<FileReport> files, Severity failOn, List<String> missing, boolean baselineApplied) {
        this(files, failOn, missing, baselineApplied, files.size(), List.of());
    }

    /** The report of a run over {@code found}: {@code reports} (checked files) then the refused entries' reports. */
    public static RunReport of(List<FileReport> reports, Severity failOn, ProgrammeFiles.Discovery found,
            List<FileReport> refused, Path root) {
        List<FileReport> all = new ArrayList<>(reports);
        all.addAll(refused);
        return new RunReport(all, failOn, found.missing().stream().map(Path::toString).toList(), false,
                found.programmes().size() + found.refused().size(),
                found.hidden().stream().map(h -> ProgrammeFiles.display(root, h)).toList());
    }

    /** True when the run found no programme to check or report: a run that checks nothing must say so. */
    public boolean nothingChecked() {
        return programmes == 0;
    }

    /** The same run with other file reports (duplicate ids marked, say); the counts are kept. */
    public RunReport withFiles(List<FileReport> other) {
        return new RunReport(other, failOn, missing, baselineApplied, programmes, hidden);
    }

    /** A run not compared with a baseline. */
    public RunReport(List<FileReport> files, Severity failOn, List<String> missing) {
        this(files, failOn, missing, false);
    }

    public List<Finding> active() {
        return files.stream().flatMap(f -> f.active().stream()).toList();
    }

    public long count(Severity severity) {
        return active().stream().filter(f -> f.severity() == severity).count();
    }

    public long waivedCount() {
        return files.stream().mapToLong(f -> f.waived().size()).sum();
    }

    public long baselinedCount() {
        return files.stream().mapToLong(f -> f.baselined().size()).sum();
    }

    /** How many baselined findings have {@code severity}: what the baseline still accepts. */
    public long baselinedCount(Severity severity) {
        return files.stream().flatMap(f -> f.baselined().stream()).filter(f -> f.severity() == severity).count();
    }

    /** True when any active finding is at or above the fail level. */
    public boolean failed() {
        return active().stream().anyMatch(f -> f.severity().atLeast(failOn));
    }
}
