package dev.mesolint.core.baseline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.DuplicateProgrammeIds;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.ProfileConfiguration;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.profile.ProfileChoice;
import dev.mesolint.core.profile.ProfileSet;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.TempFiles;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A baseline keeps matching its findings through the edits a team makes every week, and never covers what it must
 * not: each case of issue 11's list, and the safety cases (errors, files that did not load, stale entries).
 *
 * <p>The programme is a Harbourside Strength Club demo block. The two findings it has are short rests: 75 s after
 * back squat sets, against the 2 min the ACSM 2009 position stand (Ratamess et al., Med Sci Sports Exerc
 * 41(3):687-708) gives for core lifts, and 30 s after curl sets, short of the 60 s the hypertrophy profile asks after
 * isolation sets (common practice).
 */
class BaselineSurvivalTests {
    private final List<RuleDefinition> rules = BuiltInRules.all();

    @TempDir
    Path root;

    private static final String SQUAT = entry("barbell-back-squat", 4, 8, 2, "75s");
    private static final String CURL = entry("dumbbell-curl", 4, 12, 1, "30s");
    private static final String CRUNCH = entry("cable-crunch", 4, 12, 2, "60s");

    private static String entry(String exercise, int sets, int reps, int rir, String rest) {
        return "          - exercise: " + exercise + "\n            sets: " + sets + "\n            reps: " + reps
                + "\n            rir: " + rir + "\n            rest: " + rest + "\n";
    }

    private static String programme(String id, String sessionName, String weeksAfter, String... work) {
        return """
                format: 1
                programme:
                  id: %s
                  level: intermediate
                  goal: hypertrophy
                weeks:
                  - week: 1
                    sessions:
                      - day: 1
                        name: %s
                        work:
                """.formatted(id, sessionName) + String.join("", work) + weeksAfter;
    }

    private static final String ORIGINAL = programme("harbour-survival", "Lower A", "", SQUAT, CURL, CRUNCH);

    private RunReport check(ProfileChoice choice, Path... files) {
        return new Checker(new CheckRequest(List.of(files), root, Severity.WARNING, List.of(),
                new ProfileConfiguration(ProfileSet.builtIn(rules), choice), YamlLimits.DEFAULTS), rules).run();
    }

    private RunReport check(Path... files) {
        return check(ProfileChoice.BY_GOAL, files);
    }

    /** The baseline of {@code text} as file {@code name}, written and read back as a repository would. */
    private Baseline baselineOf(String name, String text) throws IOException, ConfigProblem {
        Path file = TempFiles.write(root, name, text);
        RunReport run = check(file);
        assertEquals(List.of("short-rest-compound", "short-rest-isolation"),
                run.active().stream().map(Finding::ruleId).toList(), "the two short rests");
        Path out = root.resolve(".mesolint-baseline.json");
        Baseline.record(run, false).baseline().write(out);
        return Baseline.read(out, ".mesolint-baseline.json");
    }

    /** The run after the edit, compared with the baseline: nothing new, both old findings held. */
    private static void assertStillHeld(Baseline baseline, RunReport after) {
        RunReport applied = baseline.apply(after);
        assertEquals(List.of(), applied.active().stream().map(Finding::message).toList());
        assertEquals(2, applied.baselinedCount());
        assertFalse(applied.failed());
    }

    @Test
    void survivesInsertedLines() throws IOException, ConfigProblem {
        Baseline baseline = baselineOf("block.yaml", ORIGINAL);
        Path file = TempFiles.write(root, "block.yaml", "# Harbourside Strength Club, spring block\n\n"
                + ORIGINAL.replace("  goal: hypertrophy\n", "  goal: hypertrophy\n  title: Spring block\n"));
        assertStillHeld(baseline, check(file));
    }

    @Test
    void survivesAnExerciseInsertedBeforeThem() throws IOException, ConfigProblem {
        Baseline baseline = baselineOf("block.yaml", ORIGINAL);
        String extension = """
                          - exercise: machine-leg-extension
                            sets: 2
                            reps: 12
                            rir: 2
                            rest: 90s
                """;
        // Before the squat and between squat and curls: every list position after it moves.
        Path file = TempFiles.write(root, "block.yaml", programme("harbour-survival", "Lower A", "", extension,
                SQUAT, extension, CURL, CRUNCH));
        RunReport after = check(file);
        assertNotEquals(check(TempFiles.write(root, "copy.yaml", ORIGINAL)).active().get(0).location().pointer(),
                after.active().get(0).location().pointer(), "the squat's pointer moved");
        assertStillHeld(baseline, check(file));
    }

