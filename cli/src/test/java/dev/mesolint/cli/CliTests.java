package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CliTests {
    @TempDir
    Path root;

    private record Run(int exit, String out, String err) {
    }

    private Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = MesolintCommand.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(exit, out.toString(), err.toString());
    }

    private static final String PROGRAMME = """
            format: 1
            programme:
              id: harbour-cli
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
                        rest: 90s
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

    private Path write(String name, String text) throws IOException {
        Path file = root.resolve(name);
        Files.createDirectories(file.getParent());
        Files.writeString(file, text);
        return file;
    }

    private String rootArg() {
        return root.toString();
    }

    @Test
    void checkReadsTheRepositoryConfigurationAndOptionsOverrideIt() throws IOException {
        write("programmes/block.yaml", PROGRAMME);
        Run plain = run("check", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(0, plain.exit(), plain.out() + plain.err());
        assertTrue(plain.out().contains("programmes/block.yaml:15:19: warning short-rest-compound: "), plain.out());

        write(".mesolint.yaml", "fail-on: warning\n");
        assertEquals(1, run("check", "--root", rootArg(), root.resolve("programmes").toString()).exit());
        assertEquals(0, run("check", "--root", rootArg(), "--fail-on", "error",
                root.resolve("programmes").toString()).exit(), "the option wins over the file");
        Run strict = run("check", "--root", rootArg(), "--fail-on", "info", "--profile", "general-fitness",
                root.resolve("programmes").toString());
        assertEquals(1, strict.exit());
        assertTrue(strict.out().contains("the general-fitness profile asks"), strict.out());
    }

    @Test
    void aBrokenConfigurationIsOneLocatedLineAndExitTwo() throws IOException {
        write("programmes/block.yaml", PROGRAMME);
        write(".mesolint.yaml", "profile: strength\nfail-level: warning\n");
        Run r = run("check", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(2, r.exit());
        assertEquals("mesolint: .mesolint.yaml:2:1: unknown key 'fail-level' in the repository configuration (fix: "
                + "did you mean 'fail-on'? known keys: profile, goals, folders, catalogues, fail-on, baseline, root, "
                + "plate-increment, rules-version)\n",
                r.err());
        assertFalse(r.err().contains("Exception"), r.err());

        Path repo = Files.createDirectories(root.resolve("repo"));
        Files.writeString(repo.resolve(".mesolint.yaml"), "root: true\ncatalogues: [../programmes/block.yaml]\n");
        Run outside = run("check", repo.toString());
        assertEquals(2, outside.exit(), outside.out());
        assertTrue(outside.err().contains("(fix: keep the file inside the repository, or pass --allow-outside-root "
                + "when that is intended)"), "the hint names the option: " + outside.err());

        write("club.yaml", "profile: club\nrules:\n  short-rest-compound: {min-rest: 2 hours}\n");
        Run p = run("check", "--root", rootArg(), "--config", root.resolve("none.yaml").toString(), "x");
        assertEquals(2, p.exit());
        assertTrue(p.err().startsWith("mesolint: --config: no configuration file at"), p.err());
        Files.delete(root.resolve(".mesolint.yaml"));
        Run bad = run("check", "--root", rootArg(), "--profile", root.resolve("club.yaml").toString(),
                root.resolve("programmes").toString());
        assertEquals(2, bad.exit());
        assertTrue(bad.err().contains("club.yaml:3:35: short-rest-compound min-rest: '2 hours' is not a duration"),
                bad.err());
    }

    @Test
    void aBaselineLeavesErrorsOutUnlessAskedAndTheCheckSaysWhatItHolds() throws IOException {
        // The curls renamed to an id the catalogue lacks: an unknown-exercise error beside the squat's short rest.
        write("programmes/block.yaml", PROGRAMME.replace("dumbbell-curl", "harbour-rope-curl"));
        write(".mesolint.yaml", "baseline: .mesolint-baseline.json\n");
        Run without = run("baseline", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(0, without.exit(), without.err());
        assertTrue(without.out().contains("Wrote 1 finding from 1 file"), without.out());
        assertTrue(without.out().contains("Left out 1 error: they keep failing 'mesolint check'"), without.out());
        Run failing = run("check", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(1, failing.exit(), failing.out());
        assertTrue(failing.out().contains("1 error, 0 warnings, 0 info, 0 waived, 1 baselined (1 warning)"),
                failing.out());

        Run with = run("baseline", "--include-errors", "--root", rootArg(), root.resolve("programmes").toString());
        assertTrue(with.out().startsWith("Wrote 2 findings from 1 file"), with.out());
        assertFalse(with.out().contains("Left out"), with.out());
        Run passing = run("check", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(0, passing.exit(), passing.out());
        assertTrue(passing.out().contains("0 errors, 0 warnings, 0 info, 0 waived, 2 baselined (1 error, 1 warning)"),
                passing.out());

        // A renamed session keeps the baseline green; fixing everything leaves '0 baselined' and stale entries.
        write("programmes/block.yaml", PROGRAMME.replace("  - day: 1\n", "  - day: 1\n        name: Pull (renamed)\n")
                .replace("dumbbell-curl", "harbour-rope-curl"));
        assertEquals(0, run("check", "--root", rootArg(), root.resolve("programmes").toString()).exit());
        write("programmes/block.yaml", PROGRAMME.replace("rest: 90s", "rest: 2min").replace("rest: 30s",
                "rest: 1min"));
        Run fixed = run("check", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(0, fixed.exit(), fixed.out());
        assertTrue(fixed.out().contains("info unused-baseline-entry: baseline entry unknown-exercise in harbour-cli"),
                fixed.out());
        assertTrue(fixed.out().contains("0 waived, 0 baselined"), fixed.out());
    }

    @Test
    void anOlderRulesVersionIsNamedOnceWithItsChangesAndTheBaselineRecordedUnderItKeepsMatching()
            throws IOException {
        write("programmes/block.yaml", PROGRAMME);
        write(".mesolint.yaml", "baseline: .mesolint-baseline.json\nrules-version: 2026.12.0\n");
        Run recorded = run("baseline", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(0, recorded.exit(), recorded.err());
        assertTrue(recorded.out().startsWith("Wrote 2 findings"), recorded.out());

        Run older = run("check", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(0, older.exit(), older.out() + older.err());
        assertTrue(older.out().contains("0 waived, 2 baselined (1 warning, 1 info)"), older.out());
        assertTrue(older.err().startsWith("mesolint: .mesolint.yaml records rules-version 2026.12.0; this mesolint "
                + "applies rule set " + Mesolint.RULE_SET_VERSION), older.err());
        // Every version after the recorded one is named with its entries: the first and the one applied.
        assertTrue(older.err().contains("  2026.12.1: far-from-failure, effort-conflict: "),
                "the changelog's entries, plainly: " + older.err());
        assertTrue(older.err().contains("  " + Mesolint.RULE_SET_VERSION + ": "), older.err());
        assertEquals(1, older.err().split("records rules-version", -1).length - 1, "said once: " + older.err());
        assertFalse(older.out().contains("records rules-version"), "standard output keeps the report alone");

        // Brought up to date: no notice, and the same findings baselined.
        write(".mesolint.yaml", "baseline: .mesolint-baseline.json\nrules-version: " + Mesolint.RULE_SET_VERSION
                + "\n");
        Run current = run("check", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(0, current.exit(), current.out());
        assertTrue(current.out().contains("0 waived, 2 baselined (1 warning, 1 info)"), current.out());
        assertFalse(current.err().contains("rules-version"), current.err());
        assertFalse(run("check", "--quiet", "--root", rootArg(), root.resolve("programmes").toString()).err()
                .contains("rules-version"), "quiet prints only what fails");
    }

    @Test
    void reportsCarryTheTrainingFiguresWithABaselineConfigured() throws IOException {
        write("programmes/block.yaml", PROGRAMME);
        write(".mesolint.yaml", "baseline: .mesolint-baseline.json\n");
        assertEquals(0, run("baseline", "--root", rootArg(), root.resolve("programmes").toString()).exit());
        Path json = root.resolve("out/check.json");
        Path html = root.resolve("out/check.html");
        Run r = run("check", "--root", rootArg(), "--report", "json=" + json, "--report", "html=" + html,
                root.resolve("programmes").toString());
        assertEquals(0, r.exit(), r.out() + r.err());
        assertTrue(r.out().contains("2 baselined"), r.out());
        String jsonText = Files.readString(json);
        assertTrue(jsonText.contains("\"metrics\""), "the JSON report keeps its figures: " + jsonText);
        assertTrue(jsonText.contains("\"baselined\" : 2") || jsonText.contains("\"baselined\":2"), jsonText);
        String page = Files.readString(html);
        assertFalse(page.contains("Training figures were not computed"), "the HTML report keeps its figures");
        assertTrue(page.contains("<svg"), "with its charts");
    }

    @Test
    void aBaselineHoldsTodaysFindingsSoOnlyNewOnesFail() throws IOException {
        Path block = write("programmes/block.yaml", PROGRAMME);
        write(".mesolint.yaml", "fail-on: info\nbaseline: .mesolint-baseline.json\n");
        Run missing = run("check", "--root", rootArg(), block.toString());
        assertEquals(2, missing.exit(), "a configured baseline must exist");
        assertTrue(missing.err().contains(".mesolint-baseline.json: no baseline file"), missing.err());

        Run written = run("baseline", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(0, written.exit(), written.err());
        assertEquals("Wrote 2 findings from 1 file to .mesolint-baseline.json\n", written.out());

        Run clean = run("check", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(0, clean.exit(), clean.out());
        assertTrue(clean.out().contains("baselined warning short-rest-compound"), clean.out());
        assertTrue(clean.out().contains("0 errors, 0 warnings, 0 info, 0 waived, 2 baselined (1 warning, 1 info)"),
                clean.out());

        Files.writeString(block, "# moved down by a comment\n" + PROGRAMME.replace("rest: 60s",
                "rest: 60s\n            tempo: 2-0-4-0"));
        Run next = run("check", "--root", rootArg(), root.resolve("programmes").toString());
        assertEquals(1, next.exit());
        assertTrue(next.out().contains("info slow-concentric"), next.out());
        assertTrue(next.out().contains("0 errors, 0 warnings, 1 info, 0 waived, 2 baselined"), next.out());
        assertEquals(0, run("check", "--root", rootArg(), "--no-baseline", root.resolve("programmes").toString())
                .out().lines().filter(l -> l.contains("baselined")).count(), "nothing is baselined");

        Run other = run("baseline", "--root", rootArg(), "--output", root.resolve("ci/b.json").toString(),
                block.toString());
        assertEquals(0, other.exit());
        assertTrue(Files.exists(root.resolve("ci/b.json")));
    }

    @Test
    void rulesListsSeveritiesInTheChosenProfile() {
        Run r = run("rules", "--root", rootArg(), "--profile", "general-fitness");
        assertEquals(0, r.exit(), r.err());
        assertTrue(r.out().startsWith("Rules in the general-fitness profile (extends hypertrophy):"), r.out());
        assertTrue(r.out().contains("\nunstable-surface       off      Exercises on an unstable surface"), r.out());
        assertTrue(r.out().contains("\nfatigue-technique      info     "), r.out());
        assertTrue(r.out().contains(Mesolint.CAUTION), r.out());
        Run d = run("rules", "--root", rootArg());
        assertTrue(d.out().contains("\nunstable-surface       warning  "), d.out());
    }

    @Test
    void rulesAndExplainShowATeamProfilesThresholds() throws IOException {
        write("club.yaml", "profile: club\nextends: strength\nrules:\n  short-rest-compound: {min-rest: 150s}\n");
        Run rules = run("rules", "--root", rootArg(), "--profile", root.resolve("club.yaml").toString());
        assertEquals(0, rules.exit(), rules.err());
        // the strength profile's 3 min after squat and hinge sets: ACSM 2009, 3-5 min for heavy core lifts
        assertTrue(rules.out().contains("in this profile: min-rest 2.5min (default 2min), min-rest-squat-hinge 3min "
                + "(default 2min)"), rules.out());
        Run explain = run("explain", "--root", rootArg(), "--profile", root.resolve("club.yaml").toString(),
                "short-rest-compound");
        assertEquals(0, explain.exit(), explain.err());
        assertTrue(explain.out().startsWith("In the club profile: warning; min-rest 2.5min (default 2min), "
                + "min-rest-squat-hinge 3min (default 2min)"), explain.out());
    }

    @Test
    void summariesReadTheProfilesThresholdsNotTheDefaults() throws IOException {
        write("club.yaml", "profile: club\nextends: hypertrophy\nrules:\n  no-deload: {max-weeks: 5}\n"
                + "  short-rest-isolation: {min-rest: 90s}\n");
        String club = root.resolve("club.yaml").toString();
        Run rules = run("rules", "--root", rootArg(), "--profile", club);
        assertEquals(0, rules.exit(), rules.err());
        // the default of 6 weeks without a deload: common practice (a lighter week every 4-8 weeks)
        assertTrue(rules.out().contains("\nno-deload              info     More than 5 weeks in a row without a "
                + "deload week"), rules.out());
        assertFalse(rules.out().contains("More than 6 weeks"), rules.out());
        assertTrue(rules.out().contains("follows is at least 90 s."), rules.out());

        Run explain = run("explain", "--root", rootArg(), "--profile", club, "no-deload");
        assertEquals(0, explain.exit(), explain.err());
        assertTrue(explain.out().contains("\nMore than 5 weeks in a row without a deload week"), explain.out());
        assertFalse(explain.out().contains("More than 6 weeks"), explain.out());
        assertTrue(explain.out().contains("(see docs/profiles.md)"), "links as paths: " + explain.out());
        Run plain = run("explain", "--root", rootArg(), "no-deload");
        assertTrue(plain.out().contains("\nMore than 6 weeks in a row"), "the default without a profile");
    }

    @Test
    void aTeamProfilesModelParametersChangeTheFiguresAndABadOneIsLocated() throws IOException {
        // Four curls at RIR 4: no hard sets at the model's default of RIR 3 or closer (common practice,
        // docs/model.md "Hard sets"); four once the club's profile counts RIR 4.
        write("programmes/block.yaml", PROGRAMME.replace("rir: 1", "rir: 4"));
        write("club.yaml", "profile: club\nextends: hypertrophy\nmodel:\n  hardSetMaxRir: 4\n");
        String club = root.resolve("club.yaml").toString();
        Path plain = root.resolve("out/plain.json");
        Path withClub = root.resolve("out/club.json");
        assertEquals(0, run("metrics", "--root", rootArg(), "--json", plain.toString(),
                root.resolve("programmes").toString()).exit());
        Run metrics = run("metrics", "--root", rootArg(), "--profile", club, "--json", withClub.toString(),
                root.resolve("programmes").toString());
        assertEquals(0, metrics.exit(), metrics.err());
        tools.jackson.databind.JsonNode before = json(plain);
        tools.jackson.databind.JsonNode after = json(withClub);
        assertEquals(3, before.at("/programmes/0/parameters/hardSetMaxRir").asDouble(), 1e-9);
        assertEquals(4, after.at("/programmes/0/parameters/hardSetMaxRir").asDouble(), 1e-9);
        assertEquals(before.at("/programmes/0/weeks/0/muscles/biceps/hardSets").asDouble() + 4,
                after.at("/programmes/0/weeks/0/muscles/biceps/hardSets").asDouble(), 1e-9,
                "the four curls count as hard sets for the biceps, their prime mover: " + after);
        Run rules = run("rules", "--root", rootArg(), "--profile", club);
        assertTrue(rules.out().contains("Training-model parameters in this profile (docs/model.md): hardSetMaxRir 4 "
                + "(default 3)"), rules.out());

        write("club.yaml", "profile: club\nextends: hypertrophy\nmodel:\n  hardSetMaxRir: 9\n");
        Run bad = run("check", "--root", rootArg(), "--profile", club, root.resolve("programmes").toString());
        assertEquals(2, bad.exit(), bad.out());
        assertTrue(bad.err().contains("club.yaml:4:18: model hardSetMaxRir 9 is outside 0..5 (fix: choose a value "
                + "from 0 to 5"), bad.err());
        assertFalse(bad.err().contains("Exception"), bad.err());
    }

    private static tools.jackson.databind.JsonNode json(Path file) throws IOException {
        return tools.jackson.databind.json.JsonMapper.builder().build().readTree(Files.readString(file));
    }

    @Test
    void explainPrintsTheReferencePage() {
        Run r = run("explain", "--root", rootArg(), "short-rest-compound");
        assertEquals(0, r.exit(), r.err());
        // 2 min after compound sets: ACSM 2009 position stand (Ratamess et al.), the hypertrophy profile's default
        assertTrue(r.out().startsWith("In the hypertrophy profile: warning; min-rest 2min, min-rest-squat-hinge 2min"),
                r.out());
        assertTrue(r.out().contains("\n\nshort-rest-compound\n===================\n"), r.out());
        assertFalse(r.out().contains("<!--"), "no note for contributors in a terminal");
        for (String markup : new String[] {"```", "|---", "](", "`", "## ", "**"}) {
            assertFalse(r.out().contains(markup), "plain terminal text, no " + markup + ": " + r.out());
        }
        // the strength profile's 3 min after main squat and hinge lifts: ACSM 2009, 3-5 min for heavy core lifts
        assertTrue(r.out().lines().anyMatch(l -> l.matches("\\s+strength\\s+warning\\s+2min\\s+3min\\s+1min")),
                "the by-profile table as aligned columns: " + r.out());
        assertTrue(r.out().contains("\n    format: 1\n"), "examples indented: " + r.out());
        assertTrue(r.out().contains(Mesolint.CAUTION), r.out());
        Run unknown = run("explain", "short-rest");
        assertEquals(2, unknown.exit());
        assertTrue(unknown.err().contains("no rule 'short-rest'; did you mean"), unknown.err());
    }

    @Test
    void helpStatesThePrecedenceAndTheCaution() {
        for (String command : new String[] {"check", "baseline", "rules"}) {
            Run r = run(command, "--help");
            String flat = r.out().replaceAll("\\s+", " ");
            assertTrue(flat.contains("first match wins: command-line options, then the repository configuration"),
                    command + ": " + r.out());
            assertTrue(flat.contains("not a medical assessment"), command);
        }
        String top = run("--help").out();
        for (String command : new String[] {"check", "baseline", "rules", "explain"}) {
            assertTrue(top.contains("  " + command + " "), top);
        }
    }
}
