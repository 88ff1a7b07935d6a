package dev.mesolint.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.yaml.YamlLimits;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The sample programmes shipped with the project: clean ones stay clean, broken ones break what they promise. */
class SampleProgrammesTests {
    private static final Path SAMPLES = Path.of("../sample-programs").toAbsolutePath().normalize();
    private final List<RuleDefinition> rules = BuiltInRules.all();

    private RunReport check(String folder) {
        return new Checker(new CheckRequest(List.of(SAMPLES.resolve(folder)), SAMPLES, Severity.INFO, List.of(),
                ProfileConfiguration.builtIn(rules), YamlLimits.DEFAULTS), rules).run();
    }

    @Test
    void theSampleProgrammesHaveNoFindings() {
        RunReport run = check("programmes");
        assertEquals(4, run.files().size());
        assertEquals(List.of(), run.active().stream().map(Finding::toString).toList());
    }

    /**
     * A broken sample named after a built-in rule gets that rule's findings and no other active finding (the
     * low-yield-set sample waives the short-rest-compound and fatigue-technique findings of its cause, with the
     * reason). A sample named after no built-in rule must load and give no finding.
     */
    @Test
    void eachBrokenSampleTriggersTheRuleItIsNamedAfter() {
        RunReport run = check("broken");
        for (FileReport file : run.files()) {
            String rule = Path.of(file.displayPath()).getFileName().toString().replace(".yaml", "");
            List<String> fired = file.active().stream().map(Finding::ruleId).distinct().toList();
            if (rules.stream().anyMatch(r -> r.id().equals(rule))) {
                assertEquals(List.of(rule), fired, file.displayPath());
            } else {
                assertFalse(fired.contains("schema") || fired.contains("yaml-syntax"), file.displayPath());
                assertTrue(fired.isEmpty(), file.displayPath() + " " + fired);
            }
        }
    }
}
