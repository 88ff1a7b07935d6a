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

/** Fixes that propose a heavier load stay under the athlete's caps (issue 9: a leg press under a knee cap). */
class FixCeilingTests {
    @TempDir
    Path dir;

    private static final String KNEE_CAP = "athlete:\n  one-rep-max:\n    machine-leg-press: 200kg\n  constraints:\n"
            + "    - region: knee\n      max-load: 60%\n      reason: Knee rehabilitation; the physiotherapist capped "
            + "knee loading.\n";

    @Test
    void aLegPressUnderAKneeCapIsNotToldToGoHeavier() {
        // 55% of 1RM for 10 reps: Brzycki (NSCA Table 17.7) gives about 17 reps to failure, so about 7 in reserve;
        // 2 in reserve would need about 70%, over the clinician's 60% cap.
        List<Finding> found = RuleRun.defaults().findings(dir, header() + KNEE_CAP + weeks(week(1, false,
                session(1, exercise("machine-leg-press", "sets: 3\nreps: 10\nload: 55%\nrest: 2min")))),
                FarFromFailureRule.ID);
        assertEquals(1, found.size(), found.toString());
        assertTrue(found.get(0).fix().startsWith("keep the load"), found.get(0).fix());
    }

    @Test
    void withoutACapTheHeavierLoadIsTheFix() {
        List<Finding> found = RuleRun.defaults().findings(dir, header() + KNEE_CAP.replace("60%", "90%")
                + weeks(week(1, false, session(1, exercise("machine-leg-press",
                        "sets: 3\nreps: 10\nload: 55%\nrest: 2min")))), FarFromFailureRule.ID);
        assertEquals(1, found.size(), found.toString());
        // Brzycki: a 12-rep effort is about 69% of 1RM, written in 2.5% steps as 67.5%
        assertTrue(found.get(0).fix().startsWith("load: 67.5% for 10 reps"), found.get(0).fix());
    }
}
