package dev.mesolint.core.cache;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RuleConfiguration;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Severity;
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
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/** A damaged, edited or foreign cache is never trusted: what a run reports equals what a fresh check finds. */
class CacheIntegrityTests {
    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final ConfigurationKey KEY = ConfigurationKey.forThisVersion().option("failOn", "error");

    @TempDir
    Path dir;
    Path programmes;
    Path catalogue;
    Path cacheFile;

    @BeforeEach
    void repository() throws IOException {
        programmes = Files.createDirectories(dir.resolve("programmes"));
        cacheFile = dir.resolve("target/mesolint/cache.json");
        catalogue = dir.resolve("club-exercises.yaml");
        // A catalogue with a finding, so the stored catalogue reports are worth damaging too.
        Files.writeString(catalogue, "this: is not a catalogue\n");
        Files.writeString(programmes.resolve("good.yaml"), Programmes.oneWeek());
        Files.writeString(programmes.resolve("misspelt.yaml"), Programmes.oneWeek()
                .replace("id: harbour-test", "id: harbour-misspelt")
                .replace("barbell-bench-press", "barbel-bench-press"));
        Files.writeString(programmes.resolve("waived.yaml"), Programmes.oneWeek()
                .replace("id: harbour-test", "id: harbour-waived")
                .replace("barbell-bench-press", "harbour-sled-press")
                .replace("rest: 3min", "rest: 3min\n            waive: [{rule: unknown-exercise, reason: club sled}]"));
    }

    private CachedCheck.Outcome run(Optional<ResultCache> cache) throws IOException {
        CheckRequest request = new CheckRequest(List.of(programmes), dir, Severity.ERROR, List.of(catalogue),
                RuleConfiguration.DEFAULTS, YamlLimits.DEFAULTS);
        return new CachedCheck(request, BuiltInRules.all()).run(cache);
    }

    private CachedCheck.Outcome runAndSave() throws IOException {
        ResultCache cache = ResultCache.open(cacheFile, KEY);
        CachedCheck.Outcome outcome = run(Optional.of(cache));
        cache.save();
        return outcome;
    }

    /** Everything a report prints about each file, field for field (findings are records). */
    private static List<String> results(RunReport report) {
        return report.files().stream().map(CacheIntegrityTests::result).sorted().toList();
    }

    private static String result(FileReport f) {
        return f.displayPath() + " " + f.profile() + " " + f.identity() + " " + f.findings();
    }

    @Test
    void noSingleFlippedByteChangesWhatARunReports() throws IOException {
        List<String> fresh = results(run(Optional.empty()).report());
        runAndSave();
        byte[] written = Files.readAllBytes(cacheFile);
        int flips = 400;
        int reusingRuns = 0;
        int rejectedEntries = 0;
        for (int i = 0; i < flips; i++) {
            // Spread over the whole file, each a different low bit, so keys, numbers, texts and hashes are all hit.
            int at = (int) ((long) i * written.length / flips);
            byte[] damaged = written.clone();
            damaged[at] ^= (byte) (1 << (i % 7));
            Files.write(cacheFile, damaged);
            ResultCache cache = ResultCache.open(cacheFile, KEY);
            CachedCheck.Outcome outcome = run(Optional.of(cache));
            assertEquals(fresh, results(outcome.report()), "byte " + at + " flipped with mask " + (1 << (i % 7)));
            reusingRuns += outcome.reused() > 0 ? 1 : 0;
            rejectedEntries += cache.rejectedEntries();
        }
        // The loop must exercise both paths: flips the cache survives (whitespace, other entries) and rejected entries.
        assertTrue(reusingRuns > flips / 4, "runs that reused something: " + reusingRuns);
        assertTrue(rejectedEntries > flips / 4, "entries rejected by their checksum: " + rejectedEntries);
    }

    @Test
    void aFindingRemovedByHandIsFoundAgain() throws IOException {
        runAndSave();
        ObjectNode root = (ObjectNode) JSON.readTree(cacheFile.toFile());
        ArrayNode findings = (ArrayNode) root.path("files").path("programmes/misspelt.yaml").path("findings");
        int before = findings.size();
        findings.removeAll();
        Files.writeString(cacheFile, JSON.writeValueAsString(root));

        ResultCache cache = ResultCache.open(cacheFile, KEY);
        CachedCheck.Outcome again = run(Optional.of(cache));
        assertTrue(before > 0);
        assertEquals(1, cache.rejectedEntries());
        assertEquals(2, again.reused(), "the other two entries are intact");
        assertEquals(1, again.checked());
        assertTrue(again.report().failed(), "the removed unknown-exercise error counts again");
        assertEquals(results(run(Optional.empty()).report()), results(again.report()));
    }

    @Test
    void anEntryCopiedOverAnotherFileIsNotReused() throws IOException {
        runAndSave();
        ObjectNode root = (ObjectNode) JSON.readTree(cacheFile.toFile());
        ObjectNode files = (ObjectNode) root.path("files");
        // The clean file's entry, checksum and all, under the failing file's name; the content hash is kept right.
        ObjectNode moved = (ObjectNode) files.path("programmes/good.yaml").deepCopy();
        moved.put("content", files.path("programmes/misspelt.yaml").path("content").asString());
        files.set("programmes/misspelt.yaml", moved);
        Files.writeString(cacheFile, JSON.writeValueAsString(root));

        CachedCheck.Outcome again = run(Optional.of(ResultCache.open(cacheFile, KEY)));
        assertEquals(2, again.reused());
        assertTrue(again.report().failed());
    }

    @Test
    void anotherToolOrRuleSetVersionDiscardsTheCache() throws IOException {
        runAndSave();
        JsonNode root = JSON.readTree(cacheFile.toFile());
        assertEquals(Mesolint.version(), root.path("mesolint").asString());
        assertEquals(Mesolint.RULE_SET_VERSION, root.path("ruleSet").asString());
        assertEquals(3, run(Optional.of(ResultCache.open(cacheFile, KEY))).reused(), "same versions reuse");

        ToolVersions now = ToolVersions.current();
        for (ToolVersions other : List.of(new ToolVersions("0.0.1", now.ruleSet()),
                new ToolVersions(now.mesolint(), "2020.1.1"))) {
            ResultCache cache = ResultCache.open(cacheFile, KEY, other);
            assertTrue(cache.discarded().orElseThrow().contains("cache written by " + now), cache.discarded()
                    .toString());
            assertEquals(0, run(Optional.of(cache)).reused(), other.toString());
        }

        // A file whose recorded version was edited is discarded as well: the plain-text versions are checked.
        Files.writeString(cacheFile, Files.readString(cacheFile).replace("\"ruleSet\" : \"" + now.ruleSet() + "\"",
                "\"ruleSet\" : \"2020.1.1\""));
        ResultCache edited = ResultCache.open(cacheFile, KEY);
        assertTrue(edited.discarded().isPresent(), Files.readString(cacheFile));
        assertEquals(0, run(Optional.of(edited)).reused());
    }
}
