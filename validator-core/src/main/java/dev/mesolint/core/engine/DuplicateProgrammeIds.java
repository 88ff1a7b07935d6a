package dev.mesolint.core.engine;

import dev.mesolint.core.finding.Anchor;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Findings and baselines know a programme by its id, so two files with one id would share their findings' identity:
 * each such file gets an error at its id naming the others. A run-level check, over cached and fresh files alike.
 */
public final class DuplicateProgrammeIds {
    public static final String ID = FrameworkRules.DUPLICATE_PROGRAMME_ID;

    private DuplicateProgrammeIds() {
    }

    /** {@code run} with the shared ids marked: what a check of a repository reports. */
    public static RunReport mark(RunReport run) {
        return run.withFiles(mark(run.files(), Severity.ERROR));
    }

    /** {@code reports} with a finding added to each file whose programme id another file also has. */
    public static List<FileReport> mark(List<FileReport> reports, Severity severity) {
        Map<String, List<String>> filesById = new LinkedHashMap<>();
        for (FileReport r : reports) {
            r.identity().ifPresent(i -> filesById.computeIfAbsent(i.id(), k -> new ArrayList<>())
                    .add(r.displayPath()));
        }
        List<FileReport> out = new ArrayList<>();
        for (FileReport r : reports) {
            List<String> same = r.identity().map(i -> filesById.get(i.id())).orElse(List.of());
            if (same.size() < 2 || severity == Severity.OFF) {
                out.add(r);
                continue;
            }
            ProgrammeIdentity identity = r.identity().orElseThrow();
            List<String> others = same.stream().filter(f -> !f.equals(r.displayPath())).sorted().toList();
            List<Finding> findings = new ArrayList<>(r.findings());
            // Anchored at the file: the id is the very thing that no longer tells the programmes apart.
            findings.add(new Finding(ID, severity, r.displayPath(), identity.location(), "programme id '"
                    + identity.id() + "' is also the id of " + String.join(", ", others)
                    + "; findings and baselines know a programme by its id", "give each programme its own id, e.g. "
                    + "id: " + identity.id() + "-" + (same.indexOf(r.displayPath()) + 1), Optional.empty(), false,
                    Facts.NONE, Anchor.ofFile(r.displayPath(), identity.location().pointer())));
            out.add(r.withFindings(findings));
        }
        return out;
    }
}
