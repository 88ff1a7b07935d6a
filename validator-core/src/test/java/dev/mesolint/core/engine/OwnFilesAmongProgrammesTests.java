package dev.mesolint.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.Programmes;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A catalogue, team profile or configuration among the programmes is checked as what it is, and said to be. */
class OwnFilesAmongProgrammesTests {
    private static final String CATALOGUE = """
            format: 1
            exercises:
              - id: harbour-sled-push
                name: Harbourside sled push
                kind: compound
                pattern: squat
                stability: stable
                skill: low
                muscles: {quadriceps: 1, glutes: 0.5}
                regions: [knee, hip, ankle]
            """;

    @TempDir
    Path dir;
    Path programmes;

    @BeforeEach
    void folder() throws IOException {
        programmes = Files.createDirectories(dir.resolve("programmes"));
        Files.createDirectories(programmes.resolve("rehab"));
        Files.writeString(programmes.resolve("block.yaml"), Programmes.oneWeek());
        Files.writeString(programmes.resolve("club-exercises.yaml"), CATALOGUE);
        Files.writeString(programmes.resolve("broken-exercises.yaml"), CATALOGUE.replace("kind: compound",
                "kind: compund"));
        Files.writeString(programmes.resolve("club-profile.yaml"), "profile: club-hypertrophy\nextends: hypertrophy\n");
        Files.writeString(programmes.resolve("typo-profile.yaml"), "profile: club-strength\nextends: strength\n"
                + "rules:\n  weekly-volume-mx: {severity: warning}\n");
        Files.writeString(programmes.resolve("rehab/.mesolint.yaml"), "fail-levl: warning\n");
        // The start folder's own configuration may be the one in effect: read as such by the workspace, not here.
        Files.writeString(programmes.resolve(".mesolint.yaml"), "fail-on: error\n");
    }

    private Map<String, FileReport> byPath() {
        RunReport run = new Checker(CheckRequest.of(List.of(programmes), dir), BuiltInRules.all()).run();
        Map<String, FileReport> out = new TreeMap<>();
        run.files().forEach(f -> out.put(f.displayPath(), f));
        return out;
    }

    private static List<String> texts(FileReport report) {
        return report.findings().stream().map(f -> f.location().line() + ":" + f.location().column() + " "
                + f.ruleId() + " " + f.message()).toList();
    }

    @Test
    void eachFileIsCheckedAsWhatItIs() {
        Map<String, FileReport> files = byPath();
        assertEquals(List.of("programmes/block.yaml", "programmes/broken-exercises.yaml",
                "programmes/club-exercises.yaml", "programmes/club-profile.yaml", "programmes/rehab/.mesolint.yaml",
                "programmes/typo-profile.yaml"), List.copyOf(files.keySet()));
        assertEquals(Optional.empty(), files.get("programmes/block.yaml").checkedAs());
        assertEquals(Optional.of(OwnFileKind.CATALOGUE), files.get("programmes/club-exercises.yaml").checkedAs());
        assertEquals(List.of(), texts(files.get("programmes/club-exercises.yaml")), "a sound catalogue has no "
                + "finding (as a programme it would lack programme: and weeks:)");
        assertEquals(Optional.of(OwnFileKind.PROFILE), files.get("programmes/club-profile.yaml").checkedAs());
        assertEquals(List.of(), texts(files.get("programmes/club-profile.yaml")));
        assertEquals(Optional.of(OwnFileKind.CONFIGURATION),
                files.get("programmes/rehab/.mesolint.yaml").checkedAs());
    }

    @Test
    void theirProblemsAreLocatedFindingsInTheirOwnTerms() {
        Map<String, FileReport> files = byPath();
        List<String> catalogue = texts(files.get("programmes/broken-exercises.yaml"));
        assertEquals(1, catalogue.size(), catalogue.toString());
        assertTrue(catalogue.get(0).startsWith("5:11 schema ") && catalogue.get(0).contains("compund"),
                catalogue.toString());
        List<String> profile = texts(files.get("programmes/typo-profile.yaml"));
        assertEquals(1, profile.size(), profile.toString());
        assertTrue(profile.get(0).startsWith("4:3 schema ") && profile.get(0).contains("weekly-volume-mx"),
                profile.toString());
        List<String> config = texts(files.get("programmes/rehab/.mesolint.yaml"));
        assertEquals(1, config.size(), config.toString());
        assertTrue(config.get(0).startsWith("1:1 schema ") && config.get(0).contains("fail-levl"), config.toString());
        assertTrue(files.values().stream().flatMap(f -> f.findings().stream()).map(Finding::message)
                .noneMatch(m -> m.contains("'programme'") || m.contains("'weeks'")),
                "no own file is judged as a programme");
    }

    @Test
    void theNoticeSaysWhatTheFileWasCheckedAsAndThatItIsNotInEffect() {
        assertEquals("programmes/club-exercises.yaml was checked as an exercise catalogue, not as a programme; it is "
                + "not in effect in this run (name it under catalogues: in .mesolint.yaml to use its exercises)",
                OwnFileKind.CATALOGUE.notice("programmes/club-exercises.yaml"));
    }

    @Test
    void filesInEffectAreNotCheckedAgain() throws IOException {
        Path catalogue = programmes.resolve("club-exercises.yaml");
        CheckRequest request = new CheckRequest(List.of(programmes), dir, dev.mesolint.core.finding.Severity.ERROR,
                List.of(catalogue), RuleConfiguration.DEFAULTS, dev.mesolint.core.yaml.YamlLimits.DEFAULTS);
        RunReport run = new Checker(request, BuiltInRules.all()).run();
        assertTrue(run.files().stream().noneMatch(f -> f.displayPath().equals("programmes/club-exercises.yaml")),
                "a configured catalogue is read as the catalogue, not reported as a file among the programmes");
    }
}
