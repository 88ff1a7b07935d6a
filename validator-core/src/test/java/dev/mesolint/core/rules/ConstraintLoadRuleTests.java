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

class ConstraintLoadRuleTests {
    @TempDir
    Path dir;

    /** A programme for an athlete with a bench press 1RM of 100kg and a shoulder cap. */
    private List<Finding> run(String cap, String... exercises) {
        String athlete = "athlete:\n  one-rep-max: {barbell-bench-press: 100kg}\n  constraints:\n"
                + "    - {region: shoulder, max-load: " + cap + ", reason: capped by the athlete's physiotherapist}\n";
        return RuleRun.defaults().findings(dir, header() + athlete + weeks(week(1, false, session(1, exercises))),
                ConstraintLoadRule.ID);
    }

    @Test
    void aLoadInferredFromRepsAndReserveIsCompared() {
        // NSCA Essentials 4th ed., Table 17.7: 10 reps to failure at 75% of 1RM; Brzycki: (37 - 10) / 36 = 75%.
        String press = exercise("dumbbell-bench-press", "sets: 3\nreps: 8\nrir: 2\nrest: 2min");
        List<Finding> over = run("70%", press);
        assertEquals(1, over.size(), over.toString());
        assertEquals(Severity.ERROR, over.get(0).severity());
        assertTrue(over.get(0).message().contains("load about 75% of 1RM, inferred from 8 reps at RIR 2 (a 10-rep "
                + "effort, Brzycki) is above the athlete's 70% cap for the shoulder"), over.get(0).message());
        assertTrue(over.get(0).fix().endsWith("any change to the cap is for the athlete's clinician to decide"));
        assertEquals(List.of(), run("75%", press), "at the cap is not above it");
    }

    @Test
    void aWeightIsComparedThroughTheKnownOneRepMaxInEitherUnit() {
        List<Finding> kg = run("75%", exercise("barbell-bench-press", "sets: 3\nreps: 5\nload: 80kg\nrir: 3\n"
                + "rest: 3min"));
        assertEquals(1, kg.size(), kg.toString());
        assertTrue(kg.get(0).message().contains("load 80% of 1RM (80kg) is above"), kg.get(0).message());
        // 1 lb = 0.45359237 kg (definition): 165lb = 74.8kg, 170lb = 77.1kg of a 100kg 1RM.
        assertEquals(List.of(), run("75%", exercise("barbell-bench-press", "sets: 3\nreps: 6\nload: 165lb\nrir: 3\n"
                + "rest: 3min")));
        assertEquals(1, run("75%", exercise("barbell-bench-press", "sets: 3\nreps: 6\nload: 170lb\nrir: 2\n"
                + "rest: 3min")).size());
    }

    @Test
    void onlyExercisesThatLoadTheRegionCount() {
        assertEquals(List.of(), run("50%", exercise("machine-leg-extension", "sets: 3\nreps: 6\nrir: 1\nrest: 2min"),
                exercise("barbell-bench-press", "sets: 4\nreps: 8\nload: 50%\nrir: 5\nrest: 3min")));
    }

    @Test
    void aLoadThatCannotBeToldIsAWarning() {
        List<Finding> findings = run("70%", exercise("barbell-bench-press", "sets: 4\nreps: 8\nrir: 2\nrest: 3min"),
                exercise("dumbbell-bench-press", "sets: 3\nreps: 10\nload: 24kg\nrest: 2min"));
        assertEquals(2, findings.size(), findings.toString());
        Finding unknown = findings.get(1);
        assertEquals(Severity.WARNING, unknown.severity());
        assertTrue(unknown.message().contains("the load cannot be checked against the athlete's 70% cap"),
                unknown.message());
        assertEquals("add dumbbell-bench-press to athlete.one-rep-max, or state rir: on these sets; any change to "
                + "the cap is for the athlete's clinician to decide", unknown.fix());
    }
}
