package dev.mesolint.core.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.reference.RuleExample;
import dev.mesolint.core.testing.FixtureHarness;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;

/**
 * The wording of each new rule's finding: what was measured, the limit, where (exercise, week, day, set) and a
 * concrete fix. Where the fixtures only fix the lines, these fix the words.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class RuleMessagesTests {
    private Map<Path, FileReport> reports;

    @BeforeAll
    void check() throws IOException {
        List<RuleExample> examples = new ArrayList<>();
        for (String f : List.of("short-rest-compound/failing.yaml", "short-rest-compound/failing-strength.yaml",
                "short-rest-compound/failing-superset.yaml", "short-rest-compound/failing-deload-week.yaml",
                "short-rest-isolation/failing.yaml",
                "fatigue-technique/failing.yaml", "fatigue-technique/failing-general-fitness.yaml",
                "unstable-surface/failing.yaml", "slow-concentric/failing.yaml", "constraint-avoid/failing.yaml",
                "no-deload/failing.yaml", "volume-spike/failing.yaml", "intensity-jump/failing.yaml")) {
            examples.add(RuleExample.read(FixtureHarness.FIXTURES.resolve(f)));
        }
        reports = FixtureHarness.check(examples, BuiltInRules.all());
    }

    /** The active findings of {@code ruleId} in the fixture, in report order: other rules' findings are not picked. */
    private List<Finding> found(String fixture, String ruleId) {
        return reports.get(FixtureHarness.FIXTURES.resolve(fixture)).active().stream()
                .filter(f -> f.ruleId().equals(ruleId)).toList();
    }

    private static String text(Finding f) {
        return f.severity().label() + " " + f.message() + " (fix: " + f.fix() + ")";
    }

    @Test
    void shortRestCompound() {
        // ACSM 2009 position stand (Ratamess et al., MSSE 41(3):687-708): >= 2-3 min for heavy core lifts
        assertEquals("warning barbell-back-squat, week 1 day 1 (Lower), sets 1 -> 2, 2 -> 3, 3 -> "
                + "machine-leg-extension: rest 75 s, the hypertrophy profile asks for at least 120 s after compound "
                + "sets (fix: rest: 2min)", text(found("short-rest-compound/failing.yaml", ShortRestCompoundRule.ID)
                        .get(0)));
        // Schoenfeld et al. 2016 JSCR 30(7):1805-1812: 3 min beat 1 min for strength and thigh thickness
        assertEquals("warning barbell-romanian-deadlift, week 1 day 1, sets 1 -> 2, 2 -> 3, 3 -> "
                + "barbell-bent-over-row: rest 150 s, the strength profile asks for at least 180 s after main squat "
                + "and hinge sets (fix: rest: 3min)", text(found("short-rest-compound/failing-strength.yaml",
                ShortRestCompoundRule.ID).get(0)));
        List<Finding> superset = found("short-rest-compound/failing-superset.yaml", ShortRestCompoundRule.ID);
        assertEquals(List.of("warning chest-supported-dumbbell-row, week 1 day 1, rounds 1 -> 2, 2 -> 3: rest 90 s (60 s "
                + "after the round + 30 s of changeovers), the hypertrophy profile asks for at least 120 s after "
                + "compound sets (fix: rest: 2min on the superset, the rest after each round)",
                "warning dumbbell-bench-press, week 1 day 1, rounds 1 -> 2, 2 -> 3: rest 90 s (60 s after the "
                        + "round + 30 s of changeovers), the hypertrophy profile asks for at least 120 s after "
                        + "compound sets (fix: rest: 2min on the superset, the rest after each round)"),
                superset.stream().map(RuleMessagesTests::text).sorted().toList());
    }

    @Test
    void weeksWithDifferentSetsAreReportedApart() {
        assertEquals(List.of("barbell-bench-press, week 1 day 1, sets 1 -> 2, 2 -> 3, 3 -> cable-triceps-pushdown: "
                + "rest 90 s, the hypertrophy profile asks for at least 120 s after compound sets",
                "barbell-bench-press, week 2 day 1, sets 1 -> 2, 2 -> cable-triceps-pushdown: rest 90 s, the "
                        + "hypertrophy profile asks for at least 120 s after compound sets"),
                found("short-rest-compound/failing-deload-week.yaml", ShortRestCompoundRule.ID).stream()
                        .map(Finding::message).toList());
    }

    @Test
    void shortRestIsolation() {
        // Singer et al. 2024 Front Sports Act Living 6:1429789: small benefit above 60 s
        assertEquals("info dumbbell-curl, week 1 day 1, sets 1 -> 2, 2 -> 3, 3 -> dumbbell-lateral-raise: rest 30 s, "
                + "the hypertrophy profile asks for at least 60 s after isolation sets (fix: rest: 1min)",
                text(found("short-rest-isolation/failing.yaml", ShortRestIsolationRule.ID).get(0)));
    }

    @Test
    void fatigueTechnique() {
        // Fink et al. 2018 (J Sports Med Phys Fitness 58(5):597-605) and Coleman et al. 2022 (meta-analysis): drop
        // sets grow muscle about as well as straight sets in less time; the finding is the fatigue they leave the
        // next set (recruitment figure: the model, docs/model.md; the 90% threshold: project convention)
        List<Finding> f = found("fatigue-technique/failing.yaml", FatigueTechniqueRule.ID);
        assertEquals(3, f.size());
        assertEquals("warning machine-chest-press, week 1 day 1: done right after dumbbell-chest-fly in a superset, "
                + "and both have chest as prime mover: each set starts with that muscle already tired, adding "
                + "fatigue for less stimulus; the hypertrophy profile reports such pairs (fix: pair exercises for "
                + "different muscles (e.g. a push with a pull), or do them as straight sets with rest)",
                text(f.get(0)));
        assertTrue(text(f.get(1)).matches("warning cable-chest-fly, week 1 day 1, set 1: drop set: its mini-sets to "
                + "failure grow muscle about as well as more straight sets, in less time, but leave extra fatigue: "
                + "the next chest set \\(cable-chest-fly set 2\\) starts at [0-8]\\d(\\.\\d)?% of a fresh set's "
                + "recruitment; the hypertrophy profile reports techniques whose next chest set starts under 90% "
                + "\\(fix: put the drop set on the last chest set of the session, rest longer after it, or remove "
                + "technique: drop-set\\)"), text(f.get(1)));
        assertTrue(text(f.get(2)).startsWith("warning cable-chest-fly, week 1 day 1, set 2: rest-pause: "),
                text(f.get(2)));
        assertEquals(Severity.INFO, found("fatigue-technique/failing-general-fitness.yaml",
                FatigueTechniqueRule.ID).get(0).severity());
    }

    @Test
    void unstableSurface() {
        // Behm, Drinkwater, Willardson & Cowley 2010, CSEP position stand, Appl Physiol Nutr Metab 35(1):109-112
        assertEquals("warning stability-ball-dumbbell-press, weeks 1-2 day 1: done on an unstable surface "
                + "(catalogue stability: unstable): balance demand caps how hard chest can be driven, so the "
                + "hypertrophy profile reports it as low-yield for hypertrophy and strength (fix: use a stable "
                + "version such as dumbbell-bench-press, or waive this rule with the reason if balance work is the "
                + "aim)", text(found("unstable-surface/failing.yaml", UnstableSurfaceRule.ID).get(0)));
    }

    @Test
    void slowConcentric() {
        assertEquals("info barbell-bench-press, week 1 day 1, sets 1-3: tempo 3-0-5-0 lifts in 5 s, at or over the "
                + "4 s the hypertrophy profile reports: a slow lift lowers the load and the effort per rep, it does "
                + "not add stimulus (fix: tempo: 3-0-1-0 (lift with control, as fast as the load allows))",
                text(found("slow-concentric/failing.yaml", SlowConcentricRule.ID).get(0)));
    }

    @Test
    void constraintAvoidNamesTheReasonAndDefersToTheClinician() {
        assertEquals("error barbell-upright-row, weeks 1-2 day 1: the athlete's constraint athlete.constraints[0] "
                + "excludes this exercise (reason given: Pinching at the front of the shoulder in that position; "
                + "physiotherapist's advice.) (fix: remove it or swap it for an exercise the athlete's clinician "
                + "has cleared; their advice comes before any general guidance)",
                text(found("constraint-avoid/failing.yaml", ConstraintAvoidRule.ID).get(0)));
    }

    @Test
    void noDeload() {
        assertEquals("info weeks 1-8: 8 weeks in a row without a deload week, more than the 6 the hypertrophy "
                + "profile allows for an intermediate lifter (fix: add deload: true to week 7 (or an earlier "
                + "one), with fewer sets or more reps in reserve in it)", text(found("no-deload/failing.yaml",
                NoDeloadRule.ID).get(0)));
    }

    @Test
    void volumeSpike() {
        // Gabbett 2016, BJSM 50(5):273-280: the week against the mean of the (up to four) weeks before, 1.5 x;
        // sets as the volume measure: Schoenfeld et al. 2017, J Sports Sci 35(11):1073-1082
        assertEquals("warning chest, week 3: 16 working sets with chest as prime mover, 2 x the mean of weeks 1-2 "
                + "(8); the hypertrophy profile flags weeks over 1.5 x that mean (fix: raise chest volume in steps: "
                + "at most 12 working sets this week)", text(found("volume-spike/failing.yaml", VolumeSpikeRule.ID)
                        .get(0)));
    }

    @Test
    void intensityJump() {
        // ACSM 2009 position stand (Ratamess et al., MSSE 41(3):687-708): load increments of 2-10%
        assertEquals("warning barbell-bench-press, week 2 day 1 (Upper): top set 90% of 1RM, 12.5 points over the "
                + "77.5% of week 1 day 1 (Upper); the hypertrophy profile flags rises over 10 points (fix: load: "
                + "87.5% for the top set this session, and the rest of the rise next time)", text(found("intensity-jump/failing.yaml",
                        IntensityJumpRule.ID).get(0)));
    }
}
