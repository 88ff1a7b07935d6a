package dev.mesolint.core.baseline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.ProfileConfiguration;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.report.ConsoleReport;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.TempFiles;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BaselineTests {
    private final List<RuleDefinition> rules = BuiltInRules.all();

    @TempDir
    Path root;

    private static final String PROGRAMME = """
            format: 1
            programme:
              id: harbour-baseline
              level: intermediate
              goal: hypertrophy
            weeks:
              - week: 1
                sessions:
                  - day: 1
                    work:
                      - exercise: barbell-back-squat
                        sets: 4
                        reps: 8
                        rir: 2
                        rest: 75s
                      - exercise: dumbbell-curl
                        sets: 4
                        reps: 12
                        rir: 1
                        rest: 30s
                      - exercise: cable-crunch
                        sets: 4
                        reps: 12
                        rir: 2
                        rest: 60s
            """;

    private RunReport check(Path file) {
        return new Checker(new CheckRequest(List.of(file), root, Severity.WARNING, List.of(),
                ProfileConfiguration.builtIn(rules), YamlLimits.DEFAULTS), rules).run();
    }

    private Baseline roundTrip(RunReport run) throws IOException, ConfigProblem {
        Path file = root.resolve(".mesolint-baseline.json");
        Baseline.of(run).write(file);
        return Baseline.read(file, ".mesolint-baseline.json");
    }

    @Test
    void aBaselinedRunCountsNothingAndStillShowsTheFindings() throws IOException, ConfigProblem {
        Path file = TempFiles.write(root, "block.yaml", PROGRAMME);
        RunReport before = check(file);
        assertEquals(2, before.active().size());
        assertTrue(before.failed());

        Baseline baseline = roundTrip(before);
        assertEquals(2, baseline.size());
        RunReport after = baseline.apply(check(file));
        assertEquals(List.of(), after.active());
        assertFalse(after.failed());
        assertEquals(2, after.baselinedCount());

        StringWriter text = new StringWriter();
        new ConsoleReport(false).write(after, new PrintWriter(text));
        assertTrue(text.toString().contains("block.yaml:15:19: baselined warning short-rest-compound: "), text.toString());
        assertTrue(text.toString().contains("0 waived, 2 baselined"), text.toString());
        assertFalse(text.toString().contains("FAILED"), text.toString());
    }

    @Test
    void findingsStayMatchedWhenLinesAreInsertedAboveThem() throws IOException, ConfigProblem {
        Path file = TempFiles.write(root, "block.yaml", PROGRAMME);
        Baseline baseline = roundTrip(check(file));
        String moved = "# Harbourside Strength Club, spring block.\n# Reviewed by the coaching team.\n" + PROGRAMME
                .replace("  goal: hypertrophy\n", "  goal: hypertrophy\n  title: Spring block\n")
                .replace("            sets: 4\n            reps: 8\n", "            note: Film the second set.\n"
                        + "            sets: 4\n            reps: 8\n");
        Files.writeString(file, moved);
        RunReport after = check(file);
        List<Finding> findings = after.files().get(0).findings();
        assertEquals(List.of(19, 24), findings.stream().map(f -> f.location().line()).toList(),
                "both rests moved down");
        RunReport applied = baseline.apply(after);
        assertEquals(List.of(), applied.active());
        assertEquals(2, applied.baselinedCount());
    }

    @Test
    void aNewFindingIsNotMatchedAndFailsTheRun() throws IOException, ConfigProblem {
        Path file = TempFiles.write(root, "block.yaml", PROGRAMME);
        Baseline baseline = roundTrip(check(file));
        Files.writeString(file, PROGRAMME.replace("rest: 60s", "rest: 60s\n            tempo: 3-0-5-0"));
        RunReport applied = baseline.apply(check(file));
        assertEquals(List.of("slow-concentric"), applied.active().stream().map(Finding::ruleId).toList());
        assertEquals(2, applied.baselinedCount());
        assertFalse(applied.failed(), "slow-concentric is info, the fail level warning");
        // The crunches' rest cut to 20 s: short-rest-isolation on an exercise the baseline did not hold.
        Files.writeString(file, PROGRAMME.replace("rest: 60s", "rest: 20s"));
        RunReport changed = baseline.apply(check(file));
        assertEquals(List.of("short-rest-isolation"), changed.active().stream().map(Finding::ruleId).toList(),
                "a finding at a new place is new");
        assertEquals(2, changed.baselinedCount());
    }

    @Test
    void anEntryRecordsHowManyFindingsItHeldAndCoversEveryOneWithItsFingerprint() throws IOException,
            ConfigProblem {
        Path file = TempFiles.write(root, "block.yaml", PROGRAMME);
        RunReport run = check(file);
        Finding squat = run.active().stream().filter(f -> f.ruleId().equals("short-rest-compound")).findFirst()
                .orElseThrow();
        RunReport doubled = new RunReport(List.of(new dev.mesolint.core.engine.FileReport("block.yaml",
                run.files().get(0).programme(), "hypertrophy", List.of(squat, squat))), Severity.WARNING, List.of());
        Baseline two = roundTrip(doubled);
        assertEquals(1, two.entries().size());
        assertEquals(2, two.entries().get(0).count());
        // A third copy of an accepted written line (a deload week that reads differently) is the same problem.
        RunReport three = new RunReport(List.of(new dev.mesolint.core.engine.FileReport("block.yaml",
                run.files().get(0).programme(), "hypertrophy", List.of(squat, squat, squat))), Severity.WARNING,
                List.of());
        assertEquals(0, two.apply(three).active().size());
        assertEquals(3, two.apply(three).baselinedCount());
    }

    @Test
    void theFileIsSortedJsonWithoutLineNumbers() throws IOException {
        Path file = TempFiles.write(root, "block.yaml", PROGRAMME);
        Path out = root.resolve("b.json");
        Baseline.of(check(file)).write(out);
        String json = Files.readString(out);
        assertTrue(json.contains("\"programme\" : \"id:harbour-baseline\""), json);
        assertTrue(json.contains("\"anchor\" : \"/weeks/written-week=1/sessions/day=1/work/"
                + "exercise=barbell-back-squat/rest\""), json);
        assertFalse(json.contains("\"line\""), json);
        assertTrue(json.indexOf("exercise=barbell-back-squat/rest") < json.indexOf("exercise=dumbbell-curl/rest"),
                json);
    }

    @Test
    void aBrokenBaselineIsALocatedError() {
        Path file = TempFiles.write(root, "b.json", """
                {
                  "format": 2,
                  "findings": [
                    {"rule": "short-rest-compound", "programme": "id:a", "anchor": "/x", "subject": ""},
                    {"rule": "short-rest-compound", "programme": "id:a", "anchor": "/y", "subjet": ""}
                  ]
                }
                """);
        ConfigProblem p = assertThrows(ConfigProblem.class, () -> Baseline.read(file, "b.json"));
        assertEquals("b.json:5:74: unknown key 'subjet' in a baseline entry", p.describe().substring(0,
                p.describe().indexOf(" (fix")));
        Path syntax = TempFiles.write(root, "c.json", "{\"format\": 2,\n \"findings\": [\n");
        Path old = TempFiles.write(root, "d.json", "{\"format\": 1, \"findings\": []}");
        ConfigProblem format1 = assertThrows(ConfigProblem.class, () -> Baseline.read(old, "d.json"));
        assertTrue(format1.describe().startsWith("d.json:1:12: this is not a format 2 baseline"), format1.describe());
        ConfigProblem s = assertThrows(ConfigProblem.class, () -> Baseline.read(syntax, "c.json"));
        assertTrue(s.describe().startsWith("c.json:"), s.describe());
        ConfigProblem missing = assertThrows(ConfigProblem.class, () -> Baseline.read(root.resolve("none.json"),
                "none.json"));
        assertTrue(missing.describe().startsWith("none.json: no baseline file"), missing.describe());
    }
}
