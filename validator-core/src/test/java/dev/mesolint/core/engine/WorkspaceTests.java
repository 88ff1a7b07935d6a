package dev.mesolint.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.TempFiles;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WorkspaceTests {
    private final List<RuleDefinition> rules = BuiltInRules.all();

    @TempDir
    Path root;

    private static final String PROGRAMME = """
            format: 1
            programme:
              id: harbour-test
              level: intermediate
              goal: %s
            weeks:
              - week: 1
                sessions:
                  - day: 1
                    work:
                      - exercise: barbell-back-squat
                        sets: 4
                        reps: 5
                        rir: 2
                        rest: 2.5min
                      - exercise: stability-ball-dumbbell-press
                        sets: 4
                        reps: 10
                        rir: 2
                        rest: 2min
            """;

    private Workspace open(RunOptions options) throws ConfigProblem {
        return Workspace.open(options, rules);
    }

    private RunOptions options(Optional<String> profile, Optional<Severity> failOn) {
        return new RunOptions(root, Optional.empty(), profile, failOn, List.of(), Optional.empty());
    }

    private List<Finding> check(Workspace ws, Path file) {
        return new Checker(ws.request(List.of(file)), rules).run().active();
    }

    @Test
    void withoutConfigurationTheGoalPicksTheBuiltInProfile() throws ConfigProblem {
        Path strength = TempFiles.write(root, "a/strength.yaml", PROGRAMME.formatted("strength"));
        Path hypertrophy = TempFiles.write(root, "a/hypertrophy.yaml", PROGRAMME.formatted("hypertrophy"));
        Workspace ws = open(RunOptions.at(root));
        assertEquals("hypertrophy", ws.defaultProfile());
        assertEquals(Severity.ERROR, ws.failOn());
        // strength asks 3 min after squat sets: 2.5 min is short there, enough under hypertrophy
        assertEquals(List.of("short-rest-compound", "unstable-surface"),
                check(ws, strength).stream().map(Finding::ruleId).toList());
        assertEquals(List.of("unstable-surface"), check(ws, hypertrophy).stream().map(Finding::ruleId).toList());
    }

    @Test
    void theRepositoryConfigurationMapsFoldersAndGoalsToProfiles() throws ConfigProblem {
        TempFiles.write(root, ".mesolint.yaml", """
                profile: strength
                goals:
                  general-fitness: profiles/club-general.yaml
                folders:
                  - match: rehab/
                    profile: profiles/rehab.yaml
                  - {match: "squad/**/*.yaml", profile: general-fitness}
                catalogues: [catalogue/club.yaml]
                fail-on: warning
                baseline: reports/baseline.json
                """);
        TempFiles.write(root, "profiles/rehab.yaml", """
                profile: harbourside-rehab
                extends: general-fitness
                rules:
                  short-rest-compound: {severity: error, min-rest-squat-hinge: 4min}
                """);
        TempFiles.write(root, "profiles/club-general.yaml", "profile: club-general\nextends: general-fitness\n");
        TempFiles.write(root, "catalogue/club.yaml", """
                format: 1
                exercises:
                  - id: harbour-sled-push
                    name: Harbourside sled push
                    kind: compound
                    pattern: squat
                    stability: stable
                    skill: low
                    role: main
                    muscles: {quadriceps: 1, glutes: 0.5}
                    regions: [knee, hip, ankle]
                """);
        Workspace ws = open(RunOptions.at(root));
        RuleConfiguration c = ws.configuration();
        assertEquals("harbourside-rehab", c.profileFor("rehab/knee.yaml", null));
        assertEquals("general-fitness", c.profileFor("squad/2026/block.yaml", null));
        assertEquals("strength", c.profileFor("other/block.yaml", null), "the configured default");
        assertEquals("strength", ws.defaultProfile());
        assertEquals(Severity.WARNING, ws.failOn());
        assertEquals(Optional.of(root.resolve("reports/baseline.json")), ws.baselineFile());
        assertEquals(List.of(root.resolve("catalogue/club.yaml")), ws.request(List.of()).extraCatalogues());

        Path rehab = TempFiles.write(root, "rehab/knee.yaml", PROGRAMME.formatted("hypertrophy")
                .replace("barbell-back-squat", "harbour-sled-push"));
        List<Finding> found = check(ws, rehab);
        assertEquals(1, found.size(), found.toString());
        assertEquals(Severity.ERROR, found.get(0).severity());
        assertTrue(found.get(0).message().contains("the harbourside-rehab profile asks for at least 240 s"),
                found.get(0).message());

        Path general = TempFiles.write(root, "other/general.yaml", PROGRAMME.formatted("general-fitness"));
        FileReport report = new Checker(ws.request(List.of(general)), rules).run().files().get(0);
        assertEquals("club-general", report.profile(), "goals come before the default profile");
    }

    @Test
    void commandLineOptionsOverrideTheConfiguration() throws ConfigProblem {
        TempFiles.write(root, ".mesolint.yaml", "profile: strength\nfail-on: info\nbaseline: b.json\n"
                + "folders: [{match: rehab/, profile: general-fitness}]\n");
        Workspace ws = open(new RunOptions(root, Optional.empty(), Optional.of("hypertrophy"),
                Optional.of(Severity.ERROR), List.of(Path.of("extra.yaml")), Optional.of(Path.of("other.json"))));
        assertEquals("hypertrophy", ws.configuration().profileFor("rehab/knee.yaml", null));
        assertEquals("hypertrophy", ws.defaultProfile());
        assertEquals(Severity.ERROR, ws.failOn());
        assertEquals(Optional.of(Path.of("other.json")), ws.baselineFile());
    }

    @Test
    void theConfigurationSetsThePlateIncrementTheReportRoundsTo() throws ConfigProblem {
        TempFiles.write(root, ".mesolint.yaml", "plate-increment: 1.25kg\n");
        assertEquals(Optional.of(new dev.mesolint.core.value.Load.Absolute(1.25, dev.mesolint.core.value.LoadUnit.KG)),
                open(RunOptions.at(root)).config().plateIncrement());
        TempFiles.write(root, ".mesolint.yaml", "fail-on: info\n");
        assertEquals(Optional.empty(), open(RunOptions.at(root)).config().plateIncrement());
        ConfigProblem share = problem("plate-increment: 2.5%\n");
        assertTrue(share.describe().contains("plate-increment '2.5%' is not a weight"), share.describe());
        assertTrue(share.describe().contains("plate-increment: 2.5kg"), share.describe());
    }

    @Test
    void anExplicitConfigFileIsReadInsteadOfTheRootOne() throws ConfigProblem {
        TempFiles.write(root, ".mesolint.yaml", "fail-on: info\n");
        Path other = TempFiles.write(root, "ci/mesolint-ci.yaml", "fail-on: warning\n");
        Workspace ws = open(new RunOptions(root, Optional.of(other), Optional.empty(), Optional.empty(), List.of(),
                Optional.empty()));
        assertEquals(Severity.WARNING, ws.failOn());
        ConfigProblem missing = assertThrows(ConfigProblem.class, () -> open(new RunOptions(root,
                Optional.of(root.resolve("nope.yaml")), Optional.empty(), Optional.empty(), List.of(),
                Optional.empty())));
        // The core names the setting in the caller's words; without any, in neutral ones.
        assertTrue(missing.describe().startsWith("the config setting: no configuration file at"), missing.describe());
        ConfigProblem named = assertThrows(ConfigProblem.class, () -> open(new RunOptions(root,
                Optional.of(root.resolve("nope.yaml")), Optional.empty(), Optional.empty(), List.of(),
                Optional.empty()).namedAs(dev.mesolint.core.config.SettingNames.of(java.util.Map.of(
                        dev.mesolint.core.config.SettingNames.CONFIG, "config (mesolint.config)")))));
        assertTrue(named.describe().startsWith("config (mesolint.config): no configuration file at"),
                named.describe());
        assertTrue(named.hint().contains("leave config (mesolint.config) out"), named.hint());
    }

    private ConfigProblem problem(String config) {
        TempFiles.write(root, ".mesolint.yaml", config);
        return assertThrows(ConfigProblem.class, () -> open(options(Optional.empty(), Optional.empty())));
    }

    @Test
    void badConfigurationIsALocatedErrorWithAFix() {
        assertEquals(".mesolint.yaml:2:1: unknown key 'fail-level' in the repository configuration (fix: did you "
                + "mean 'fail-on'? known keys: profile, goals, folders, catalogues, fail-on, baseline, root, "
                + "plate-increment, rules-version)",
                problem("profile: strength\nfail-level: warning\n").describe());
        assertEquals(".mesolint.yaml:1:10: fail-on 'sometimes' is not a level (fix: one of: error, warning, info)",
                problem("fail-on: sometimes\n").describe());
        assertEquals(".mesolint.yaml:1:10: no profile named 'strenght' (fix: did you mean 'strength'? known "
                + "profiles: hypertrophy, strength, general-fitness; a team profile is named by the path of its "
                + "file)", problem("profile: strenght\n").describe());
        ConfigProblem folder = problem("folders:\n  - match: rehab/\n");
        assertEquals(2, folder.location().orElseThrow().line());
        assertTrue(folder.getMessage().contains("has no 'profile'"), folder.describe());
        ConfigProblem goal = problem("goals:\n  power: strength\n");
        assertTrue(goal.hint().contains("hypertrophy, strength, general-fitness"), goal.describe());
        ConfigProblem file = problem("folders: [{match: rehab/, profile: profiles/none.yaml}]\n");
        assertEquals(".mesolint.yaml:1:36: no profile file at profiles/none.yaml", file.describe().substring(0,
                file.describe().indexOf(" (fix")));
        ConfigProblem glob = problem("folders: [{match: \"rehab/[\", profile: strength}]\n");
        assertTrue(glob.getMessage().contains("not a valid folder or glob"), glob.describe());
    }
}
