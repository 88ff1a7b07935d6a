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

    /**
     * 20-rep squats at RIR 1 (compound), then 20-25 leg extensions at RIR 1 (a range: 22.5 + 1 = 23.5), then calf
     * raises at 12 reps and RIR 2 (14).
     */
    private static final String PROGRAMME = header() + weeks(week(1, false, session(1,
            exercise("barbell-back-squat", "sets: 4\nreps: 20\nrir: 1\nrest: 3min"),
            exercise("machine-leg-extension", "sets: 3\nreps: 20-25\nrir: 1\nrest: 2min"),
            exercise("machine-seated-calf-raise", "sets: 4\nreps: 12\nrir: 2\nrest: 90s"))));

    /** Lateral raises of 12-15 at RIR 2 twice a week for four weeks, with a 15-20 at RIR 1 week 4 day 4. */
    private static String lateralRaises(String lastWeekDay4) {
        String raises = exercise("dumbbell-lateral-raise", "sets: 3\nreps: 12-15\nrir: 2\nrest: 90s");
        return header() + weeks(week(1, false, session(1, raises), session(4, raises)),
                week(2, false, session(1, raises), session(4, raises)),
                week(3, false, session(1, raises), session(4, raises)),
                week(4, false, session(1, raises), session(4, lastWeekDay4)));
    }

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
        assertTrue(findings.get(1).message().contains("20-25 reps at RIR 1 is a 23.5-rep effort"),
                findings.get(1).message());
    }

    @Test
    void aTwelveToFifteenRepIsolationSetAtRirTwoIsNotReported() {
        // Schoenfeld et al. 2015 (25-35 vs 8-12 reps to failure: similar growth) and Lasevicius et al. 2018 (40-80%
        // of 1RM alike): 12-15 at RIR 2 (13.5 + 2 = 15.5 reps to failure, about 65% of 1RM, NSCA Table 17.7) is a
        // sound hypertrophy set on an isolation lift.
        assertEquals(List.of(), RuleRun.defaults().findings(dir, lateralRaises(
                exercise("dumbbell-lateral-raise", "sets: 3\nreps: 12-15\nrir: 2\nrest: 90s")),
                HighRepFatigueRule.ID));
        // The same set on a compound lift is still long (15 reps to failure, common practice): a warning.
        assertEquals(List.of(Severity.WARNING), RuleRun.defaults().findings(dir, header() + weeks(week(1, false,
                session(1, exercise("machine-leg-press", "sets: 3\nreps: 12-15\nrir: 2\nrest: 3min")))),
                HighRepFatigueRule.ID).stream().map(Finding::severity).toList());
    }

    @Test
    void anExerciseIsOneFindingForTheBlockQuotingItsLongestSet() {
        List<Finding> findings = RuleRun.defaults().param(HighRepFatigueRule.ID, "min-effort-reps-isolation", 15)
                .findings(dir, lateralRaises(exercise("dumbbell-lateral-raise",
                        "sets: 3\nreps: 15-20\nrir: 1\nrest: 90s")), HighRepFatigueRule.ID);
        assertEquals(1, findings.size(), findings.toString());
        assertEquals("dumbbell-lateral-raise, weeks 1-4 days 1, 4, sets 1-3: the longest, 15-20 reps at RIR 1, is "
                + "an 18.5-rep effort taken close to failure on an isolation lift; the hypertrophy profile flags "
                + "isolation sets of 15 or more reps to failure taken to RIR 2 or closer", findings.get(0).message());
        assertEquals(List.of(1, 2, 3, 4), findings.get(0).subject().weeks());
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
        assertEquals(3, severities(RuleRun.defaults().param(HighRepFatigueRule.ID, "min-effort-reps-isolation", 14))
                .size());
        // Compound sets long only from 22 reps to failure: the squats (21) drop out.
        assertEquals(List.of(Severity.INFO),
                severities(RuleRun.defaults().param(HighRepFatigueRule.ID, "min-effort-reps", 22)));
        // Only sets taken to RIR 1 or closer: the squats and leg extensions, not the calf raises at RIR 2.
        assertEquals(List.of(Severity.WARNING, Severity.INFO),
                severities(RuleRun.defaults().param(HighRepFatigueRule.ID, "min-effort-reps-isolation", 14)
                        .param(HighRepFatigueRule.ID, "max-rir", 1)));
    }
}
