package dev.mesolint.core.engine;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import java.util.List;

/**
 * The outcome of one run over many files.
 *
 * @param missing         inputs that named no file or folder (a usage error)
 * @param baselineApplied true when the run was compared with a baseline (so the summary says what it holds, even 0)
 */
public record RunReport(List<FileReport> files, Severity failOn, List<String> missing, boolean baselineApplied) {

    public RunReport {
        files = List.copyOf(files);
        missing = List.copyOf(missing);
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
