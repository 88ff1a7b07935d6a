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

class HighRepFatigueRuleTests {
    @TempDir
    Path dir;

    /** 20-rep squats at RIR 1 (compound), then 12-15 leg extensions at RIR 2 (a range: 13.5 + 2 = 15.5). */
    private static final String PROGRAMME = header() + weeks(week(1, false, session(1,
            exercise("barbell-back-squat", "sets: 4\nreps: 20\nrir: 1\nrest: 3min"),
            exercise("machine-leg-extension", "sets: 3\nreps: 12-15\nrir: 2\nrest: 2min"),
            exercise("machine-seated-calf-raise", "sets: 4\nreps: 12\nrir: 2\nrest: 90s"))));

    private List<Severity> severities(RuleRun settings) {
        return settings.findings(dir, PROGRAMME, HighRepFatigueRule.ID).stream().map(Finding::severity).toList();
    }

    @Test
    void compoundLiftsWarnAndIsolationLiftsInform() {
        List<Finding> findings = RuleRun.defaults().findings(dir, PROGRAMME, HighRepFatigueRule.ID);
        // common practice: sets of 15+ reps to near failure cost more fatigue than they add, most on compound lifts
        assertEquals(List.of(Severity.WARNING, Severity.INFO), findings.stream().map(Finding::severity).toList());
        assertTrue(findings.get(0).message().contains("20 reps at RIR 1 is a 21-rep effort"),
                findings.get(0).message());
        assertTrue(findings.get(1).message().contains("a 15.5-rep effort"), findings.get(1).message());
    }

    @Test
    void isolationLiftsStayAtMostInformationWhateverTheProfileSays() {
        assertEquals(List.of(Severity.ERROR, Severity.INFO),
                severities(RuleRun.defaults().severity(HighRepFatigueRule.ID, Severity.ERROR)));
        assertEquals(List.of(Severity.INFO, Severity.INFO),
                severities(RuleRun.defaults().severity(HighRepFatigueRule.ID, Severity.INFO)));
    }

    @Test
    void theThresholdsAreParameters() {
        // 12 reps at RIR 2 is a 14-rep effort: long from 14 on, the calf raises count too.
        assertEquals(3, severities(RuleRun.defaults().param(HighRepFatigueRule.ID, "min-effort-reps", 14)).size());
        // Only sets taken to RIR 1 or closer: the squats.
        assertEquals(List.of(Severity.WARNING),
                severities(RuleRun.defaults().param(HighRepFatigueRule.ID, "max-rir", 1)));
    }
}
