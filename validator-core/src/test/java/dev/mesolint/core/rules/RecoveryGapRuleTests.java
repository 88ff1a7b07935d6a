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

class RecoveryGapRuleTests {
    @TempDir
    Path dir;

    /** Six hard quadriceps sets. */
    private static String legs(int day) {
        return session(day, exercise("machine-hack-squat", "sets: 3\nreps: 10\nrir: 2\nrest: 3min"),
                exercise("machine-leg-extension", "sets: 3\nreps: 12\nrir: 1\nrest: 90s"));
    }

    private List<Finding> run(RuleRun settings, String... weeks) {
        return settings.findings(dir, header() + weeks(weeks), RecoveryGapRule.ID);
    }

    @Test
    void exactlyFortyEightHoursIsEnough() {
        // Garber et al. 2011, MSSE 43(7):1334-1359: at least 48 h between sessions for the same muscles.
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, false, legs(1), legs(3), legs(5))));
    }

    @Test
    void twentyFourHoursIsReportedOnTheLaterSession() {
        List<Finding> findings = run(RuleRun.defaults(), week(1, false, legs(1), legs(2)));
        assertEquals(1, findings.size(), findings.toString());
        Finding f = findings.get(0);
        assertTrue(f.message().startsWith("quadriceps, week 1 day 2: 6 hard sets, 24 h after the 6 on day 1;"),
                f.message());
        assertEquals("move day 2 to day 3 or later, or keep the quadriceps under 4 hard sets in one of them",
                f.fix());
    }

    @Test
    void theHoursAndSetsAreParameters() {
        // NSCA Essentials 4th ed., Ch. 17: up to 3 rest days; a profile may ask for 72 h.
        assertEquals(1, run(RuleRun.defaults().param(RecoveryGapRule.ID, "min-hours", 72),
                week(1, false, legs(1), legs(3))).size());
        assertEquals(List.of(), run(RuleRun.defaults().param(RecoveryGapRule.ID, "min-sets", 7),
                week(1, false, legs(1), legs(2))));
    }

    @Test
    void aFewSetsOnTheNextDayAreNotReported() {
        String light = session(2, exercise("machine-leg-extension", "sets: 3\nreps: 12\nrir: 1\nrest: 90s"));
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, false, legs(1), light, legs(3))));
    }

    @Test
    void theStepFromTheLastSessionOfAWeekToTheFirstOfTheNextCounts() {
        List<Finding> findings = run(RuleRun.defaults(), week(1, false, legs(4), legs(7)), week(2, false, legs(1),
                legs(4)));
        assertEquals(1, findings.size(), findings.toString());
        assertTrue(findings.get(0).message().startsWith(
                "quadriceps, week 2 day 1: 6 hard sets, 24 h after the 6 on day 7 of the week before"),
                findings.get(0).message());
        assertEquals(List.of(), run(RuleRun.defaults(), week(1, false, legs(4), legs(6)), week(2, false, legs(1))));
    }
}
