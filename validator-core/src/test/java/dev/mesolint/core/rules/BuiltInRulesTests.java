package dev.mesolint.core.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The rule framework's contract, checked over every built-in rule at once. */
class BuiltInRulesTests {
    private final List<RuleDefinition> rules = BuiltInRules.all();

    @Test
    void idsAreUniqueAndTheListIsFresh() {
        Set<String> ids = new HashSet<>();
        rules.forEach(r -> assertTrue(ids.add(r.id()), "duplicate id " + r.id()));
        assertTrue(BuiltInRules.all() != BuiltInRules.all(), "each call builds its own immutable list");
    }

    @Test
    void everyRuleIsOneFinalStatelessClassWithItsIdConstant() throws ReflectiveOperationException {
        for (RuleDefinition r : rules) {
            Class<?> type = r.getClass();
            assertTrue(Modifier.isFinal(type.getModifiers()), type + " is final");
            assertEquals(type.getPackageName(), "dev.mesolint.core.rules");
            for (Field f : type.getDeclaredFields()) {
                assertTrue(Modifier.isStatic(f.getModifiers()) && Modifier.isFinal(f.getModifiers()),
                        type.getSimpleName() + "." + f.getName() + " must be static final: rules are stateless");
            }
            assertEquals(r.id(), type.getField("ID").get(null), type.getSimpleName() + ".ID");
        }
    }

    @Test
    void metadataIsCompleteForTheReference() {
        for (RuleDefinition r : rules) {
            var m = r.metadata();
            assertTrue(m.summary().endsWith("."), m.id() + " summary is a sentence");
            assertTrue(m.rationale().length() > 120, m.id() + " rationale is a paragraph");
            for (RuleParameter p : m.parameters()) {
                assertTrue(p.min() < p.max(), m.id() + " " + p.name() + " has a range");
                assertTrue(p.description().endsWith("."), m.id() + " " + p.name() + " description is a sentence");
            }
        }
    }

    /**
     * A summary writes each threshold as its parameter, so it reads true under every profile: no number stands in
     * its text but "1RM", no profile is named, and a parameter set to another value shows that value.
     */
    @Test
    void summariesAreRenderedFromTheParametersNotWrittenWithTheirValues() {
        for (RuleDefinition r : rules) {
            RuleMetadata m = r.metadata();
            String literal = m.summaryTemplate().replaceAll("\\{[a-z0-9-]+}", "").replace("1RM", "");
            if (!m.parameters().isEmpty()) {
                assertFalse(literal.matches("(?s).*\\d.*"), m.id() + ": a number in the summary's own words, write "
                        + "it as {parameter}: " + m.summaryTemplate());
            }
            assertFalse(literal.contains("profile"), m.id() + ": the summary names a profile: " + m.summaryTemplate());
            for (RuleParameter p : m.parameters()) {
                if (m.summaryTemplate().contains("{" + p.name() + "}")) {
                    String moved = m.summary(q -> q == p ? (p.min() + p.max()) / 2 : q.defaultValue());
                    assertTrue(moved.contains(p.display((p.min() + p.max()) / 2)), m.id() + " " + p.name() + ": "
                            + moved);
                }
            }
        }
    }

    @Test
    void aSummaryNamingAParameterTheRuleLacksIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new RuleMetadata("demo-rule",
                "More than {max-weeks} weeks.", Severity.INFO, RuleMetadata.Category.RECOVERY, List.of(),
                "A rationale long enough.", "common practice"));
        assertTrue(e.getMessage().contains("{max-weeks}"), e.getMessage());
    }
}