    @Test
    void survivesAWeekInsertedBeforeThemAndTheWeeksRenumbered() throws IOException, ConfigProblem {
        String twoWeeks = ORIGINAL + "  - week: 2\n    sessions:\n      - day: 1\n        name: Lower B\n"
                + "        work:\n" + SQUAT.replace("75s", "2min") + CURL + CRUNCH;
        Path file = TempFiles.write(root, "block.yaml", twoWeeks);
        RunReport before = check(file);
        Baseline baseline = Baseline.record(before, false).baseline();
        assertEquals(3, baseline.size(), "week 1's two rests and week 2's curls: " + before.active());
        // A deload week inserted as week 2: the written week 2 becomes week 3.
        String inserted = ORIGINAL + "  - week: 2\n    repeat: 1\n    deload: true\n    adjust: {sets: -1}\n"
                + "  - week: 3\n    sessions:\n      - day: 1\n        name: Lower B\n        work:\n"
                + SQUAT.replace("75s", "2min") + CURL + CRUNCH;
        Files.writeString(file, inserted);
        RunReport applied = baseline.apply(check(file));
        assertEquals(List.of(), applied.active().stream().map(Finding::message).toList());
        assertTrue(applied.baselinedCount() >= 3, "the deload copies of week 1's lines are held too");
    }

    @Test
    void survivesARenamedSession() throws IOException, ConfigProblem {
        Baseline baseline = baselineOf("block.yaml", ORIGINAL);
        Path file = TempFiles.write(root, "block.yaml", ORIGINAL.replace("name: Lower A",
                "name: Lower A (squat focus)"));
        RunReport after = check(file);
        assertTrue(after.active().get(0).message().contains("(Lower A (squat focus))"), "the message names it");
        assertStillHeld(baseline, after);
    }

    @Test
    void survivesAMessageReworded() throws IOException, ConfigProblem {
        Baseline baseline = baselineOf("block.yaml", ORIGINAL);
        // As a new release would word them: same rule, place and subject, other text.
        RunReport after = check(TempFiles.write(root, "block.yaml", ORIGINAL));
        List<FileReport> reworded = after.files().stream().map(f -> f.withFindings(f.findings().stream()
                .map(x -> new Finding(x.ruleId(), x.severity(), x.file(), x.location(), "Reworded: " + x.message(),
                        x.fix(), x.waiver(), false, x.facts(), x.anchor()))
                .toList())).toList();
        assertStillHeld(baseline, new RunReport(reworded, after.failOn(), after.missing()));
    }

    @Test
    void survivesAChangedLimit() throws IOException, ConfigProblem {
        Baseline baseline = baselineOf("block.yaml", ORIGINAL);
        // The strength profile asks for 3 min after squat sets instead of 2 min: the message quotes the new limit.
        RunReport after = check(ProfileChoice.always("strength"), root.resolve("block.yaml"));
        Finding squat = after.active().stream().filter(f -> f.ruleId().equals("short-rest-compound")).findFirst()
                .orElseThrow();
        assertTrue(squat.message().contains("at least 180 s"), squat.message());
        assertEquals(180, squat.measure().orElseThrow().limit());
        RunReport applied = baseline.apply(after);
        assertEquals(2, applied.baselinedCount());
        assertTrue(applied.active().stream().noneMatch(f -> f.ruleId().startsWith("short-rest")),
                applied.active().toString());
    }

    @Test
    void survivesAddedRepeatWeeks() throws IOException, ConfigProblem {
        Baseline baseline = baselineOf("block.yaml", ORIGINAL);
        Path file = TempFiles.write(root, "block.yaml", ORIGINAL + "  - week: 2\n    repeat: 1\n"
                + "  - week: 3\n    repeat: 1\n");
        RunReport after = check(file);
        assertTrue(after.active().get(0).message().contains("weeks 1-3"), after.active().get(0).message());
        assertEquals(List.of(1, 2, 3), after.active().get(0).subject().weeks());
        assertStillHeld(baseline, after);
    }

