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
        return messages(RuleRun.defaults(), weeks);
    }

    private List<String> messages(RuleRun run, String... weeks) {
        return run.findings(dir, header() + weeks(weeks), WeeklyVolumeMinRule.ID).stream()
                .map(Finding::message).toList();
    }

    @Test
    void aMuscleShortInSeveralWeeksIsOneFindingNamingThem() {
        // Schoenfeld, Ogborn & Krieger 2017: under 5 weekly sets still grows muscle, less than more; the 4-set
        // floor is common practice. Three abs sets a week for three weeks, a deload, then two: one finding.
        String crunch3 = exercise("cable-crunch", "sets: 3\nreps: 12\nrir: 2\nrest: 60s");
        String crunch2 = exercise("cable-crunch", "sets: 2\nreps: 12\nrir: 2\nrest: 60s");
        List<Finding> found = RuleRun.defaults().findings(dir, header() + weeks(week(1, false, session(1, crunch3)),
                week(2, false, session(1, crunch3)), week(3, false, session(1, crunch3)),
                week(4, true, session(1, crunch2)), week(5, false, session(1, crunch2))), WeeklyVolumeMinRule.ID);
        assertEquals(1, found.size(), found.toString());
        assertEquals("abs, weeks 1-3, 5: 2-3 hard sets a week, under the 4 the hypertrophy profile asks for a muscle "
                + "the programme trains directly (cable-crunch)", found.get(0).message());
        assertEquals("add 2 hard sets a week for the abs (e.g. on cable-crunch), or drop the direct work",
                found.get(0).fix());
        assertEquals(List.of(1, 2, 3, 5), found.get(0).subject().weeks());
    }

    @Test
    void theGeneralFitnessFloorCountsOneSetPerExerciseTwiceAWeekAtModerateEffort() {
        // ACSM 2009 position stand (Ratamess et al.) and Garber et al. 2011: one set per exercise of 8-12 reps at
        // 60-70% of 1RM, 2-3 days a week, is effective for novices and general fitness. 10 reps at 60% leaves
        // about 10 in reserve (Epley, 1RM = w(1 + reps/30): 20 reps to failure at 60%).
        RuleRun generalFitness = RuleRun.defaults().param(WeeklyVolumeMinRule.ID, "min-sets", 2)
                .param(WeeklyVolumeMinRule.ID, "max-rir", 10);
        String press = exercise("machine-chest-press", "sets: 1\nreps: 10\nrir: 8\nrest: 90s");
        assertEquals(List.of(), messages(generalFitness, week(1, false, session(1, press), session(4, press))));
        // Once a week is under that dose.
        List<String> once = messages(generalFitness, week(1, false, session(1, press)));
        assertEquals(List.of("chest, week 1: 1 set at RIR 10 or closer a week, under the 2 the hypertrophy profile "
                + "asks for a muscle the programme trains directly (machine-chest-press)"), once);
        // The hypertrophy default counts only hard sets (RIR 3 or closer): the same sets count for nothing.
        assertEquals(true, messages(week(1, false, session(1, press), session(4, press))).get(0)
                .startsWith("chest, week 1: 0 hard sets a week"));
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
        assertEquals(true, messages.get(0).startsWith("glutes, week 1: 3 hard sets a week, under the 4"));
        assertEquals(true, messages.get(1).startsWith("quadriceps, week 1: 3 hard sets a week, under the 4"));
    }

    @Test
    void aWeekWithoutTheDirectWorkIsReportedButADeloadIsNot() {
        String curls = exercise("cable-curl", "sets: 4\nreps: 12\nrir: 1\nrest: 90s");
        List<String> messages = messages(week(1, false, session(1, BENCH, curls)), week(2, false, session(1, BENCH)),
                week(3, true, session(1, exercise("barbell-bench-press", "sets: 2\nreps: 8\nrir: 3\nrest: 3min"))));
        assertEquals(1, messages.size(), messages.toString());
        assertEquals(true, messages.get(0).startsWith("biceps, week 2: 0 hard sets a week"), messages.get(0));
    }

    @Test
    void setsOfUnknownEffortAreNotHard() {
        List<String> messages = messages(week(1, false, session(1, BENCH,
                exercise("cable-curl", "sets: 4\nreps: 12\nrest: 90s"))));
        assertEquals(1, messages.size(), messages.toString());
    }
}
