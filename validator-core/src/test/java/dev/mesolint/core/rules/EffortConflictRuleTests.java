package dev.mesolint.core.rules;

import static dev.mesolint.core.rules.RuleRun.exercise;
import static dev.mesolint.core.rules.RuleRun.header;
import static dev.mesolint.core.rules.RuleRun.session;
import static dev.mesolint.core.rules.RuleRun.week;
import static dev.mesolint.core.rules.RuleRun.weeks;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class EffortConflictRuleTests {
    @TempDir
    Path dir;

    /** An infeasible bench press on day 1, a mislabelled incline press on day 4. */
    private static final String PROGRAMME = header() + weeks(week(1, false,
            session(1,
                    exercise("barbell-bench-press", "sets: 3\nreps: 10\nload: 85%\nrir: 2\nrest: 3min"),
                    exercise("cable-chest-fly", "sets: 2\nreps: 12\nrir: 1\nrest: 90s")),
            session(4,
                    exercise("barbell-incline-bench-press", "sets: 3\nreps: 8\nload: 60%\nrir: 1\nrest: 3min"),
                    exercise("machine-chest-press", "sets: 2\nreps: 10\nrir: 2\nrest: 2min"))));

    private List<Finding> run(RuleRun settings) {
        return settings.findings(dir, PROGRAMME, EffortConflictRule.ID);
    }

    @Test
    void anInfeasibleLoadIsAnErrorAndAMislabelledOneTakesTheRuleSeverity() {
        List<Finding> findings = run(RuleRun.defaults());
        assertEquals(2, findings.size(), findings.toString());
        Finding infeasible = findings.get(0);
        assertEquals(Severity.ERROR, infeasible.severity());
        // NSCA Essentials 4th ed., Table 17.7: 85% of 1RM allows about 6 reps; Brzycki gives 37 - 36 x 0.85 = 6.4.
        assertTrue(infeasible.message().contains("allows about 6.4 reps to failure"), infeasible.message());
        assertTrue(infeasible.message().startsWith("barbell-bench-press, week 1 day 1, sets 1-3:"),
                infeasible.message());
        Finding mislabelled = findings.get(1);
        assertEquals(Severity.WARNING, mislabelled.severity());
        // Brzycki: 60% allows 37 - 21.6 = 15.4 reps; 8 done leave 7.4, not the 1 stated.
        assertTrue(mislabelled.message().contains("leaves about 7.4 reps in reserve, not the 1 stated"),
                mislabelled.message());
    }

    @Test
    void aProfileThatLowersTheRuleStillReportsAnInfeasibleLoadAsAnError() {
        List<Finding> findings = run(RuleRun.defaults().severity(EffortConflictRule.ID, Severity.INFO));
        assertEquals(List.of(Severity.ERROR, Severity.INFO), findings.stream().map(Finding::severity).toList());
    }

    @Test
    void aProfileThatTurnsTheRuleOffSilencesBothKinds() {
        assertEquals(List.of(), run(RuleRun.defaults().severity(EffortConflictRule.ID, Severity.OFF)));
    }

    @Test
    void theFixNamesALoadThatAllowsThePrescription() {
        Finding infeasible = run(RuleRun.defaults()).get(0);
        // Brzycki: 10 reps + 2 in reserve = 12 to failure, 1RM share (37 - 12) / 36 = 69.4%, written 67.5%.
        assertEquals("load: 67.5% for 10 reps at 2 in reserve, or reps: 4 at this load", infeasible.fix());
    }

    /**
     * A novice's 3 x 5 squat from 70 kg, +2.5 kg a session on days 1, 3 and 5 for four weeks, against one 1RM of
     * 100 kg stated for the block (common practice: the novice linear progression of the sound samples). Brzycki
     * 1993: 5 reps need at most (37 - 5 + 2 reps tolerance) / 36 = 94.4% of 1RM, so 95 kg and 97.5 kg in week 4 pass
     * it.
     */
    private static String squatProgression(String level, double firstLoad, double step, int weeks) {
        StringBuilder text = new StringBuilder(header(level, "strength", "90")
                + "athlete:\n  one-rep-max:\n    barbell-back-squat: 100kg\nweeks:\n");
        double load = firstLoad;
        for (int w = 1; w <= weeks; w++) {
            StringBuilder sessions = new StringBuilder();
            for (int day : new int[] {1, 3, 5}) {
                sessions.append(session(day, exercise("barbell-back-squat",
                        "sets: 3\nreps: 5\nload: " + Texts.num(load) + "kg\nrest: 4min")));
                load += step;
            }
            text.append(week(w, false, sessions.toString()));
        }
        return text.toString();
    }

    @Test
    void aNoviceProgressionPastAStatedOneRepMaxIsAnOutOfDateOneRepMaxNotAnImpossibleSet() {
        List<Finding> findings = RuleRun.defaults().profile("strength").findings(dir,
                squatProgression("novice", 70, 2.5, 4), EffortConflictRule.ID);
        assertEquals(1, findings.size(), findings.toString());
        Finding f = findings.get(0);
        assertEquals(Severity.INFO, f.severity());
        // Brzycki 1993: e1RM = 97.5 x 36 / (37 - 5) = 109.7 kg at week 4 day 5, 3 + 4/7 = 3.6 weeks after the block
        // starts: +9.7%, 2.7% a week, under the novice bound of 10% a week (common practice, from memory).
        assertTrue(f.message().startsWith("barbell-back-squat, week 4: 1RM out of date: the loads pass what the "
                + "100 kg 1RM in force since week 1 allows"), f.message());
        assertTrue(f.message().contains("implies an e1RM of about 109.7 kg (Brzycki), +9.7% in 3.6 weeks, about "
                + "2.7% a week, within what a novice lifter gains (up to 10% a week)"), f.message());
        // The first set past the 1RM is 95 kg at week 4 day 3: 95 x 36 / 32 = 106.9 kg, written 105kg.
        assertEquals("state the 1RM as it rises, e.g. under athlete: one-rep-max: barbell-back-squat: [{from-week: "
                + "1, load: 100kg}, {from-week: 4, load: 105kg}], or add a set with test: 1rm before week 4", f.fix());
    }

    @Test
    void theSameRiseIsImplausibleForAnAdvancedLifter() {
        // Against the advanced bound of 2.5% a week (common practice, from memory): 95 kg at week 4 day 3 implies
        // 95 x 36 / 32 = 106.9 kg, +6.9% in 3.3 weeks = 2.1% a week, still out of date only; 97.5 kg at day 5,
        // 2.7% a week, is impossible as written.
        List<Finding> findings = RuleRun.defaults().profile("strength").findings(dir,
                squatProgression("advanced", 70, 2.5, 4), EffortConflictRule.ID);
        assertEquals(List.of(Severity.INFO, Severity.ERROR), findings.stream().map(Finding::severity).toList());
        assertTrue(findings.get(0).message().contains("about 2.1% a week, within what an advanced lifter gains"),
                findings.get(0).message());
        assertTrue(findings.get(1).message().contains("read as a 1RM that rose, it would take an e1RM of about "
                + "109.7 kg (Brzycki) from the 100 kg in force since week 1: +9.7% in 3.6 weeks, about 2.7% a week, "
                + "more than an advanced lifter gains (up to 2.5% a week)"), findings.get(1).message());
    }

    @Test
    void aJumpOfATwentiethInAWeekIsAnImpossibleSetEvenForANovice() {
        // Week 1 at 80 kg, week 2 day 1 at 107.5 kg: Brzycki e1RM 107.5 x 36 / 32 = 120.9 kg, +20.9% in one week.
        String text = header("novice", "strength", "90") + "athlete:\n  one-rep-max:\n    barbell-back-squat: 100kg\n"
                + weeks(week(1, false, session(1, exercise("barbell-back-squat", "sets: 3\nreps: 5\nload: 80kg"))),
                        week(2, false, session(1, exercise("barbell-back-squat", "sets: 3\nreps: 5\nload: 107.5kg"))));
        List<Finding> findings = RuleRun.defaults().profile("strength").findings(dir, text, EffortConflictRule.ID);
        assertEquals(1, findings.size(), findings.toString());
        assertEquals(Severity.ERROR, findings.get(0).severity());
        assertTrue(findings.get(0).message().contains("e1RM of about 120.9 kg (Brzycki) from the 100 kg in force "
                + "since week 1: +20.9% in 1 week, about 20.9% a week, more than a novice lifter gains (up to 10% a "
                + "week)"), findings.get(0).message());
    }

    @Test
    void aLoadPastTheOneRepMaxStatedForThatVerySessionCannotHaveRisenYet() {
        String text = header("novice", "strength", "90") + "athlete:\n  one-rep-max:\n    barbell-back-squat: 100kg\n"
                + weeks(week(1, false, session(1, exercise("barbell-back-squat", "sets: 3\nreps: 5\nload: 97.5kg"))));
        List<Finding> findings = RuleRun.defaults().profile("strength").findings(dir, text, EffortConflictRule.ID);
        assertEquals(1, findings.size(), findings.toString());
        assertEquals(Severity.ERROR, findings.get(0).severity());
        assertTrue(findings.get(0).message().endsWith("above the 100 kg stated for this very session"),
                findings.get(0).message());
        // A weight gets a weight as its fix, in plate steps: Brzycki 1993, 5 reps to failure at 32/36 = 88.9% of
        // 100 kg, rounded down to 87.5 kg; 97.5 kg allows 37 - 36 x 0.975 = 1.9 reps, so 1 at this load.
        assertEquals("load: 87.5kg for 5 reps, or reps: 1 at this load", findings.get(0).fix());
    }

    @Test
    void aPercentageTooHeavyForItsRepsStaysImpossibleWhateverTheOneRepMax() {
        // 85% x 10 (the infeasible fixture): the coach wrote the share, so no risen 1RM explains it.
        Finding infeasible = run(RuleRun.defaults()).get(0);
        assertEquals(Severity.ERROR, infeasible.severity());
        assertTrue(!infeasible.message().contains("e1RM"), infeasible.message());
    }

    @Test
    void theSoundNoviceProgressionWithItsFirstWeeksOneRepMaxesAllBlockHasNoImpossibleSet() throws Exception {
        // The case: the novice linear progression of the sound samples (+2.5 kg a session, common practice)
        // with each 1RM stated once, at its week-1 value, failed the build in week 4 with effort-conflict errors.
        String sound = java.nio.file.Files.readString(Path.of("../sample-programs/sound/novice-linear-progression.yaml"));
        String once = sound.replaceAll("(?m)^    ([a-z-]+):\\n      - \\{from-week: 1, load: ([0-9.]+kg)\\}\\n"
                + "(      - \\{from-week: [0-9]+, load: [0-9.]+kg\\}\\n)+", "    $1: $2\n");
        assertTrue(once.contains("    barbell-back-squat: 90kg\n") && !once.contains("from-week"), once);
        List<Finding> findings = RuleRun.defaults().profile("strength").findings(dir, once, EffortConflictRule.ID);
        assertTrue(findings.stream().noneMatch(f -> f.severity() == Severity.ERROR), findings.toString());
        assertTrue(findings.stream().anyMatch(f -> f.message().contains("1RM out of date")), findings.toString());
        // One finding per lift at most: a whole progression past a stale 1RM reads as one info.
        assertEquals(findings.size(), findings.stream().map(f -> f.message().substring(0, f.message().indexOf(',')))
                .distinct().count(), findings.toString());
    }
}