    @Test
    void survivesAMovedFile() throws IOException, ConfigProblem {
        Baseline baseline = baselineOf("block.yaml", ORIGINAL);
        Files.delete(root.resolve("block.yaml"));
        Path moved = TempFiles.write(root, "spring/lower-block.yaml", ORIGINAL);
        assertStillHeld(baseline, check(moved));
    }

    @Test
    void aNewProgrammeAtTheOldPathInheritsNothingAndTheStaleEntriesAreReported() throws IOException,
            ConfigProblem {
        Baseline baseline = baselineOf("block.yaml", ORIGINAL);
        Path file = TempFiles.write(root, "block.yaml", ORIGINAL.replace("id: harbour-survival",
                "id: harbour-summer"));
        RunReport applied = baseline.apply(check(file));
        assertEquals(List.of("short-rest-compound", "short-rest-isolation", "unused-baseline-entry",
                        "unused-baseline-entry"),
                applied.active().stream().map(Finding::ruleId).sorted().toList());
        Finding stale = applied.active().stream().filter(f -> f.ruleId().equals("unused-baseline-entry"))
                .findFirst().orElseThrow();
        assertEquals(Severity.INFO, stale.severity());
        assertEquals(".mesolint-baseline.json", stale.file());
        assertTrue(stale.location().line() > 1, "located at the entry: " + stale.location());
        assertTrue(stale.message().contains("in harbour-survival at /weeks/written-week=1"), stale.message());
        assertTrue(applied.failed(), "the new programme's warnings count");
    }

    @Test
    void errorsAreRecordedOnlyWhenAsked() {
        Path file = TempFiles.write(root, "block.yaml", ORIGINAL.replace("dumbbell-curl", "harbour-rope-climb"));
        RunReport run = check(file);
        assertEquals(List.of(Severity.WARNING, Severity.ERROR), run.active().stream().map(Finding::severity).toList());
        Baseline.Recorded without = Baseline.record(run, false);
        assertEquals(1, without.errorsLeftOut());
        assertEquals(1, without.baseline().size());
        assertTrue(without.baseline().apply(run).failed(), "the unknown exercise still fails the run");
        Baseline.Recorded with = Baseline.record(run, true);
        assertEquals(0, with.errorsLeftOut());
        assertFalse(with.baseline().apply(run).failed());
    }

    @Test
    void aFileThatDidNotLoadIsNeverCovered() throws IOException, ConfigProblem {
        Path file = TempFiles.write(root, "block.yaml", ORIGINAL.replace("  goal: hypertrophy\n",
                "  goal: hypertrophy\n  colour: blue\n"));
        RunReport run = check(file);
        assertEquals(List.of("schema"), run.active().stream().map(Finding::ruleId).toList());
        Baseline.Recorded recorded = Baseline.record(run, true);
        assertEquals(0, recorded.baseline().size());
        assertEquals(1, recorded.unloadedLeftOut());
        // A hand-made entry for the schema finding does not cover it either.
        Path out = TempFiles.write(root, "hand.json", """
                {"format": 2, "findings": [{"rule": "schema", "programme": "file:block.yaml",
                  "anchor": "%s", "subject": ""}]}
                """.formatted(run.active().get(0).anchor().path()));
        RunReport applied = Baseline.read(out, "hand.json").apply(run);
        assertEquals(List.of("schema", "unused-baseline-entry"),
                applied.active().stream().map(Finding::ruleId).sorted().toList());
        assertTrue(applied.failed());
    }

    @Test
    void twoProgrammesWithOneIdAreALocatedError() {
        Path a = TempFiles.write(root, "a.yaml", ORIGINAL);
        Path b = TempFiles.write(root, "b.yaml", "# a copy\n" + ORIGINAL);
        RunReport run = DuplicateProgrammeIds.mark(check(a, b));
        List<Finding> shared = run.active().stream().filter(f -> f.ruleId().equals("duplicate-programme-id"))
                .toList();
        assertEquals(List.of("a.yaml:3:7", "b.yaml:4:7"), shared.stream()
                .map(f -> f.file() + ":" + f.location()).sorted().toList());
        assertEquals(Severity.ERROR, shared.get(0).severity());
        assertTrue(shared.get(0).message().contains("'harbour-survival' is also the id of"), shared.get(0).message());
    }
}
