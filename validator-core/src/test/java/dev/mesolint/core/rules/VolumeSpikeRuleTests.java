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

    /** A week of {@code chest} hard sets of machine chest press and {@code biceps} of cable curls, one session. */
    private static String week(int number, int chest, int biceps) {
        String curls = biceps == 0 ? "" : exercise("cable-curl", "sets: " + biceps + "\nreps: 12\nrir: 1\nrest: 90s");
        return RuleRun.week(number, false, session(1,
                exercise("machine-chest-press", "sets: " + chest + "\nreps: 10\nrir: 2\nrest: 2min"), curls));
    }

    private List<Finding> run(RuleRun settings, String... weeks) {
        return settings.findings(dir, header() + weeks(weeks), VolumeSpikeRule.ID);
    }

    @Test
    void theFirstWeekHasNothingToCompareWith() {
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, 10, 4)));
    }

    @Test
    void withOneEarlierWeekThatWeekIsTheMean() {
        List<Finding> findings = run(RuleRun.defaults(), week(1, 4, 4), week(2, 8, 4));
        assertEquals(1, findings.size(), findings.toString());
        assertTrue(findings.get(0).message().startsWith("chest, week 2: 8 hard sets, 2 x the mean of week 1 (4);"),
                findings.get(0).message());
        assertEquals("raise chest volume in steps: at most 6 hard sets this week", findings.get(0).fix());
    }

    @Test
    void theMeanCoversUpToFourWeeksBefore() {
        // Gabbett 2016, BJSM 50(5):273-280: the acute week against the rolling four-week mean. Week 6 against
        // weeks 2-5 (8, 4, 4, 4: mean 5): 8 sets are 1.6 x; against all five weeks (mean 4.8) it would be 1.67 x.
        List<Finding> findings = run(RuleRun.defaults(), week(1, 4, 0), week(2, 8, 0), week(3, 4, 0), week(4, 4, 0),
                week(5, 4, 0), week(6, 8, 0));
        assertEquals(2, findings.size(), findings.toString());
        assertTrue(findings.get(1).message().contains("1.6 x the mean of weeks 2-5 (5)"), findings.get(1).message());
    }

    @Test
    void aSmallJumpOfFewSetsIsNotASpike() {
        // Biceps 2 -> 4 is 2 x, but only 2 sets more than the mean; the chest stays at 6.
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, 6, 2), week(2, 6, 4)));
        assertEquals(1, run(RuleRun.defaults().param(VolumeSpikeRule.ID, "min-added-sets", 2), week(1, 6, 2),
                week(2, 6, 4)).size());
    }

    @Test
    void aMuscleNotTrainedInTheWeeksBeforeIsNotCompared() {
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, 6, 0), week(2, 6, 6)));
    }

    @Test
    void exactlyTheLimitIsNotOverIt() {
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, 6, 0), week(2, 9, 0)));
    }
}
