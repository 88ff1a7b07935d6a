package dev.mesolint.core.ruleset;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class RuleSetVersionFormTests {
    @Test
    void versionsReadAsYearMonthReleaseAndOrderByNumberNotText() {
        RuleSetVersion nine = RuleSetVersion.parse("2026.12.9").orElseThrow();
        RuleSetVersion ten = RuleSetVersion.parse(" 2026.12.10 ").orElseThrow();
        assertTrue(ten.isAfter(nine), "10 after 9, though '1' sorts before '9'");
        assertTrue(RuleSetVersion.parse("2027.01.1").orElseThrow().isAfter(ten));
        assertEquals("2027.01.1", RuleSetVersion.parse("2027.01.1").orElseThrow().toString());
        assertEquals(Mesolint.RULE_SET_VERSION, RuleSetVersion.current().toString());
    }

    @Test
    void otherFormsAreNoVersion() {
        for (String text : List.of("2026.12", "2026.13.1", "2026.1.1", "26.12.1", "latest", "2026.12.1-beta", "")) {
            assertEquals(Optional.empty(), RuleSetVersion.parse(text), text);
        }
    }
}
