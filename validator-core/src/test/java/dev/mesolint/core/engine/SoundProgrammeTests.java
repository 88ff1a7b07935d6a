package dev.mesolint.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The sound sample programmes: written the way coaches write eight common styles, each checked under the profile
 * its goal selects. A checker a coaching team keeps switched on must stay quiet on them.
 *
 * <p>The finding counts per programme and rule are printed (run this class alone to see them).
 */
class SoundProgrammeTests {
    private static final Path SAMPLES = Path.of("../sample-programs").toAbsolutePath().normalize();
    private static final List<RuleDefinition> RULES = BuiltInRules.all();
    private static RunReport run;

    @BeforeAll
    static void checkTheSoundProgrammes() {
        run = new Checker(new CheckRequest(List.of(SAMPLES.resolve("sound")), SAMPLES, Severity.INFO, List.of(),
                ProfileConfiguration.builtIn(RULES), YamlLimits.DEFAULTS), RULES).run();
        run.files().forEach(f -> System.out.println(f.displayPath() + " [" + f.profile() + "] " + counts(f)
                + " " + byRule(f)));
    }

    private static Map<Severity, Long> counts(FileReport file) {
        return file.active().stream().collect(Collectors.groupingBy(Finding::severity, TreeMap::new,
                Collectors.counting()));
    }

    private static Map<String, Long> byRule(FileReport file) {
        return file.active().stream().collect(Collectors.groupingBy(f -> f.severity().name().toLowerCase(
                java.util.Locale.ROOT) + " " + f.ruleId(), TreeMap::new, Collectors.counting()));
    }

    @Test
    void thereAreEightSoundProgrammesEachNamingItsStyleAsCommonPractice() throws IOException {
        assertEquals(8, run.files().size());
        for (FileReport file : run.files()) {
            String text = Files.readString(SAMPLES.resolve(file.displayPath()));
            assertTrue(text.contains("(common practice)"), file.displayPath() + " names its style as common practice");
            assertTrue(text.contains("Harbourside Strength Club"), file.displayPath());
            assertTrue(!text.contains("waive:"), file.displayPath() + " has no waivers");
        }
    }

    @Test
    void everySoundProgrammeLoadsAndIsCheckedUnderTheProfileItsGoalSelects() {
        for (FileReport file : run.files()) {
            assertTrue(file.programme().isPresent(), file.displayPath() + " " + file.findings());
            String goal = file.programme().orElseThrow().info().goal().yamlName();
            assertEquals(goal, file.profile(), file.displayPath());
            assertTrue(file.findings().stream().noneMatch(f -> f.ruleId().equals("schema")
                    || f.ruleId().equals("yaml-syntax") || f.ruleId().equals("unknown-exercise")),
                    file.displayPath() + " " + file.findings());
        }
    }

    /**
     * The acceptance bar of a sound programme: no error, at most 2 warnings and at most 5 info findings under the
     * profile its goal selects (issue "findings a coach trusts": a checker that cries wolf gets switched off).
     */
    @Test
    void eachSoundProgrammeStaysUnderTheNoiseBar() {
        List<String> over = run.files().stream()
                .filter(f -> count(f, Severity.ERROR) > 0 || count(f, Severity.WARNING) > 2
                        || count(f, Severity.INFO) > 5)
                .map(f -> f.displayPath() + " " + counts(f) + " " + f.active().stream()
                        .filter(x -> x.severity() != Severity.INFO || count(f, Severity.INFO) > 5)
                        .map(Finding::toString).toList())
                .toList();
        assertEquals(List.of(), over);
    }

    private static long count(FileReport file, Severity severity) {
        return file.active().stream().filter(f -> f.severity() == severity).count();
    }
}
