package dev.mesolint.core.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.testing.ModelRuleProfiles;
import dev.mesolint.core.yaml.YamlLimits;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/** The sample programmes: each broken one gives the model-rule finding its name promises; the clean ones none. */
class ModelRuleSamplesTests {
    private static final Path SAMPLES = Path.of("..", "sample-programs");

    private static RunReport check(Path folder) {
        CheckRequest request = new CheckRequest(List.of(folder), folder, Severity.ERROR, List.of(),
                ModelRuleProfiles.byGoal(), YamlLimits.DEFAULTS);
        return new Checker(request, BuiltInRules.all()).run();
    }

    @Test
    void eachBrokenSampleGivesItsRulesFindingAndNoOtherModelRulesFinding() {
        RunReport run = check(SAMPLES.resolve("broken"));
        for (FileReport file : run.files()) {
            String name = file.displayPath().replace(".yaml", "");
            Set<String> rules = file.active().stream().map(Finding::ruleId).collect(Collectors.toSet());
            if (ModelRuleFixturesTests.RULES.contains(name)) {
                assertEquals(Set.of(name), rules, file.displayPath() + ": " + file.active());
            } else {
                assertTrue(rules.stream().noneMatch(ModelRuleFixturesTests.RULES::contains),
                        file.displayPath() + ": " + file.active());
            }
        }
        List<String> names = run.files().stream().map(FileReport::displayPath).toList();
        ModelRuleFixturesTests.RULES.forEach(r -> assertTrue(names.contains(r + ".yaml"), r + " has a sample"));
    }

    @Test
    void theCleanProgrammesGiveNoErrorOrWarningUnderTheirGoalsProfile() {
        RunReport run = check(SAMPLES.resolve("programmes"));
        assertEquals(4, run.files().size());
        List<Finding> serious = run.active().stream().filter(f -> f.severity().atLeast(Severity.WARNING)).toList();
        assertEquals(List.of(), serious);
        // What they do get is information only: long isolation sets close to failure.
        assertEquals(Set.of(HighRepFatigueRule.ID),
                run.active().stream().map(Finding::ruleId).collect(Collectors.toSet()));
    }
}
