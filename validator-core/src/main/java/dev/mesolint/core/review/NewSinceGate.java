package dev.mesolint.core.review;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Counts only what a change introduced: the head's findings that the base revision already had are marked as held
 * (like a baseline's), with the baseline's safety policy: these always count, held or not,
 * <ul>
 * <li>errors of the safety rules (the athlete-constraint rules among them), since an athlete's constraint is
 * never a debt to carry, and</li>
 * <li>every finding of a file that did not load at the base or at the head, since nothing in it was checked.</li>
 * </ul>
 */
public final class NewSinceGate {
    private final Set<String> safetyRules = new HashSet<>();

    public NewSinceGate(List<? extends RuleDefinition> rules) {
        rules.stream().filter(r -> r.metadata().category() == RuleMetadata.Category.SAFETY)
                .forEach(r -> safetyRules.add(r.id()));
    }

    /**
     * {@code run} (a check of the head, baseline or not) with the findings the review found unchanged since the base
     * marked as held, but for the policy's exceptions. Findings are matched by fingerprint, one for one.
     */
    public RunReport apply(RunReport run, Review review) {
        return mark(run, review, true);
    }

    /**
     * The review's head with every finding the base already had marked as held, exceptions included: what each
     * finding's state is, rather than whether it counts (SARIF's {@code baselineState}).
     */
    static RunReport markUnchanged(Review review) {
        return new NewSinceGate(List.of()).mark(review.after(), review, false);
    }

    private RunReport mark(RunReport run, Review review, boolean policy) {
        Map<String, ProgrammeChange> byHeadPath = new HashMap<>();
        review.programmes().forEach(p -> p.after().ifPresent(path -> byHeadPath.put(path, p)));
        List<FileReport> files = new ArrayList<>();
        for (FileReport file : run.files()) {
            ProgrammeChange change = byHeadPath.get(file.displayPath());
            if (change == null || policy && (!change.loadedBefore() || !change.loadedAfter())) {
                files.add(file);
                continue;
            }
            Map<String, Integer> held = new HashMap<>();
            change.findings().unchanged().forEach(f -> held.merge(RevisionFingerprint.of(f, file.displayPath()), 1,
                    Integer::sum));
            List<Finding> findings = new ArrayList<>();
            for (Finding f : file.findings()) {
                String print = RevisionFingerprint.of(f, file.displayPath());
                boolean counted = !f.waived() && !f.baselined() && f.severity() != Severity.OFF;
                if (counted && !(policy && alwaysCounts(f)) && held.getOrDefault(print, 0) > 0) {
                    held.merge(print, -1, Integer::sum);
                    findings.add(f.asBaselined());
                } else {
                    findings.add(f);
                }
            }
            files.add(file.withFindings(findings));
        }
        // Compared with the base: "held" and "new" mean something, as with a baseline.
        return new RunReport(files, run.failOn(), run.missing(), true);
    }

    private boolean alwaysCounts(Finding f) {
        return f.severity() == Severity.ERROR && safetyRules.contains(f.ruleId());
    }
}
