package dev.mesolint.core.testing;

import static org.junit.jupiter.api.Assertions.fail;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.reference.ExampleRun;
import dev.mesolint.core.reference.RuleExample;
import dev.mesolint.core.report.ConsoleReport;
import dev.mesolint.core.rule.RuleDefinition;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Runs fixture programmes ({@code src/test/resources/fixtures/<rule-id>/{failing,passing}*.yaml}) and compares
 * what the checker found with the {@code # expect:} markers: every finding of every rule must be marked, and every
 * marked finding must be found. See {@link RuleExample} for the marker syntax.
 */
public final class FixtureHarness {
    /** The fixture folder, relative to the module (Surefire runs tests there). */
    public static final Path FIXTURES = Path.of("src/test/resources/fixtures").toAbsolutePath();

    private FixtureHarness() {
    }

    public static List<RuleExample> all() {
        try {
            List<RuleExample> out = new ArrayList<>();
            for (Path p : RuleExample.find(FIXTURES)) {
                out.add(RuleExample.read(p));
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Checks the fixtures with {@code rules}, each under the profile its first line names. */
    public static Map<Path, FileReport> check(List<RuleExample> examples, List<? extends RuleDefinition> rules) {
        return ExampleRun.check(examples, FIXTURES, rules);
    }

    /** Fails unless the findings in {@code report} are exactly the marked ones (line, rule, waived, count). */
    public static void verify(RuleExample example, FileReport report) {
        Map<String, Integer> expected = new TreeMap<>();
        example.expected().forEach(e -> expected.merge(key(e.line(), e.ruleId(), e.waived()), e.count(),
                Integer::sum));
        Map<String, Integer> actual = new TreeMap<>();
        List<Finding> findings = report.findings().stream().filter(f -> f.severity() != Severity.OFF).toList();
        findings.forEach(f -> actual.merge(key(f.location().line(), f.ruleId(), f.waived()), 1, Integer::sum));
        if (expected.equals(actual)) {
            return;
        }
        StringBuilder why = new StringBuilder(example.file().getFileName() + " in " + example.ruleId()
                + ": findings differ from the # expect: markers\n");
        expected.forEach((k, n) -> {
            int got = actual.getOrDefault(k, 0);
            if (got < n) {
                why.append("  missing:    ").append(k).append(n - got > 1 ? " x" + (n - got) : "").append('\n');
            }
        });
        actual.forEach((k, n) -> {
            int want = expected.getOrDefault(k, 0);
            if (n > want) {
                why.append("  unexpected: ").append(k).append(n - want > 1 ? " x" + (n - want) : "").append('\n');
            }
        });
        why.append("  all findings:\n");
        findings.forEach(f -> why.append("    ").append(ConsoleReport.line(f)).append('\n'));
        fail(why.toString());
    }

    private static String key(int line, String rule, boolean waived) {
        return String.format("line %3d %s%s", line, rule, waived ? " (waived)" : "");
    }
}
