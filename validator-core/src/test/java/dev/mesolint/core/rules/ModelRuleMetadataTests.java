package dev.mesolint.core.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/** The model rules' defaults are the product brief's (the hypertrophy profile), and the rules hold no state. */
class ModelRuleMetadataTests {
    /** The rules that read the training model's figures. */
    private static final List<String> MODEL_RULES = List.of("effort-missing", "effort-conflict", "far-from-failure",
            "high-rep-fatigue", "low-yield-set", "session-muscle-volume", "weekly-volume-max", "weekly-volume-min",
            "volume-spike", "recovery-gap", "session-time", "novice-heavy-complex", "constraint-load");
    private static final Map<String, RuleDefinition> RULES = BuiltInRules.all().stream()
            .collect(Collectors.toMap(RuleDefinition::id, r -> r));

    private static RuleMetadata metadata(String id) {
        RuleDefinition rule = RULES.get(id);
        assertTrue(rule instanceof Rule, id + " is a built-in programme rule");
        return rule.metadata();
    }

    private static double parameter(String id, String name) {
        return metadata(id).parameter(name).map(RuleParameter::defaultValue).orElseThrow();
    }

    @Test
    void defaultSeveritiesAreTheHypertrophyProfiles() {
        Map<String, Severity> expected = Map.ofEntries(Map.entry("effort-missing", Severity.WARNING),
                Map.entry("effort-conflict", Severity.WARNING), Map.entry("far-from-failure", Severity.WARNING),
                Map.entry("high-rep-fatigue", Severity.WARNING), Map.entry("low-yield-set", Severity.INFO),
                Map.entry("session-muscle-volume", Severity.WARNING), Map.entry("weekly-volume-max", Severity.WARNING),
                Map.entry("weekly-volume-min", Severity.INFO), Map.entry("volume-spike", Severity.WARNING),
                Map.entry("recovery-gap", Severity.WARNING), Map.entry("session-time", Severity.WARNING),
                Map.entry("novice-heavy-complex", Severity.WARNING), Map.entry("constraint-load", Severity.ERROR));
        assertEquals(expected.keySet(), Set.copyOf(MODEL_RULES));
        expected.forEach((id, severity) -> assertEquals(severity, metadata(id).defaultSeverity(), id));
    }

    @Test
    void defaultThresholdsAreTheBriefs() {
        assertEquals(5, parameter("far-from-failure", "min-rir"));
        assertEquals(15, parameter("high-rep-fatigue", "min-effort-reps"));
        assertEquals(2, parameter("high-rep-fatigue", "max-rir"));
        assertEquals(0.30, parameter("low-yield-set", "min-share"));
        assertEquals(10, parameter("session-muscle-volume", "max-sets"));
        assertEquals(20, parameter("weekly-volume-max", "max-sets"));
        assertEquals(20, parameter("weekly-volume-max", "max-sets-competition-lifts"));
        assertEquals(4, parameter("weekly-volume-min", "min-sets"));
        assertEquals(1.5, parameter("volume-spike", "max-ratio"));
        assertEquals(48, parameter("recovery-gap", "min-hours"));
        assertEquals(4, parameter("recovery-gap", "min-sets"));
        assertEquals(6, parameter("novice-heavy-complex", "max-effort-reps"));
    }

    @Test
    void everyRuleExplainsItselfAndNamesItsSource() {
        for (String id : MODEL_RULES) {
            RuleMetadata m = metadata(id);
            assertTrue(m.rationale().length() > 300, id + ": a rationale a coach can follow");
            assertTrue(m.source().matches(".*(\\d{4}|common practice).*"), id + ": " + m.source());
            m.parameters().forEach(p -> assertTrue(p.description().length() > 20, id + " " + p.name()));
        }
    }

    @Test
    void rulesAreFinalAndHoldNoState() {
        for (String id : MODEL_RULES) {
            Class<?> type = RULES.get(id).getClass();
            assertTrue(Modifier.isFinal(type.getModifiers()), id);
            for (Field field : type.getDeclaredFields()) {
                assertTrue(Modifier.isStatic(field.getModifiers()) && Modifier.isFinal(field.getModifiers()),
                        id + ": " + field.getName() + " is a constant");
            }
        }
    }

    @Test
    void everyModelRuleIsRegistered() {
        List<String> ids = BuiltInRules.all().stream().map(RuleDefinition::id).toList();
        assertTrue(ids.containsAll(MODEL_RULES), ids.toString());
    }
}
