package dev.mesolint.core.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.config.ProfileRef;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.TempFiles;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ProfileTests {
    private final List<RuleDefinition> rules = BuiltInRules.all();

    @TempDir
    Path dir;

    private RuleDefinition rule(String id) {
        return rules.stream().filter(r -> r.id().equals(id)).findFirst().orElseThrow();
    }

    private ProfileSet load(String... files) throws ConfigProblem {
        return ProfileSet.load(java.util.Arrays.stream(files)
                .map(f -> ProfileRef.of(f, dir, "test", null)).toList(), rules);
    }

    @Test
    void everyBuiltInProfileLoadsAndNamesOnlyKnownRulesAndParameters() throws IOException, ConfigProblem {
        ProfileReader reader = new ProfileReader(rules);
        for (String name : BuiltInProfiles.NAMES) {
            try (InputStream in = getClass().getResourceAsStream(BuiltInProfiles.resource(name))) {
                // read() refuses unknown rules, parameters and values with a located problem
                Profile p = reader.read(ConfigDocument.read(in.readAllBytes(), name), dir);
                assertEquals(name, p.name());
                assertTrue(!p.description().isBlank(), name + " has a description");
            }
        }
        assertEquals(List.of("hypertrophy", "strength", "general-fitness"), ProfileSet.builtIn(rules).names());
    }

    /** Rules that only another built-in profile turns on: hypertrophy has them off, with the default parameters. */
    private static final java.util.Set<String> ON_ONLY_UNDER_ANOTHER_PROFILE = java.util.Set.of("zone-reps");

    @Test
    void hypertrophyIsTheMetadataDefaults() {
        ResolvedProfile hypertrophy = ProfileSet.builtIn(rules).get(BuiltInProfiles.DEFAULT);
        for (RuleDefinition r : rules) {
            RuleSettings expected = RuleSettings.defaults(r.metadata());
            if (ON_ONLY_UNDER_ANOTHER_PROFILE.contains(r.id())) {
                expected = expected.with(Severity.OFF);
            }
            assertEquals(expected, hypertrophy.settings(r), r.id());
        }
    }

    @Test
    void builtInProfilesListOnlyWhatDiffersFromTheirParent() throws IOException, ConfigProblem {
        ProfileReader reader = new ProfileReader(rules);
        ProfileSet set = ProfileSet.builtIn(rules);
        for (String name : BuiltInProfiles.NAMES) {
            Profile p;
            try (InputStream in = getClass().getResourceAsStream(BuiltInProfiles.resource(name))) {
                p = reader.read(ConfigDocument.read(in.readAllBytes(), name), dir);
            }
            ResolvedProfile self = set.get(name);
            ResolvedProfile parent = p.parent().map(ref -> set.get(ref.text())).orElse(null);
            for (Map.Entry<String, RuleOverride> e : p.rules().entrySet()) {
                RuleDefinition r = rule(e.getKey());
                RuleSettings inherited = parent == null ? RuleSettings.defaults(r.metadata()) : parent.settings(r);
                e.getValue().severity().ifPresent(s -> assertNotEquals(inherited.severity(), s,
                        name + " repeats the severity of " + r.id()));
                e.getValue().values().forEach((k, v) -> assertNotEquals(inherited.value(k), v,
                        name + " repeats " + r.id() + " " + k));
                assertNotEquals(inherited, self.settings(r));
            }
        }
    }

    @Test
    void strengthAsksForThreeMinutesAfterSquatAndHingeSets() {
        ProfileSet set = ProfileSet.builtIn(rules);
        RuleSettings strength = set.get("strength").settings(rule("short-rest-compound"));
        // ACSM 2009 position stand (Ratamess et al., MSSE 41(3):687-708): >= 2-3 min for heavy core lifts;
        // Schoenfeld et al. 2016 JSCR 30(7):1805-1812: 3 min beat 1 min for strength and thigh thickness
        assertEquals(180, strength.value("min-rest-squat-hinge"));
        assertEquals(120, strength.value("min-rest"));
        assertEquals(120, set.get("hypertrophy").settings(rule("short-rest-compound")).value("min-rest-squat-hinge"));
        assertEquals(List.of("strength", "hypertrophy"), set.get("strength").chain());
    }

    @Test
    void generalFitnessTurnsUnstableSurfaceOffAndFatigueTechniquesToInfo() {
        ResolvedProfile gf = ProfileSet.builtIn(rules).get("general-fitness");
        assertEquals(Severity.OFF, gf.settings(rule("unstable-surface")).severity());
        assertEquals(Severity.INFO, gf.settings(rule("fatigue-technique")).severity());
        assertEquals(Severity.WARNING, gf.settings(rule("short-rest-compound")).severity());
    }

    @Test
    void zoneRepsIsAnInfoUnderTheStrengthProfileOnlyAsPrilepinsTableDescribesCompetitionLifts() {
        ProfileSet set = ProfileSet.builtIn(rules);
        assertEquals(Severity.INFO, set.get("strength").settings(rule("zone-reps")).severity());
        assertEquals(Severity.OFF, set.get("hypertrophy").settings(rule("zone-reps")).severity());
        assertEquals(Severity.OFF, set.get("general-fitness").settings(rule("zone-reps")).severity());
    }

    @Test
    void aTeamProfileExtendsABuiltInOneAndChangesSeveritiesAndParameters() throws ConfigProblem {
        TempFiles.write(dir, "club.yaml", """
                profile: harbourside-strength
                extends: strength
                description: Harbourside Strength Club competition squad.
                rules:
                  short-rest-compound: {severity: error, min-rest: 150s}
                  slow-concentric: off
                """);
        ResolvedProfile club = load("club.yaml").get("harbourside-strength");
        RuleSettings rest = club.settings(rule("short-rest-compound"));
        assertEquals(Severity.ERROR, rest.severity());
        assertEquals(150, rest.value("min-rest"));
        assertEquals(180, rest.value("min-rest-squat-hinge"), "inherited from strength");
        assertEquals(Severity.OFF, club.settings(rule("slow-concentric")).severity());
        assertEquals(List.of("harbourside-strength", "strength", "hypertrophy"), club.chain());
    }

    @Test
    void aTeamProfileCanExtendAnotherTeamProfileFileOrName() throws ConfigProblem {
        TempFiles.write(dir, "base.yaml", """
                profile: club-base
                extends: general-fitness
                rules:
                  no-deload: {max-weeks: 4}
                """);
        TempFiles.write(dir, "teams/youth.yaml", """
                profile: club-youth
                extends: ../base.yaml
                rules:
                  short-rest-isolation: {min-rest: 90s}
                """);
        TempFiles.write(dir, "seniors.yaml", """
                profile: club-seniors
                extends: club-base
                """);
        ProfileSet set = load("teams/youth.yaml", "seniors.yaml", "base.yaml");
        assertEquals(4, set.get("club-youth").settings(rule("no-deload")).value("max-weeks"));
        assertEquals(90, set.get("club-youth").settings(rule("short-rest-isolation")).value("min-rest"));
        assertEquals(List.of("club-seniors", "club-base", "general-fitness", "hypertrophy"),
                set.get("club-seniors").chain());
    }

    private ConfigProblem problem(String text) {
        TempFiles.write(dir, "bad.yaml", text);
        return assertThrows(ConfigProblem.class, () -> load("bad.yaml"));
    }

    @Test
    void anUnknownRuleIsALocatedErrorWithASuggestion() {
        ConfigProblem p = problem("""
                profile: club
                rules:
                  short-rest-compund: {severity: info}
                """);
        assertEquals("bad.yaml:3:3: unknown rule 'short-rest-compund' (fix: did you mean 'short-rest-compound'? "
                + "list the rules with 'mesolint rules')", p.describe().replace(dir.toString() + "/", ""));
    }

    @Test
    void anUnknownParameterIsALocatedErrorNamingTheKnownOnes() {
        ConfigProblem p = problem("""
                profile: club
                rules:
                  short-rest-compound:
                    min-rests: 3min
                """);
        assertEquals(4, p.location().orElseThrow().line());
        assertEquals(5, p.location().orElseThrow().column());
        assertTrue(p.getMessage().contains("unknown parameter 'min-rests' for rule 'short-rest-compound'"), p.describe());
        assertTrue(p.hint().contains("did you mean 'min-rest'?"), p.hint());
        assertTrue(p.hint().contains("min-rest-squat-hinge"), p.hint());
    }

    @Test
    void anOutOfBoundsValueIsALocatedErrorWithTheRange() {
        ConfigProblem p = problem("""
                profile: club
                rules:
                  short-rest-isolation: {min-rest: 20min}
                """);
        assertEquals(3, p.location().orElseThrow().line());
        assertEquals(36, p.location().orElseThrow().column());
        assertTrue(p.getMessage().contains("min-rest 20min is outside 15s..5min"), p.describe());
        assertEquals("choose a value from 15s to 5min", p.hint());
    }

    @Test
    void aValueWithoutItsUnitIsRefused() {
        ConfigProblem p = problem("""
                profile: club
                rules:
                  short-rest-isolation: {min-rest: 90}
                """);
        assertTrue(p.getMessage().contains("'90' has no unit"), p.describe());
        assertEquals("write 90s or 90min", p.hint());
    }

    @Test
    void otherMistakesAreLocatedToo() {
        assertEquals(3, problem("profile: club\nrules:\n  no-deload: {severity: loud}\n").location().orElseThrow()
                .line());
        ConfigProblem key = problem("profile: club\nextend: hypertrophy\n");
        assertTrue(key.hint().startsWith("did you mean 'extends'?"), key.hint());
        ConfigProblem fixed = problem("profile: club\nrules:\n  schema: {severity: warning}\n");
        assertTrue(fixed.getMessage().contains("cannot be configured"), fixed.describe());
        ConfigProblem name = problem("profile: Club_Profile\n");
        assertEquals(1, name.location().orElseThrow().line());
        ConfigProblem noName = problem("rules: {}\n");
        assertTrue(noName.getMessage().contains("no name"), noName.describe());
        ConfigProblem syntax = problem("profile: club\nrules:\n\tno-deload: off\n");
        assertEquals(3, syntax.location().orElseThrow().line());
    }

    @Test
    void aNameThatIsTakenAnUnknownParentAndACircleAreRefused() {
        ConfigProblem taken = problem("profile: strength\n");
        assertTrue(taken.getMessage().contains("already taken by a built-in profile"), taken.describe());

        ConfigProblem unknown = problem("profile: club\nextends: strenght\n");
        assertEquals(2, unknown.location().orElseThrow().line());
        assertTrue(unknown.hint().startsWith("did you mean 'strength'?"), unknown.hint());

        TempFiles.write(dir, "a.yaml", "profile: club-a\nextends: b.yaml\n");
        TempFiles.write(dir, "b.yaml", "profile: club-b\nextends: a.yaml\n");
        ConfigProblem circle = assertThrows(ConfigProblem.class, () -> load("a.yaml"));
        assertTrue(circle.getMessage().contains("in a circle"), circle.describe());

        ConfigProblem missing = assertThrows(ConfigProblem.class, () -> load("nowhere.yaml"));
        assertTrue(missing.getMessage().contains("no profile file at nowhere.yaml"), missing.describe());
    }
}
