package dev.mesolint.core.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.rule.RuleDefinition;
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
}
