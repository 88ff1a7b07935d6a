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

class SessionTimeRuleTests {
    @TempDir
    Path dir;

    /**
     * docs/model.md, section 5: bench press, 1 min set-up + 2 warm-up sets x 1.5 min + 4 x 8 reps x 4 s + 4 rests of
     * 3 min = 18.13 min; rows, 1 min set-up + 4 x 10 reps x 4 s + 3 rests of 2 min (none after the session's last
     * set) = 9.67 min: 27.8 min in all.
     */
    private static final String WEEKS = weeks(week(1, false, session(1,
            exercise("barbell-bench-press", "warm-up: 2\nsets: 4\nreps: 8\nrir: 2\nrest: 3min"),
            exercise("seated-cable-row", "sets: 4\nreps: 10\nrir: 2\nrest: 2min"))));

    private List<Finding> run(RuleRun settings, String minutes) {
        return settings.findings(dir, header("intermediate", "hypertrophy", minutes) + WEEKS, SessionTimeRule.ID);
    }

    @Test
    void theProgrammesBudgetDecides() {
        List<Finding> over = run(RuleRun.defaults(), "25");
        // the estimate uses docs/model.md's defaults: about 4 s a rep (common practice), the written rests,
        // 1.5 min per warm-up set and 1 min changeover per exercise (project conventions)
        assertEquals(1, over.size(), over.toString());
        assertTrue(over.get(0).message().startsWith("week 1 day 1: about 28 min estimated"), over.get(0).message());
        assertTrue(over.get(0).message().endsWith("over the programme's session-minutes: 25"));
        assertEquals(List.of(), run(RuleRun.defaults(), "30"));
    }

    @Test
    void withoutABudgetTheParameterApplies() {
        assertEquals(List.of(), run(RuleRun.defaults(), null), "the default 90 minutes");
        List<Finding> over = run(RuleRun.defaults().param(SessionTimeRule.ID, "session-minutes", 20), null);
        assertEquals(1, over.size(), over.toString());
        assertTrue(over.get(0).message().contains("the hypertrophy profile's 20 minutes"), over.get(0).message());
    }
}
