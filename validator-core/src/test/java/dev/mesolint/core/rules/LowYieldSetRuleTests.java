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

class LowYieldSetRuleTests {
    @TempDir
    Path dir;

    /**
     * The model's check value (docs/model.md, section 3; common practice): a second 20-rep compound set to failure 30
     * s after the first keeps about a third of the first's stimulus: 32% on a squat, whose quadriceps recover 1.25
     * times slower than upper-body muscles (docs/model.md, rest effect after Schoenfeld et al. 2016).
     */
    private static final String TWO_LONG_SETS = header() + weeks(week(1, false, session(1,
            exercise("barbell-back-squat", "sets: 2\nreps: 20\nrir: 0\nrest: 30s"))));

    @Test
    void theShareIsTheSetsStimulusOverWhatItGivesFresh() {
        assertEquals(List.of(), RuleRun.defaults().findings(dir, TWO_LONG_SETS, LowYieldSetRule.ID),
                "32% is not under 30%");
        List<Finding> findings = RuleRun.defaults().param(LowYieldSetRule.ID, "min-share", 0.4)
                .findings(dir, TWO_LONG_SETS, LowYieldSetRule.ID);
        assertEquals(1, findings.size(), findings.toString());
        Finding f = findings.get(0);
        assertEquals(Severity.INFO, f.severity());
        assertTrue(f.message().startsWith("barbell-back-squat, week 1 day 1, set 2: stimulus 32% of what the same "
                + "set gives fresh"), f.message());
        assertTrue(f.message().contains("after 1 earlier set that train it this session, with 30 s rest before it"),
                f.message());
        assertEquals("rest: 3min between these sets, or stop barbell-back-squat after set 1", f.fix());
    }
}
