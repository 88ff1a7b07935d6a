package dev.mesolint.core.ruleset;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** The rule-set changes shipped in the jar are the changelog's, and name the version this build applies. */
class RuleSetChangesTests {
    private static final Path CHANGELOG = Path.of("../CHANGELOG.md").toAbsolutePath().normalize();
    private static final Pattern HEADING = Pattern.compile("(?m)^### Rule set (\\S+)$");

    @Test
    void theShippedChangesAreTheChangelogsRuleSetSectionsWordForWord() throws IOException {
        String changelog = Files.readString(CHANGELOG, StandardCharsets.UTF_8);
        String shipped = RuleSetChanges.text().strip();
        assertTrue(changelog.contains("## Rule-set versions\n"), "CHANGELOG.md has a 'Rule-set versions' part");
        assertTrue(changelog.contains(shipped), "copy validator-core/src/main/resources" + RuleSetChanges.RESOURCE
                + " into CHANGELOG.md under '## Rule-set versions' (or the other way round): they differ");
        assertEquals(headings(shipped), headings(changelog), "every rule-set section of CHANGELOG.md is shipped");
    }

    @Test
    void theNewestVersionIsTheOneThisBuildApplies() {
        List<RuleSetChanges.Release> releases = RuleSetChanges.shipped().releases();
        assertEquals(Mesolint.RULE_SET_VERSION, releases.get(releases.size() - 1).version().toString(),
                "a new RULE_SET_VERSION needs its section in CHANGELOG.md and the shipped changes");
        assertTrue(releases.size() >= 2, "the first rule set and the current one");
    }

    @Test
    void betweenTwoVersionsAreTheLaterOnesUpToTheNewer() {
        RuleSetChanges changes = RuleSetChanges.parse("""
                ### Rule set 2027.01.2

                Intro for readers.

                - `rule-c`: third,
                  continued.

                ### Rule set 2027.01.1

                - `rule-b`: second
                - `rule-a`: also second

                ### Rule set 2026.12.9
                """);
        List<RuleSetChanges.Release> between = changes.between(v("2026.12.9"), v("2027.01.2"));
        assertEquals(List.of("2027.01.1", "2027.01.2"), between.stream().map(r -> r.version().toString()).toList());
        assertEquals(List.of("`rule-b`: second", "`rule-a`: also second"), between.get(0).entries());
        assertEquals(List.of("`rule-c`: third, continued."), between.get(1).entries());
        assertTrue(changes.between(v("2027.01.1"), v("2027.01.1")).isEmpty());
    }

    @Test
    void theShippedTextSaysWhichFindingsTheTrustChangesMoved() {
        List<String> entries = RuleSetChanges.shipped().between(v("2026.12.0"), v("2026.12.1")).stream()
                .flatMap(r -> r.entries().stream()).toList();
        for (String rule : List.of("far-from-failure", "volume-spike", "short-rest-compound", "fatigue-technique",
                "effort-conflict")) {
            assertTrue(entries.stream().anyMatch(e -> e.contains("`" + rule + "`")), rule + " in " + entries);
        }
        assertFalse(entries.isEmpty());
    }

    private static RuleSetVersion v(String text) {
        return RuleSetVersion.parse(text).orElseThrow();
    }

    private static List<String> headings(String text) {
        Matcher m = HEADING.matcher(text);
        List<String> found = new java.util.ArrayList<>();
        while (m.find()) {
            found.add(m.group(1));
        }
        return found;
    }
}
