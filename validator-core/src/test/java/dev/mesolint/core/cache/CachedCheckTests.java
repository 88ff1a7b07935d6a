package dev.mesolint.core.cache;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.RuleConfiguration;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.report.ConsoleReport;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.Programmes;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CachedCheckTests {
    @TempDir
    Path dir;
    Path programmes;
    Path cacheFile;

    @BeforeEach
    void repository() throws IOException {
        programmes = Files.createDirectories(dir.resolve("programmes"));
        cacheFile = dir.resolve("target/mesolint/cache.json");
        Files.writeString(programmes.resolve("good.yaml"), Programmes.oneWeek());
        Files.writeString(programmes.resolve("misspelt.yaml"), Programmes.oneWeek()
                .replace("id: harbour-test", "id: harbour-misspelt")
                .replace("barbell-bench-press", "barbel-bench-press"));
        Files.writeString(programmes.resolve("waived.yaml"), Programmes.oneWeek()
                .replace("id: harbour-test", "id: harbour-waived")
                .replace("barbell-bench-press", "harbour-sled-press")
                .replace("rest: 3min", "rest: 3min\n            waive: [{rule: unknown-exercise, reason: club sled}]"));
    }

    private CachedCheck.Outcome run(ConfigurationKey key, List<Path> catalogues) throws IOException {
        CheckRequest request = new CheckRequest(List.of(programmes), dir, Severity.ERROR, catalogues,
                RuleConfiguration.DEFAULTS, YamlLimits.DEFAULTS);
        ResultCache cache = ResultCache.open(cacheFile, key);
        CachedCheck.Outcome outcome = new CachedCheck(request, BuiltInRules.all()).run(Optional.of(cache));
        cache.save();
        return outcome;
    }

    private CachedCheck.Outcome run() throws IOException {
        return run(ConfigurationKey.forThisVersion().option("failOn", "error"), List.of());
    }

    private static List<String> lines(RunReport report) {
        return report.files().stream().flatMap(f -> f.findings().stream()).flatMap(f -> ConsoleReport.lines(f)
                .stream()).toList();
    }

    @Test
    void anUnchangedRepositoryReusesEveryResultAndPrintsTheSameLines() throws IOException {
        CachedCheck.Outcome first = run();
        assertEquals(0, first.reused());
        assertEquals(3, first.checked());
        assertTrue(Files.isRegularFile(cacheFile));

        CachedCheck.Outcome second = run();
        assertEquals(3, second.reused());
        assertEquals(0, second.checked());
        assertEquals(lines(first.report()), lines(second.report()));
        assertTrue(second.report().failed(), "a cached failing run still fails");
        assertEquals(1, second.report().waivedCount(), "the waiver and its reason survive the cache");
        assertTrue(lines(second.report()).contains("    waived at line 19: club sled"), lines(second.report())
                .toString());
        assertTrue(lines(second.report()).contains("programmes/misspelt.yaml:14:23: error unknown-exercise: unknown "
                + "exercise 'barbel-bench-press'; closest ids: barbell-bench-press, dumbbell-bench-press, "
                + "barbell-push-press"), lines(second.report()).toString());
    }

    @Test
    void onlyTheEditedFileIsCheckedAgain() throws IOException {
        run();
        Files.writeString(programmes.resolve("misspelt.yaml"), Programmes.oneWeek()
                .replace("id: harbour-test", "id: harbour-misspelt"));

        CachedCheck.Outcome second = run();
        assertEquals(2, second.reused());
        assertEquals(1, second.checked());
        assertFalse(second.report().failed(), "the fix is seen, not the stored failure");
    }

    @Test
    void aSharedProgrammeIdIsFoundAmongCachedFilesToo() throws IOException {
        run();
        // The edited file takes the id of a cached one: the two are compared although one was not checked again.
        Files.writeString(programmes.resolve("misspelt.yaml"), Programmes.oneWeek());
        CachedCheck.Outcome second = run();
        assertEquals(2, second.reused());
        List<String> shared = second.report().active().stream()
                .filter(f -> f.ruleId().equals("duplicate-programme-id")).map(f -> f.file() + ":" + f.location())
                .sorted().toList();
        assertEquals(List.of("programmes/good.yaml:3:7", "programmes/misspelt.yaml:3:7"), shared);
        assertTrue(second.report().failed());
    }

    @Test
    void aChangedConfigurationOrVersionReusesNothing() throws IOException {
        run();
        assertEquals(0, run(ConfigurationKey.forThisVersion().option("failOn", "warning"), List.of()).reused());
        run();
        assertEquals(0, run(ConfigurationKey.forVersion("9.9.9").option("failOn", "error"), List.of()).reused());
        assertTrue(ResultCache.open(cacheFile, ConfigurationKey.forThisVersion()).discarded().isPresent());
    }

    @Test
    void editingACatalogueFileChangesTheKeyAndItsFindingsAreReproducedFromTheCache() throws IOException {
        Path catalogue = dir.resolve("club-exercises.yaml");
        Files.writeString(catalogue, "this: is not a catalogue\n");
        ConfigurationKey key = ConfigurationKey.forThisVersion().file("catalogue", catalogue);
        CachedCheck.Outcome first = run(key, List.of(catalogue));
        CachedCheck.Outcome second = run(ConfigurationKey.forThisVersion().file("catalogue", catalogue),
                List.of(catalogue));
        assertEquals(3, second.reused());
        List<String> catalogueLines = lines(second.report()).stream()
                .filter(l -> l.startsWith("club-exercises.yaml:")).toList();
        assertFalse(catalogueLines.isEmpty(), lines(second.report()).toString());
        assertEquals(lines(first.report()), lines(second.report()));

        Files.writeString(catalogue, "still: not a catalogue\n");
        assertEquals(0, run(ConfigurationKey.forThisVersion().file("catalogue", catalogue), List.of(catalogue))
                .reused());
    }

    @Test
    void aDamagedCacheFileIsIgnoredAndRewritten() throws IOException {
        run();
        Files.writeString(cacheFile, "{\"format\": 1, \"configuration\": ");
        CachedCheck.Outcome again = run();
        assertEquals(0, again.reused());
        assertTrue(again.report().failed());
        assertEquals(3, run().reused(), "the damaged file was replaced by a good one");
    }

    @Test
    void deletedProgrammesLeaveTheCache() throws IOException {
        run();
        Files.delete(programmes.resolve("misspelt.yaml"));
        CachedCheck.Outcome second = run();
        assertEquals(2, second.report().files().size());
        assertFalse(Files.readString(cacheFile).contains("misspelt"));
    }
}
