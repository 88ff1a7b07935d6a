package dev.mesolint.core.rules;

import static dev.mesolint.core.rules.RuleRun.exercise;
import static dev.mesolint.core.rules.RuleRun.header;
import static dev.mesolint.core.rules.RuleRun.session;
import static dev.mesolint.core.rules.RuleRun.week;
import static dev.mesolint.core.rules.RuleRun.weeks;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.mesolint.core.finding.Finding;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WeeklyVolumeMinRuleTests {
    @TempDir
    Path dir;

    private static final String BENCH = exercise("barbell-bench-press", "sets: 4\nreps: 8\nrir: 2\nrest: 3min");

    private List<String> messages(String... weeks) {
        return RuleRun.defaults().findings(dir, header() + weeks(weeks), WeeklyVolumeMinRule.ID).stream()
                .map(Finding::message).toList();
    }

    @Test
    void musclesOnlyTrainedAsSynergistsAreSkipped() {
        // The bench press credits the triceps and front delts 0.5 a set: 2 sets each, but no exercise aims at them.
        assertEquals(List.of(), messages(week(1, false, session(1, BENCH))));
    }

    @Test
    void everyPrimeMoverCountsAsTrainedDirectlyNotOnlyTheFirst() {
        // The back squat credits quadriceps and glutes 1 each (common practice, built-in catalogue).
        List<String> messages = messages(week(1, false, session(1, BENCH,
                exercise("barbell-back-squat", "sets: 3\nreps: 8\nrir: 2\nrest: 3min"))));
        assertEquals(2, messages.size(), messages.toString());
        assertEquals(true, messages.get(0).startsWith("glutes, week 1: 3 hard sets, under the 4"));
        assertEquals(true, messages.get(1).startsWith("quadriceps, week 1: 3 hard sets, under the 4"));
    }

    @Test
    void aWeekWithoutTheDirectWorkIsReportedButADeloadIsNot() {
        String curls = exercise("cable-curl", "sets: 4\nreps: 12\nrir: 1\nrest: 90s");
        List<String> messages = messages(week(1, false, session(1, BENCH, curls)), week(2, false, session(1, BENCH)),
                week(3, true, session(1, exercise("barbell-bench-press", "sets: 2\nreps: 8\nrir: 3\nrest: 3min"))));
        assertEquals(1, messages.size(), messages.toString());
        assertEquals(true, messages.get(0).startsWith("biceps, week 2: 0 hard sets"), messages.get(0));
    }

    @Test
    void setsOfUnknownEffortAreNotHard() {
        List<String> messages = messages(week(1, false, session(1, BENCH,
                exercise("cable-curl", "sets: 4\nreps: 12\nrest: 90s"))));
        assertEquals(1, messages.size(), messages.toString());
    }
}
