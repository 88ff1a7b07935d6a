package dev.mesolint.core.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.profile.ProfileSet;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.FixtureHarness;
import dev.mesolint.core.testing.FixtureTests;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The checked-in rule reference ({@code docs/rules/}) is what the generator writes today. Regenerate with the
 * command in {@link RuleReference#REGENERATE} ({@code -Dmesolint.regenerateDocs=true}).
 */
class RuleReferenceTests {
    private static final Path DOCS = Path.of("../docs/rules").toAbsolutePath().normalize();
    private final List<RuleDefinition> rules = BuiltInRules.all();

    private Map<String, String> generate() throws IOException {
        RuleReference reference = new RuleReference(rules, ProfileSet.builtIn(rules));
        return reference.pages(reference.examples(FixtureHarness.FIXTURES));
    }

    @Test
    void checkedInPagesAreCurrent() throws IOException {
        Map<String, String> pages = generate();
        if (Boolean.getBoolean("mesolint.regenerateDocs")) {
            Files.createDirectories(DOCS);
            try (Stream<Path> old = Files.list(DOCS)) {
                for (Path p : old.filter(p -> p.toString().endsWith(".md")).toList()) {
                    Files.delete(p);
                }
            }
            for (Map.Entry<String, String> e : pages.entrySet()) {
                Files.writeString(DOCS.resolve(e.getKey()), e.getValue(), StandardCharsets.UTF_8);
            }
            return;
        }
        List<String> stale = new ArrayList<>();
        for (Map.Entry<String, String> e : pages.entrySet()) {
            Path file = DOCS.resolve(e.getKey());
            if (!Files.exists(file) || !Files.readString(file, StandardCharsets.UTF_8).equals(e.getValue())) {
                stale.add(e.getKey());
            }
        }
        if (Files.isDirectory(DOCS)) {
            try (Stream<Path> present = Files.list(DOCS)) {
                present.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".md") && !pages.containsKey(n))
                        .forEach(n -> stale.add(n + " (no such rule)"));
            }
        }
        if (!stale.isEmpty()) {
            fail("docs/rules is stale: " + String.join(", ", stale) + ". Regenerate with: " + RuleReference.REGENERATE);
        }
    }

    @Test
    void everyPageHasTheFactsACoachNeeds() throws IOException {
        Map<String, String> pages = generate();
        assertEquals(rules.size() + 1, pages.size());
        for (RuleDefinition rule : rules) {
            String page = pages.get(rule.id() + ".md");
            assertTrue(page.startsWith("# " + rule.id() + "\n"), rule.id());
            assertTrue(page.contains(rule.metadata().summary()), rule.id());
            // The default profile's severity: the metadata default, or off for a rule only another profile turns on.
            assertTrue(page.contains("| hypertrophy (default) | " + ProfileSet.builtIn(rules).get("hypertrophy")
                    .settings(rule).severity().label()), rule.id());
            assertTrue(page.contains("Default severity: " + rule.metadata().defaultSeverity().label()), rule.id());
            assertTrue(page.contains(rule.metadata().rationale()), rule.id());
            assertTrue(page.contains("Source: " + rule.metadata().source()), rule.id());
            assertTrue(page.endsWith("*" + Mesolint.CAUTION + "*\n"), rule.id());
            if (!FixtureTests.NOT_FROM_ONE_PROGRAMME.contains(rule.id())) {
                assertTrue(page.contains("## Example: reported"), rule.id());
                assertTrue(page.contains("## Example: not reported"), rule.id());
            }
        }
        String restPage = pages.get("short-rest-compound.md");
        assertTrue(restPage.contains("| strength | warning | 2min | 3min | 1min |"), restPage);
        assertTrue(restPage.contains("| `min-rest-assistance` | Shortest rest after a compound set of assistance "
                + "work (role: assistance, written or the catalogue's default). | 2min | 30s to 10min |"), restPage);
        assertTrue(restPage.contains("mesolint reports:\n\n```text\nshort-rest-compound/failing.yaml:18:19: warning "
                + "short-rest-compound: barbell-back-squat"), restPage);
        assertTrue(pages.get("README.md").contains("| [unstable-surface](unstable-surface.md) | effort | warning | "
                + "warning | off |"), pages.get("README.md"));
    }

    @Test
    void aRuleWithoutFixturesGetsAPageFromItsMetadataAlone() {
        RuleDefinition rule = new dev.mesolint.core.rulepack.ExerciseCountRule();
        String page = new RuleReference(rules, ProfileSet.builtIn(rules)).page(rule, Optional.empty());
        assertTrue(page.contains("| `max-exercises` | Most exercises"), page);
        assertTrue(!page.contains("## Example"), page);
    }
}
