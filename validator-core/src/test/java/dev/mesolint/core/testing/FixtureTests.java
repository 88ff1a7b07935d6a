package dev.mesolint.core.testing;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.reference.RuleExample;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.rules.InternalErrorRule;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Every fixture programme, checked against its {@code # expect:} markers with the built-in rules. */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class FixtureTests {
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
        boolean expectsOwnRule = example.expected().stream()
                .anyMatch(e -> e.ruleId().equals(example.ruleId()) && !e.waived());
        if (example.failing()) {
            assertTrue(expectsOwnRule, fixture + " is a failing fixture but expects no active " + example.ruleId());
        } else {
            assertFalse(expectsOwnRule, fixture + " is a passing fixture but expects an active " + example.ruleId());
        }
        FileReport report = reports.get(example.file());
        assertNotNull(report, "no report for " + fixture);
        FixtureHarness.verify(example, report);
    }

    @Test
    void everyBuiltInRuleHasFailingAndPassingFixtures() {
        for (RuleDefinition rule : rules) {
            if (rule.id().equals(InternalErrorRule.ID)) {
                continue; // reports defects in mesolint itself: no programme can trigger it on purpose
            }
            assertTrue(examples.stream().anyMatch(e -> e.ruleId().equals(rule.id()) && e.failing()),
                    rule.id() + " has no failing fixture");
            assertTrue(examples.stream().anyMatch(e -> e.ruleId().equals(rule.id()) && !e.failing()),
                    rule.id() + " has no passing fixture");
        }
    }
}
