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
}
