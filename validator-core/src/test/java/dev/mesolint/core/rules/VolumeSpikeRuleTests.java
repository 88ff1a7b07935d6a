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

class VolumeSpikeRuleTests {
    @TempDir
    Path dir;

    /** A week of {@code chest} working sets of machine chest press and {@code biceps} of cable curls, one session. */
    private static String week(int number, int chest, int biceps) {
        return week(number, false, chest, biceps);
    }

    private static String week(int number, boolean deload, int chest, int biceps) {
        String curls = biceps == 0 ? "" : exercise("cable-curl", "sets: " + biceps + "\nreps: 12\nrir: 1\nrest: 90s");
        return RuleRun.week(number, deload, session(1,
                exercise("machine-chest-press", "sets: " + chest + "\nreps: 10\nrir: 2\nrest: 2min"), curls));
    }

    /** Squat 3x5 at {@code load} % of a 140 kg 1RM and 4 leg-press sets: the same sets, only the load changes. */
    private static String squatWeek(int number, double load) {
        return RuleRun.week(number, false, session(1, exercise("barbell-back-squat",
                "sets: 3\nreps: 5\nload: " + load + "%\nrest: 3min"),
                exercise("machine-leg-press", "sets: 4\nreps: 10\nrir: 2\nrest: 2min")));
    }

    private List<Finding> run(RuleRun settings, String... weeks) {
        return settings.findings(dir, header() + weeks(weeks), VolumeSpikeRule.ID);
    }

    @Test
    void theFirstWeekHasNothingToCompareWith() {
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, 10, 4)));
    }

    @Test
    void oneEarlierWeekIsNoBaseline() {
        // An A/B rotation over three days a week (common practice): A's lifts twice one week, once the next.
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, 4, 4), week(2, 8, 4)));
        List<Finding> findings = run(RuleRun.defaults().param(VolumeSpikeRule.ID, "min-baseline-weeks", 1),
                week(1, 4, 4), week(2, 8, 4));
        assertEquals(1, findings.size(), findings.toString());
        assertTrue(findings.get(0).message().startsWith("chest, week 2: 8 working sets with chest as prime mover, 2 x "
                + "the mean of week 1 (4);"), findings.get(0).message());
        assertEquals("raise chest volume in steps: at most 6 working sets this week", findings.get(0).fix());
    }

    @Test
    void theMeanCoversUpToFourWeeksBefore() {
        // Gabbett 2016, BJSM 50(5):273-280: the acute week against the rolling four-week mean. Week 6 against
        // weeks 2-5 (8, 4, 4, 4: mean 5): 8 sets are 1.6 x; against all five weeks (mean 4.8) it would be 1.67 x.
        List<Finding> findings = run(RuleRun.defaults(), week(1, 4, 0), week(2, 8, 0), week(3, 4, 0), week(4, 4, 0),
                week(5, 4, 0), week(6, 8, 0));
        // Week 2 (8 after 4) has a single week before it: no baseline yet.
        assertEquals(1, findings.size(), findings.toString());
        assertTrue(findings.get(0).message().contains("1.6 x the mean of weeks 2-5 (5)"), findings.get(0).message());
    }

    @Test
    void aSmallJumpOfFewSetsIsNotASpike() {
        // Biceps 2 -> 4 is 2 x, but only 2 sets more than the mean; the chest stays at 6.
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, 6, 2), week(2, 6, 2), week(3, 6, 4)));
        assertEquals(1, run(RuleRun.defaults().param(VolumeSpikeRule.ID, "min-added-sets", 2), week(1, 6, 2),
                week(2, 6, 2), week(3, 6, 4)).size());
    }

    @Test
    void aMuscleNotTrainedInTheWeeksBeforeIsNotCompared() {
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, 6, 0), week(2, 6, 0), week(3, 6, 6)));
    }

    @Test
    void exactlyTheLimitIsNotOverIt() {
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, 6, 0), week(2, 6, 0), week(3, 9, 0)));
    }

    @Test
    void aHeavierLoadOnTheSameSetsIsNeverASpike() {
        // The novice linear progression of issue 9 (common practice: 3x5, +2.5 kg a session): at 60% the sets are
        // far from failure, at 87.5% near it, so quadriceps hard sets (4 -> 7) and volume load both jump; working
        // sets (7 every week) do not.
        String athlete = "athlete:\n  one-rep-max:\n    barbell-back-squat: 140kg\n";
        List<Finding> findings = RuleRun.defaults().findings(dir, header() + athlete + weeks(squatWeek(1, 60),
                squatWeek(2, 70), squatWeek(3, 80), squatWeek(4, 87.5)), VolumeSpikeRule.ID);
        assertEquals(List.of(), findings);
    }

    @Test
    void synergistSetsAreNotCounted() {
        // Chest press credits triceps 0.5: 4 -> 12 sets of it is a chest spike, not a triceps one.
        List<Finding> findings = run(RuleRun.defaults(), week(1, 4, 0), week(2, 4, 0), week(3, 12, 0));
        assertEquals(List.of("chest"), findings.stream().map(f -> f.message().substring(0, f.message().indexOf(',')))
                .toList());
    }

    @Test
    void deloadWeeksAreLeftOutOfTheMean() {
        // Weeks 1-3 at 10 chest sets, a deload at 4, back to 10: against the mean of weeks 1-3 (10), not 8.5
        // with the deload in; the deload itself is not checked. Then 6, 6, a deload at 2, and 10: 1.7 x weeks 1-2.
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, 10, 0), week(2, 10, 0), week(3, 10, 0),
                week(4, true, 4, 0), week(5, 10, 0)));
        List<Finding> findings = run(RuleRun.defaults(), week(1, 6, 0), week(2, 6, 0), week(3, true, 2, 0),
                week(4, 10, 0));
        assertEquals(1, findings.size(), findings.toString());
        assertTrue(findings.get(0).message().contains("1.7 x the mean of weeks 1-2 (6)"), findings.get(0).message());
    }
}
