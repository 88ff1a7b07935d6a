package dev.mesolint.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckMojoTests {
    @TempDir
    Path dir;

    private MojoFixture repository() throws IOException {
        return new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME)
                .programme("rehab/misspelt.yaml", MojoFixture.PROGRAMME.replace("barbell-bench", "barbel-bench")
                        .replace("id: harbour-test", "id: harbour-rehab"));
    }

    @Test
    void findingsAreAllLoggedThenTheBuildFailsOnceWithTheCounts() throws IOException {
        MojoFixture repo = repository();
        MojoFailureException failure = assertThrows(MojoFailureException.class, () -> repo.check().execute());

        assertEquals("mesolint: 1 error at or above the fail level 'error' in 1 of 2 files; fix them (see the "
                + "findings above) or waive each with a reason", failure.getMessage());
        List<String> lines = repo.log.lines;
        assertTrue(lines.contains("[ERROR] programmes/rehab/misspelt.yaml:15:23: error unknown-exercise: unknown "
                + "exercise 'barbel-bench-press'; closest ids: barbell-bench-press, dumbbell-bench-press, "
                + "barbell-push-press"), repo.log.text());
        assertTrue(lines.contains("[ERROR]     fix: exercise: barbell-bench-press, or add a local entry under "
                + "exercises:"), repo.log.text());
        assertEquals(1, lines.stream().filter(l -> l.startsWith("[INFO] mesolint: Note: ")).count());
    }

    @Test
    void aModuleInsideARepositoryReadsTheRootConfigurationAndShowsPathsFromTheRoot() throws IOException {
        // The Maven project is one folder of a git repository; the team's configuration sits at the top.
        Files.createDirectories(dir.resolve(".git"));
        Files.writeString(dir.resolve(".mesolint.yaml"), "fail-on: info\n");
        MojoFixture module = new MojoFixture(dir.resolve("coaching")).programme("light.yaml",
                MojoFixture.PROGRAMME.replace("sets: 4", "sets: 3"));

        MojoFailureException failure = assertThrows(MojoFailureException.class, () -> module.check().execute());

        assertTrue(failure.getMessage().contains("at or above the fail level 'info'"), failure.getMessage());
        assertTrue(module.log.lines.stream().anyMatch(l -> l.startsWith("[INFO] coaching/programmes/light.yaml:10:5: info weekly-volume-min")),
                module.log.text());
    }

    @Test
    void failOnNoneLogsEveryFindingAndNeverFailsTheBuild() throws Exception {
        MojoFixture repo = repository();
        CheckMojo mojo = repo.check();
        mojo.failOn = "none";

        mojo.execute();

        assertTrue(repo.log.lines.stream().anyMatch(l -> l.contains("programmes/rehab/misspelt.yaml:15:23: error "
                + "unknown-exercise")), repo.log.text());
        assertTrue(repo.log.lines.contains("[INFO] mesolint: failOn is none: findings are reported, never a build "
                + "failure"), repo.log.text());
    }

    @Test
    void includesAndExcludesChooseTheFilesBelowTheProgrammesFolder() throws Exception {
        MojoFixture repo = repository().programme("drafts/idea.yaml", MojoFixture.PROGRAMME.replace("barbell-bench",
                "barbel-bench"));
        CheckMojo onlyGood = repo.check();
        onlyGood.excludes = List.of("rehab/**", "drafts/**");
        onlyGood.execute();
        assertTrue(repo.log.text().contains("mesolint: 1 file checked: 0 errors"), repo.log.text());

        CheckMojo drafts = repo.check();
        drafts.includes = List.of("drafts/*.yaml");
        MojoFailureException failure = assertThrows(MojoFailureException.class, drafts::execute);
        assertTrue(failure.getMessage().contains("in 1 of 1 files"), failure.getMessage());
    }

    @Test
    void whereEachSettingCameFromIsLoggedAtDebug() throws Exception {
        MojoFixture repo = new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME);
        CheckMojo mojo = repo.check();
        mojo.failOn = "warning";
        mojo.execute();
        String log = repo.log.text();
        assertTrue(log.contains("[DEBUG] mesolint: failOn = warning (plugin parameter failOn)"), log);
        assertTrue(log.contains("[DEBUG] mesolint: profile = named after each programme's goal (built-in default)"),
                log);
        assertTrue(log.contains("[INFO] mesolint: 1 file checked: 0 errors, 0 warnings, 0 info, 0 waived"), log);
    }

    @Test
    void parametersOverrideTheConfigurationFileWhichOverridesTheDefaults() throws Exception {
        // Three sets of bench press a week: an info finding (weekly-volume-min) under the hypertrophy profile.
        MojoFixture repo = new MojoFixture(dir).programme("light.yaml", MojoFixture.PROGRAMME.replace("sets: 4",
                "sets: 3"));
        Files.writeString(dir.resolve(".mesolint.yaml"), "fail-on: info\n");

        MojoFailureException failure = assertThrows(MojoFailureException.class, () -> repo.check().execute());
        assertTrue(failure.getMessage().contains("at or above the fail level 'info'"), failure.getMessage());
        assertTrue(repo.log.lines.contains("[DEBUG] mesolint: failOn = info (.mesolint.yaml)"), repo.log.text());

        CheckMojo overridden = repo.check();
        overridden.failOn = "error";
        overridden.execute();
        assertTrue(repo.log.lines.contains("[DEBUG] mesolint: failOn = error (plugin parameter failOn)"));
        assertTrue(repo.log.lines.contains("[DEBUG] mesolint: config = .mesolint.yaml (the nearest .mesolint.yaml above the checked paths)"),
                repo.log.text());
    }

    @Test
    void aBrokenConfigurationFileIsAnExecutionErrorLocatedAtTheKey() throws IOException {
        MojoFixture repo = repository();
        Files.writeString(dir.resolve(".mesolint.yaml"), "fail-on: fatal\n");
        MojoExecutionException error = assertThrows(MojoExecutionException.class, () -> repo.check().execute());
        assertTrue(error.getMessage().startsWith("mesolint: .mesolint.yaml:1:10: fail-on 'fatal' is not a level"),
                error.getMessage());
    }

    @Test
    void aBadParameterValueIsAnExecutionErrorNamingTheParameter() throws IOException {
        MojoFixture repo = repository();
        CheckMojo mojo = repo.check();
        mojo.failOn = "fatal";
        MojoExecutionException error = assertThrows(MojoExecutionException.class, mojo::execute);
        assertEquals("mesolint: failOn (mesolint.failOn): must be error, warning, info or none, not 'fatal'",
                error.getMessage());

        CheckMojo unknownProfile = repo.check();
        unknownProfile.profile = "powerbuilding";
        assertTrue(assertThrows(MojoExecutionException.class, unknownProfile::execute).getMessage()
                .startsWith("mesolint: profile (mesolint.profile): no profile named 'powerbuilding'"));
    }

    @Test
    void aMissingProgrammesFolderIsAnExecutionErrorNamingTheParameter() {
        CheckMojo mojo = new MojoFixture(dir).check();
        MojoExecutionException error = assertThrows(MojoExecutionException.class, mojo::execute);
        assertTrue(error.getMessage().startsWith("mesolint: programmes (mesolint.programmes): no such folder"),
                error.getMessage());
    }

    @Test
    void aFailingCheckStillWritesTheReportsAskedFor() throws IOException {
        MojoFixture repo = repository();
        CheckMojo mojo = repo.check();
        mojo.reports = List.of("sarif", "junit");
        assertThrows(MojoFailureException.class, mojo::execute);
        String sarif = Files.readString(dir.resolve("target/mesolint/mesolint.sarif"));
        assertTrue(sarif.contains("barbel-bench-press"), sarif);
        assertTrue(Files.readString(dir.resolve("target/mesolint/TEST-mesolint.xml")).contains("<failure"));

        CheckMojo again = repo.check();
        again.reports = List.of("sarif");
        assertThrows(MojoFailureException.class, again::execute);
        assertTrue(repo.log.lines.contains("[INFO] mesolint: 2 programmes unchanged, results reused from cache"),
                "findings-only reports keep the cache: " + repo.log.text());
    }

    @Test
    void constraintReasonsStayOutOfSarifAndJsonUnlessIncludeReasons() throws Exception {
        String reason = "Harbourside clinic note P-5120";
        MojoFixture repo = new MojoFixture(dir).programme("avoid.yaml", MojoFixture.PROGRAMME.replace(
                "session-minutes: 60\n", "session-minutes: 60\nathlete:\n  constraints:\n"
                        + "    - avoid: [barbell-bench-press]\n      reason: " + reason + "\n"));
        Path sarif = dir.resolve("target/mesolint/mesolint.sarif");
        // First checked afresh, then from the cache (which keeps no programme): the reason is left out both times.
        for (int run = 0; run < 2; run++) {
            CheckMojo mojo = repo.check();
            mojo.reports = List.of("sarif");
            assertThrows(MojoFailureException.class, mojo::execute);
            String text = Files.readString(sarif);
            assertTrue(text.contains("constraint-avoid") && text.contains("(reason left out)"), text);
            assertFalse(text.contains(reason), text);
        }
        assertTrue(repo.log.lines.contains("[INFO] mesolint: 1 programme unchanged, results reused from cache"),
                repo.log.text());
        assertTrue(repo.log.text().contains(reason), "the build log, read by the coach, keeps the reason");

        CheckMojo kept = repo.check();
        kept.reports = List.of("sarif", "json");
        kept.includeReasons = true;
        assertThrows(MojoFailureException.class, kept::execute);
        assertTrue(Files.readString(sarif).contains(reason));
        assertTrue(Files.readString(dir.resolve("target/mesolint/mesolint.json")).contains(reason));
    }

    @Test
    void anOlderRulesVersionInTheConfigurationIsLoggedAsAWarningWithTheChangesAndFailsNothing() throws Exception {
        Files.writeString(dir.resolve(".mesolint.yaml"), "root: true\nrules-version: 2026.12.0\n");
        MojoFixture repo = new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME);

        repo.check().execute();

        List<String> notice = repo.log.lines.stream().filter(l -> l.startsWith("[WARNING] mesolint: ")).toList();
        assertTrue(notice.get(0).startsWith("[WARNING] mesolint: .mesolint.yaml records rules-version 2026.12.0; "
                + "this mesolint applies rule set " + dev.mesolint.core.Mesolint.RULE_SET_VERSION), repo.log.text());
        assertTrue(notice.stream().anyMatch(l -> l.contains(": volume-spike: ")), repo.log.text());
        assertEquals(1, repo.log.lines.stream().filter(l -> l.contains("records rules-version")).count());

        Files.writeString(dir.resolve(".mesolint.yaml"), "root: true\nrules-version: "
                + dev.mesolint.core.Mesolint.RULE_SET_VERSION + "\n");
        MojoFixture current = new MojoFixture(dir);
        current.check().execute();
        assertTrue(current.log.lines.stream().noneMatch(l -> l.contains("rules-version")), current.log.text());
    }

    @Test
    void aConfiguredPathOutsideTheRootIsRefusedInThePluginsWords() throws Exception {
        Files.writeString(dir.resolve("outside.yaml"), "format: 1\nexercises: []\n");
        Path repo = Files.createDirectories(dir.resolve("repo"));
        Files.writeString(repo.resolve(".mesolint.yaml"), "root: true\ncatalogues: [../outside.yaml]\n");
        MojoFixture fixture = new MojoFixture(repo).programme("good.yaml", MojoFixture.PROGRAMME);

        MojoExecutionException e = assertThrows(MojoExecutionException.class, () -> fixture.check().execute());

        assertTrue(e.getMessage().startsWith("mesolint: .mesolint.yaml:2:14: this path is refused"), e.getMessage());
        assertTrue(e.getMessage().contains("(fix: keep the file inside the repository)"), e.getMessage());
        assertTrue(!e.getMessage().contains("--") && !e.getMessage().contains("allowOutsideRoot"),
                "no option the plugin does not have: " + e.getMessage());
    }

    @Test
    void aRunThatFindsNoProgrammeFailsTheBuildAndSaysWhy() throws Exception {
        Files.createDirectories(dir.resolve("programmes/empty-block"));
        Files.writeString(dir.resolve("programmes/notes.txt"), "not a programme\n");
        CheckMojo mojo = new MojoFixture(dir).check();
        MojoExecutionException error = assertThrows(MojoExecutionException.class, mojo::execute);
        assertEquals("mesolint: no programme file (*.yaml, *.yml) found in programmes: nothing was checked; check "
                + "programmes (mesolint.programmes), includes and excludes, or set allowEmpty (mesolint.allowEmpty) "
                + "when that is expected", error.getMessage());
    }

    @Test
    void excludesThatLeaveNothingFailTheBuildToo() throws Exception {
        MojoFixture repo = repository();
        CheckMojo mojo = repo.check();
        mojo.excludes = List.of("**");
        MojoExecutionException error = assertThrows(MojoExecutionException.class, mojo::execute);
        assertTrue(error.getMessage().startsWith("mesolint: no programme file (*.yaml, *.yml) found in programmes "
                + "outside excludes [**]: nothing was checked"), error.getMessage());
    }

    @Test
    void allowEmptyLetsAnEmptyRunPassAndSaysSo() throws Exception {
        Files.createDirectories(dir.resolve("programmes"));
        MojoFixture repo = new MojoFixture(dir);
        CheckMojo mojo = repo.check();
        mojo.allowEmpty = true;
        mojo.execute();
        assertTrue(repo.log.lines.contains("[INFO] mesolint: no programme file (*.yaml, *.yml) found in programmes: "
                + "nothing was checked (allowEmpty)"), repo.log.text());
    }

    @Test
    void allowEmptyChangesNothingWhenThereAreProgrammes() throws Exception {
        MojoFixture repo = repository();
        CheckMojo mojo = repo.check();
        mojo.allowEmpty = true;
        assertThrows(MojoFailureException.class, mojo::execute, "the misspelt exercise still fails the build");
        assertTrue(repo.log.lines.stream().noneMatch(l -> l.contains("nothing was checked")), repo.log.text());
    }

    @Test
    void skipDoesNothing() throws Exception {
        MojoFixture repo = repository();
        CheckMojo mojo = repo.check();
        mojo.skip = true;
        mojo.execute();
        assertEquals(List.of("[INFO] mesolint: skipped (mesolint.skip)"), repo.log.lines);
    }
}
