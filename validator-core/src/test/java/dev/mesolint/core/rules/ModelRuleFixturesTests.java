package dev.mesolint.core.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.testing.ModelRuleProfiles;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Runs every fixture of the model rules through the whole checker and compares the findings with the file's
 * markers. A line that must carry a finding ends with {@code # expect: rule-id} (several ids comma-separated); a
 * first line {@code # profile: strength} checks the file under that profile. A fixture fails on any active finding,
 * of any rule, it does not expect, and on any expected one that is missing. Pairs of (rule id, line) are compared
 * as sets: several findings of one rule on one line need one marker.
 */
class ModelRuleFixturesTests {
    private static final Path FIXTURES = Path.of("src", "test", "resources", "fixtures");
    private static final Pattern EXPECT = Pattern.compile("#\\s*expect:\\s*([a-z0-9, -]+)\\s*$");
    private static final Pattern PROFILE = Pattern.compile("^#\\s*profile:\\s*([a-z-]+)\\s*$");

    static final List<String> RULES = List.of(EffortMissingRule.ID, EffortConflictRule.ID, FarFromFailureRule.ID,
            HighRepFatigueRule.ID, LowYieldSetRule.ID, SessionMuscleVolumeRule.ID, WeeklyVolumeMaxRule.ID,
            WeeklyVolumeMinRule.ID, VolumeSpikeRule.ID, RecoveryGapRule.ID, SessionTimeRule.ID,
            NoviceHeavyComplexRule.ID, ConstraintLoadRule.ID);

    static Stream<Path> fixtures() throws IOException {
        List<Path> files = new ArrayList<>();
        for (String rule : RULES) {
            try (Stream<Path> s = Files.list(FIXTURES.resolve(rule))) {
                s.filter(p -> p.toString().endsWith(".yaml")).sorted().forEach(files::add);
            }
        }
        return files.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void theFindingsAreExactlyTheMarkedOnes(Path fixture) throws IOException {
        List<String> lines = Files.readAllLines(fixture);
        TreeSet<String> expected = new TreeSet<>();
        for (int i = 0; i < lines.size(); i++) {
            Matcher m = EXPECT.matcher(lines.get(i));
            if (m.find()) {
                for (String id : m.group(1).split(",")) {
                    expected.add(id.trim() + " @ " + (i + 1));
                }
            }
        }
        String rule = fixture.getParent().getFileName().toString();
        boolean failing = fixture.getFileName().toString().startsWith("failing");
        assertEquals(failing, expected.stream().anyMatch(e -> e.startsWith(rule + " @ ")),
                "a failing fixture marks at least one " + rule + " finding; a passing one marks none");

        RunReport run = check(fixture, profile(lines));
        assertEquals(1, run.files().size());
        List<Finding> active = run.files().get(0).active();
        TreeSet<String> actual = new TreeSet<>();
        active.forEach(f -> actual.add(f.ruleId() + " @ " + f.location().line()));
        assertEquals(expected, actual, () -> "findings:\n" + String.join("\n", active.stream()
                .map(f -> f.location().line() + ": " + f.severity().label() + " " + f.ruleId() + ": " + f.message())
                .toList()));
        for (Finding f : active) {
            assertFalse(f.message().contains("{weeks}"), f.message());
            assertTrue(!f.fix().isBlank(), f.ruleId() + " gives a fix");
        }
    }

    static Optional<String> profile(List<String> lines) {
        if (lines.isEmpty()) {
            return Optional.empty();
        }
        Matcher m = PROFILE.matcher(lines.get(0));
        return m.matches() ? Optional.of(m.group(1)) : Optional.empty();
    }

    /**
     * Checks one file the way the CLI does ({@code CheckRequest.of}), with the profile stand-in: the goal's profile,
     * or the one the fixture names.
     */
    static RunReport check(Path file, Optional<String> profile) {
        CheckRequest defaults = CheckRequest.of(List.of(file), file.getParent());
        CheckRequest request = new CheckRequest(defaults.inputs(), defaults.root(), defaults.failOn(), List.of(),
                profile.map(ModelRuleProfiles::fixed).orElseGet(ModelRuleProfiles::byGoal), YamlLimits.DEFAULTS);
        return new Checker(request, BuiltInRules.all()).run();
    }
}
