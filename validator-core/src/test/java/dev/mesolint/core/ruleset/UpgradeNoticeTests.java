package dev.mesolint.core.ruleset;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class UpgradeNoticeTests {
    private static final RuleSetChanges CHANGES = RuleSetChanges.parse("""
            ### Rule set 2027.02.1

            - `rule-b`: later
            ### Rule set 2027.01.1

            - `rule-a`: earlier
            ### Rule set 2026.12.1
            """);

    @Test
    void theSameVersionSaysNothing() {
        assertEquals(Optional.empty(), UpgradeNotice.lines(v("2027.01.1"), v("2027.01.1"), ".mesolint.yaml", CHANGES));
    }

    @Test
    void anOlderRecordedVersionNamesEveryChangeSinceWithoutBackticks() {
        List<String> lines = UpgradeNotice.lines(v("2026.12.1"), v("2027.02.1"), "club/.mesolint.yaml", CHANGES)
                .orElseThrow();
        assertTrue(lines.get(0).startsWith("club/.mesolint.yaml records rules-version 2026.12.1; this mesolint "
                + "applies rule set 2027.02.1"), lines.get(0));
        assertEquals(List.of("  2027.01.1: rule-a: earlier", "  2027.02.1: rule-b: later"), lines.subList(1, 3));
        assertTrue(lines.get(3).contains("write rules-version: 2027.02.1 in club/.mesolint.yaml"), lines.get(3));
        assertEquals(4, lines.size());
    }

    @Test
    void aVersionBetweenReleasesListsOnlyTheLaterOnes() {
        List<String> lines = UpgradeNotice.lines(v("2027.01.5"), v("2027.02.1"), ".mesolint.yaml", CHANGES)
                .orElseThrow();
        assertTrue(lines.contains("  2027.02.1: rule-b: later"), lines.toString());
        assertFalse(lines.stream().anyMatch(l -> l.contains("rule-a")), lines.toString());
    }

    @Test
    void aNewerRecordedVersionAsksForAnUpgrade() {
        List<String> lines = UpgradeNotice.lines(v("2027.03.1"), v("2027.02.1"), ".mesolint.yaml", CHANGES)
                .orElseThrow();
        assertEquals(1, lines.size());
        assertTrue(lines.get(0).contains("newer than rule set 2027.02.1 of this mesolint"), lines.get(0));
        assertTrue(lines.get(0).contains("Upgrade mesolint"), lines.get(0));
    }

    private static RuleSetVersion v(String text) {
        return RuleSetVersion.parse(text).orElseThrow();
    }
}
