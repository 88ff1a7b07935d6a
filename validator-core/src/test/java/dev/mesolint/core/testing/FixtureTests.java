package dev.mesolint.core.testing;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.reference.RuleExample;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Every fixture programme, checked against its {@code # expect:} markers with the built-in rules. */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
public class FixtureTests {
    private final List<RuleDefinition> rules = BuiltInRules.all();
    private List<RuleExample> examples;
    private Map<Path, FileReport> reports;

    @BeforeAll
    void checkAll() {
        examples = FixtureHarness.all();
        reports = FixtureHarness.check(examples, rules);
    }

    Stream<String> fixtures() {
        return FixtureHarness.all().stream().map(e -> FixtureHarness.FIXTURES.relativize(e.file()).toString());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void findingsMatchTheMarkers(String fixture) {
        RuleExample example = examples.stream()
                .filter(e -> FixtureHarness.FIXTURES.relativize(e.file()).toString().equals(fixture)).findFirst()
                .orElseThrow();
        assertTrue(rules.stream().anyMatch(r -> r.id().equals(example.ruleId())),
                "fixture folder " + example.ruleId() + " names no built-in rule");
        FileReport report = reports.get(example.file());
        assertNotNull(report, "no report for " + fixture);
        // The verdict also holds a failing fixture to expecting its own rule, and a passing one to not.
        FixtureHarness.verify(example, report);
    }

    /** Framework rules about mesolint itself, a baseline file or several files; tested in their own classes. */
    public static final Set<String> NOT_FROM_ONE_PROGRAMME = Set.of(FrameworkRules.INTERNAL_ERROR,
            FrameworkRules.UNUSED_BASELINE_ENTRY, FrameworkRules.DUPLICATE_PROGRAMME_ID);

    @Test
    void everyBuiltInRuleHasFailingAndPassingFixtures() {
        for (RuleDefinition rule : rules) {
            if (NOT_FROM_ONE_PROGRAMME.contains(rule.id())) {
                continue; // a defect in mesolint itself, a baseline entry, two files: no one programme triggers them
            }
            assertTrue(examples.stream().anyMatch(e -> e.ruleId().equals(rule.id()) && e.failing()),
                    rule.id() + " has no failing fixture");
            assertTrue(examples.stream().anyMatch(e -> e.ruleId().equals(rule.id()) && !e.failing()),
                    rule.id() + " has no passing fixture");
        }
    }
}
