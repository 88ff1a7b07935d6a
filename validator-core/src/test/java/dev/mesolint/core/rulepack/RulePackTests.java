package dev.mesolint.core.rulepack;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.reference.FixtureVerdict;
import dev.mesolint.core.reference.RuleFixtures;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RulePack;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.TempFiles;
import java.io.IOException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Enumeration;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RulePackTests {
    @TempDir
    Path root;

    /** Seven exercises of two sets, paired so that each muscle they train directly gets four hard sets. */
    private static final String PROGRAMME = """
            format: 1
            programme:
              id: harbour-long-class
              level: novice
              goal: general-fitness
            weeks:
              - week: 1
                sessions:
                  - day: 2
                    work:
                      - {exercise: goblet-squat, sets: 2, reps: 10, rir: 3, rest: 2min}
                      - {exercise: machine-leg-press, sets: 2, reps: 10, rir: 3, rest: 2min}
                      - {exercise: push-up, sets: 2, reps: 10, rir: 3, rest: 2min}
                      - {exercise: machine-chest-press, sets: 2, reps: 10, rir: 3, rest: 2min}
                      - {exercise: seated-cable-row, sets: 2, reps: 10, rir: 3, rest: 2min}
                      - {exercise: machine-chest-supported-row, sets: 2, reps: 10, rir: 3, rest: 2min}
                      - {exercise: glute-bridge, sets: 2, reps: 10, rir: 3, rest: 2min}
            """;

    @Test
    void thePackOnTheClassPathIsLoadedAfterTheBuiltInRules() throws ConfigProblem {
        InstalledRules installed = InstalledRules.discover(getClass().getClassLoader());
        assertEquals(BuiltInRules.all().size() + 1, installed.rules().size());
        assertEquals(ExerciseCountRule.ID, installed.rules().get(installed.rules().size() - 1).id());
        assertEquals(Optional.of("harbourside-example"), installed.pack(ExerciseCountRule.ID));
        assertEquals(Optional.empty(), installed.pack("short-rest-compound"));
    }

    @Test
    void thePackRuleFiresAndProfilesConfigureIt() throws ConfigProblem {
        Path file = TempFiles.write(root, "class.yaml", PROGRAMME);
        InstalledRules installed = InstalledRules.discover(getClass().getClassLoader());
        Workspace ws = Workspace.open(RunOptions.at(root), installed.rules());
        List<Finding> found = new Checker(ws.request(List.of(file)), installed.rules()).run().active();
        assertEquals(1, found.size(), found.toString());
        assertEquals("club-exercise-count", found.get(0).ruleId());
        assertEquals(9, found.get(0).location().line());
        assertEquals("week 1 day 2: 7 exercises, the general-fitness profile allows 6", found.get(0).message());

        TempFiles.write(root, "club.yaml", """
                profile: harbourside-classes
                extends: general-fitness
                rules:
                  club-exercise-count: {severity: info, max-exercises: 8}
                """);
        Workspace configured = Workspace.open(new RunOptions(root, Optional.empty(), Optional.of(
                root.resolve("club.yaml").toString()), Optional.empty(), List.of(), Optional.empty()),
                installed.rules());
        assertEquals(List.of(), new Checker(configured.request(List.of(file)), installed.rules()).run().active());
        assertEquals(Severity.INFO, configured.profiles().get("harbourside-classes")
                .settings(installed.find(ExerciseCountRule.ID).orElseThrow()).severity());
    }

    @Test
    void thePublicFixtureHarnessChecksAPacksOwnFixtures() throws Exception {
        InstalledRules installed = InstalledRules.discover(getClass().getClassLoader());
        List<FixtureVerdict> verdicts = RuleFixtures.check(Path.of("src/test/resources/pack-fixtures"),
                installed.rules());
        assertEquals(2, verdicts.size());
        verdicts.forEach(v -> assertTrue(v.holds(), v.explain()));
    }

    @Test
    void theHarnessFailsAFixtureWhoseMarkersAreWrong() throws Exception {
        InstalledRules installed = InstalledRules.discover(getClass().getClassLoader());
        Path folder = root.resolve("club-exercise-count");
        Files.createDirectories(folder);
        // A "passing" fixture that breaks the rule, and marks nothing: two problems, both named.
        Files.copy(Path.of("src/test/resources/pack-fixtures/club-exercise-count/failing.yaml"),
                folder.resolve("passing.yaml"));
        Files.writeString(folder.resolve("passing.yaml"), Files.readString(folder.resolve("passing.yaml"))
                .replace(" # expect: club-exercise-count", ""));
        FixtureVerdict verdict = RuleFixtures.check(root, installed.rules()).get(0);
        assertEquals(List.of("unexpected: line  10 club-exercise-count"), verdict.problems());
        assertThrows(IOException.class, () -> RuleFixtures.check(root.resolve("nowhere"), installed.rules()),
                "a missing fixture folder cannot pass unseen");
    }

    /** A pack that reuses a built-in id. */
    public static final class ClashingPack implements RulePack {
        @Override
        public String name() {
            return "clashing";
        }

        @Override
        public List<Rule> rules() {
            return List.of(new dev.mesolint.core.rules.NoDeloadRule());
        }
    }

    @Test
    void aPackWhoseRuleIdClashesStopsTheRunNamingBoth() throws IOException {
        Path services = TempFiles.write(root, "META-INF/services/dev.mesolint.core.rule.RulePack",
                ClashingPack.class.getName() + "\n");
        ClassLoader parent = getClass().getClassLoader();
        URL extra = root.toUri().toURL();
        ClassLoader loader = new URLClassLoader(new URL[] {extra}, parent) {
            @Override
            public Enumeration<URL> getResources(String name) throws IOException {
                // only the clashing pack, not the example pack of the test class path
                return name.startsWith("META-INF/services/") ? findResources(name) : super.getResources(name);
            }
        };
        assertTrue(Files.exists(services));
        ConfigProblem p = assertThrows(ConfigProblem.class, () -> InstalledRules.discover(loader));
        assertEquals("rule pack clashing: rule id 'no-deload' is already defined by the built-in rules (fix: give "
                + "the pack's rule an id of its own, e.g. prefixed with the team's name)", p.describe());
    }
}
