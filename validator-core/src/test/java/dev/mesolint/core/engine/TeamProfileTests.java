package dev.mesolint.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.Programmes;
import dev.mesolint.core.testing.TempFiles;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A team profile that extends hypertrophy and changes two thresholds changes the findings accordingly. */
class TeamProfileTests {
    private static final Set<String> WATCHED = Set.of("short-rest-compound", "session-muscle-volume");

    @TempDir
    Path dir;

    /** One chest session: 11 hard sets (over hypertrophy's 10), 150 s rests (over its 120 s). */
    private static final String PROGRAMME = Programmes.HEADER + """
            weeks:
              - week: 1
                sessions:
                  - day: 1
                    name: Chest day
                    work:
                      - exercise: barbell-bench-press
                        sets: 6
                        reps: 8
                        rir: 2
                        rest: 150s
                      - exercise: dumbbell-incline-bench-press
                        sets: 5
                        reps: 10
                        rir: 2
                        rest: 150s
            """;

    private Set<String> watchedFindings(Optional<String> profile) throws ConfigProblem {
        Path file = TempFiles.write(dir, "chest.yaml", PROGRAMME);
        Workspace workspace = Workspace.open(new RunOptions(dir, Optional.empty(), profile, Optional.empty(), List.of(),
                Optional.empty()), BuiltInRules.all());
        RunReport run = new Checker(workspace.request(List.of(file)), BuiltInRules.all()).run();
        return run.active().stream().map(Finding::ruleId).filter(WATCHED::contains).collect(Collectors.toSet());
    }

    @Test
    void twoChangedThresholdsChangeTheFindings() throws ConfigProblem {
        // hypertrophy: at most 10 hard sets per muscle and session (common practice), rest at least 2 min after
        // compound sets (ACSM 2009 position stand, Ratamess et al., MSSE 41(3):687-708: 2-3 min for heavy core lifts)
        assertEquals(Set.of("session-muscle-volume"), watchedFindings(Optional.empty()));

        Path team = TempFiles.write(dir.resolve(".mesolint"), "harbourside-hypertrophy.yaml", """
                profile: harbourside-hypertrophy
                extends: hypertrophy
                description: Harbourside Strength Club house rules for muscle-building blocks.
                rules:
                  session-muscle-volume: {max-sets: 12}
                  short-rest-compound: {min-rest: 3min}
                """);
        Set<String> underTeam = watchedFindings(Optional.of(team.toString()));
        assertTrue(underTeam.contains("short-rest-compound"), "150 s is now under the team's 3 min: " + underTeam);
        assertEquals(Set.of("short-rest-compound"), underTeam, "11 sets are now within the team's 12");
    }
}
