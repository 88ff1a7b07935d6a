package dev.mesolint.core.rules;

import static dev.mesolint.core.rules.RuleRun.exercise;
import static dev.mesolint.core.rules.RuleRun.header;
import static dev.mesolint.core.rules.RuleRun.session;
import static dev.mesolint.core.rules.RuleRun.week;
import static dev.mesolint.core.rules.RuleRun.weeks;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Finding;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class NoviceHeavyComplexRuleTests {
    @TempDir
    Path dir;

    private List<Finding> run(String level, String squat) {
        return RuleRun.defaults().findings(dir, header(level, "general-fitness", "60")
                + weeks(week(1, false, session(1, exercise("barbell-back-squat", squat)))), NoviceHeavyComplexRule.ID);
    }

    @Test
    void aLoadAloneIsReadThroughTheRepsItAllows() {
        // NSCA Essentials 4th ed., Table 17.7: 87% of 1RM allows about 5 reps; Brzycki: 37 - 36 x 0.875 = 5.5.
        List<Finding> heavy = run("novice", "sets: 4\nreps: 3\nload: 87.5%\nrest: 3min");
        assertEquals(1, heavy.size(), heavy.toString());
        assertTrue(heavy.get(0).message().contains("3 reps at 87.5% of 1RM is a 5.5-rep effort"),
                heavy.get(0).message());
        // 80% allows about 8 reps (Table 17.7): 3 reps leave about 5 in reserve.
        assertEquals(List.of(), run("novice", "sets: 4\nreps: 3\nload: 80%\nrest: 3min"));
    }

    @Test
    void aWeightPastAStaleOneRepMaxSaysNothingOfTheEffortButAStatedReserveStillDoes() {
        // A novice's 5 reps at 97.5 kg against the 100 kg 1RM stated at the start (a linear progression, common
        // practice): Brzycki 1993 gives 37 - 36 x 0.975 = 1.9 reps to failure, so the 1RM has risen (effort-conflict
        // says so); the load tells nothing of how heavy the set is for the lifter.
        String athlete = "athlete:\n  one-rep-max:\n    barbell-back-squat: 100kg\n";
        String stale = header("novice", "general-fitness", "60") + athlete
                + weeks(week(1, false, session(1, exercise("barbell-back-squat", "sets: 3\nreps: 5\nload: 97.5kg"))));
        assertEquals(List.of(), RuleRun.defaults().findings(dir, stale, NoviceHeavyComplexRule.ID));
        // With the reserve written, the stated effort is read: 5 reps + 1 in reserve is a 6-rep effort, heavy.
        String stated = header("novice", "general-fitness", "60") + athlete + weeks(week(1, false,
                session(1, exercise("barbell-back-squat", "sets: 3\nreps: 5\nrir: 1\nload: 97.5kg"))));
        List<Finding> read = RuleRun.defaults().findings(dir, stated, NoviceHeavyComplexRule.ID);
        assertEquals(1, read.size(), read.toString());
        assertTrue(read.get(0).message().contains("is a 6-rep effort"), read.get(0).message());
        // A percentage is the coach's own statement of heaviness: 95% for 5 stays a finding.
        assertEquals(1, run("novice", "sets: 3\nreps: 5\nload: 95%\nrest: 3min").size());
    }

    @Test
    void sixRepsToFailureIsHeavyAndSevenIsNot() {
        assertEquals(1, run("novice", "sets: 4\nreps: 4\nrir: 2\nrest: 3min").size());
        assertEquals(List.of(), run("novice", "sets: 4\nreps: 4\nrir: 3\nrest: 3min"));
    }

    @Test
    void onlyNoviceProgrammesAreChecked() {
        assertEquals(List.of(), run("intermediate", "sets: 4\nreps: 2\nrir: 1\nrest: 3min"));
    }
}
