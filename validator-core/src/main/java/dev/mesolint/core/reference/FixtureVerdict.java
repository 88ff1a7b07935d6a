package dev.mesolint.core.reference;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.report.ConsoleReport;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * How a fixture programme's findings compare with its {@code # expect:} markers: every finding of every rule must be
 * marked, every marked finding found, and a failing fixture must expect its own rule while a passing one must not.
 * Free of any test framework, so that rule packs can use it from whichever they run (see docs/rule-packs.md).
 *
 * @param problems what differs, one line each; empty when the fixture holds
 */
public record FixtureVerdict(RuleExample example, List<String> problems, List<Finding> findings) {

    public FixtureVerdict {
        problems = List.copyOf(problems);
        findings = List.copyOf(findings);
    }

    /** Compares {@code report}, the check of {@code example}, with its markers. */
    public static FixtureVerdict of(RuleExample example, FileReport report) {
        List<String> problems = new ArrayList<>();
        boolean expectsOwnRule = example.expected().stream()
                .anyMatch(e -> e.ruleId().equals(example.ruleId()) && !e.waived());
        if (example.failing() && !expectsOwnRule) {
            problems.add("a failing fixture must mark at least one active " + example.ruleId() + " finding");
        } else if (!example.failing() && expectsOwnRule) {
            problems.add("a passing fixture must not expect an active " + example.ruleId() + " finding");
        }
        Map<String, Integer> expected = new TreeMap<>();
        example.expected().forEach(e -> expected.merge(key(e.line(), e.ruleId(), e.waived()), e.count(),
                Integer::sum));
        List<Finding> findings = report.findings().stream().filter(f -> f.severity() != Severity.OFF).toList();
        Map<String, Integer> actual = new TreeMap<>();
        findings.forEach(f -> actual.merge(key(f.location().line(), f.ruleId(), f.waived()), 1, Integer::sum));
        expected.forEach((k, n) -> {
            int got = actual.getOrDefault(k, 0);
            if (got < n) {
                problems.add("missing:    " + k + (n - got > 1 ? " x" + (n - got) : ""));
            }
        });
        actual.forEach((k, n) -> {
            int want = expected.getOrDefault(k, 0);
            if (n > want) {
                problems.add("unexpected: " + k + (n - want > 1 ? " x" + (n - want) : ""));
            }
        });
        return new FixtureVerdict(example, problems, findings);
    }

    public boolean holds() {
        return problems.isEmpty();
    }

    /** A message for a failed test: the fixture, what differs and every finding, as the console prints them. */
    public String explain() {
        StringBuilder why = new StringBuilder(example.file().getFileName() + " in " + example.ruleId()
                + ": findings differ from the # expect: markers\n");
        problems.forEach(p -> why.append("  ").append(p).append('\n'));
        why.append("  all findings:\n");
        findings.forEach(f -> why.append("    ").append(ConsoleReport.line(f)).append('\n'));
        return why.toString();
    }

    private static String key(int line, String rule, boolean waived) {
        return String.format("line %3d %s%s", line, rule, waived ? " (waived)" : "");
    }
}
