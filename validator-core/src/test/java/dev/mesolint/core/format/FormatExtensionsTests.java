package dev.mesolint.core.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.catalogue.Role;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.source.Violation;
import dev.mesolint.core.testing.Programmes;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlLimits;
import dev.mesolint.core.yaml.YamlProblem;
import java.time.Duration;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/** Holds, carries, 5+, circuits of 12, roles, per-week and tested 1RMs: through the schema and the binder. */
class FormatExtensionsTests {
    private static final FormatSchema SCHEMA = FormatSchema.load(FormatSchema.PROGRAMME);
    private final LocatedYamlReader reader = new LocatedYamlReader(YamlLimits.DEFAULTS);

    private List<Violation> problems(String text) throws YamlProblem {
        LocatedDocument doc = reader.read(text);
        List<Violation> schema = SCHEMA.validate(doc);
        return schema.isEmpty() ? new ProgrammeBinder().bind(doc).violations() : schema;
    }

    private Programme bind(String text) throws YamlProblem {
        assertEquals(List.of(), problems(text));
        return new ProgrammeBinder().bind(reader.read(text)).programme().orElseThrow();
    }

    private static String oneSession(String work) {
        return Programmes.HEADER + """
                weeks:
                  - week: 1
                    sessions:
                      - day: 1
                        work:
                """ + work.indent(10);
    }

    private static ExerciseWork first(Programme p) {
        return (ExerciseWork) p.weeks().get(0).sessions().get(0).work().get(0);
    }

    @Test
    void aTimedHoldAndACarryAreSetsWithoutReps() throws YamlProblem {
        Programme p = bind(oneSession("""
                - {exercise: plank, sets: 3, hold: 30s, rest: 60s}
                - {exercise: farmer-carry, sets: 2, distance: 40m, rest: 90s}
                """));
        SetPrescription plank = first(p).sets().get(2);
        assertEquals(Optional.of(Duration.ofSeconds(30)), plank.hold());
        assertTrue(plank.holdOrCarry());
        assertTrue(plank.statesEffort(), "a hold needs no stated effort");
        assertEquals(1, plank.reps().max(), "one continuous effort");
        ExerciseWork carry = (ExerciseWork) p.weeks().get(0).sessions().get(0).work().get(1);
        assertEquals(40.0, carry.sets().get(0).distance().orElseThrow().metres());
        assertEquals(2, carry.sets().size());
    }

    @Test
    void repsAndAHoldOnOneSetAreRefusedWithAHint() throws YamlProblem {
        List<Violation> v = problems(oneSession("- {exercise: plank, sets: 3, reps: 10, hold: 30s}\n"));
        assertEquals(1, v.size(), v.toString());
        assertTrue(v.get(0).hint().contains("hold: 30s"), v.get(0).hint());
        assertEquals(1, problems(oneSession("- {exercise: plank, sets: 3, hold: 20min}\n")).size(), "10 min at most");
        assertEquals(1, problems(oneSession("- {exercise: farmer-carry, sets: 3, distance: 40yd}\n")).size());
        assertEquals(1, problems(oneSession("- {exercise: farmer-carry, sets: 3, distance: 500m}\n")).size());
    }

    @Test
    void aSetInAListThatStatesAHoldReplacesTheEntrysReps() throws YamlProblem {
        Programme p = bind(oneSession("""
                - exercise: plank
                  reps: 1
                  rpe: 7
                  sets:
                    - {hold: 45s}
                    - {}
                """));
        assertEquals(Optional.of(Duration.ofSeconds(45)), first(p).sets().get(0).hold());
        assertTrue(first(p).sets().get(1).hold().isEmpty());
    }

    @Test
    void fivePlusOnAnEntryMakesOnlyItsLastSetAnAmrapWithAFloor() throws YamlProblem {
        // common practice: "3 x 5+" = two sets of 5 and a last set of as many as possible, at least 5
        Programme p = bind(oneSession("- {exercise: barbell-back-squat, sets: 3, reps: 5+, load: 85%, rest: 4min}\n"));
        List<SetPrescription> sets = first(p).sets();
        assertEquals("5", sets.get(0).reps().toString());
        assertFalse(sets.get(1).reps().amrap());
        assertEquals("5+", sets.get(2).reps().toString());
        assertTrue(sets.get(2).reps().hasFloor());
        assertEquals(5, sets.get(2).reps().min());
    }

    @Test
    void aRepeatedWeekShiftsTheFloorOfAFivePlusSetButNotAHold() throws YamlProblem {
        Programme p = bind(Programmes.HEADER + """
                weeks:
                  - week: 1
                    sessions:
                      - day: 1
                        work:
                          - {exercise: barbell-bench-press, sets: [{reps: 5+, load: 80%}], rest: 3min}
                          - {exercise: plank, sets: 2, hold: 30s}
                  - week: 2
                    repeat: 1
                    adjust: {reps: -2}
                """);
        Week w2 = p.weeks().get(1);
        assertEquals("3+", ((ExerciseWork) w2.sessions().get(0).work().get(0)).sets().get(0).reps().toString());
        SetPrescription plank = ((ExerciseWork) w2.sessions().get(0).work().get(1)).sets().get(0);
        assertEquals(1, plank.reps().max());
        assertEquals(Optional.of(Duration.ofSeconds(30)), plank.hold());
    }

    @Test
    void aCircuitTakesTwelveStationsAndNotThirteen() throws YamlProblem {
        String twelve = circuit(12);
        Programme p = bind(oneSession(twelve));
        Superset s = (Superset) p.weeks().get(0).sessions().get(0).work().get(0);
        assertEquals(12, s.items().size());
        List<Violation> v = problems(oneSession(circuit(13)));
        assertEquals(1, v.size(), v.toString());
    }

    private static String circuit(int stations) {
        String items = IntStream.rangeClosed(1, stations)
                .mapToObj(i -> "      - {exercise: machine-leg-press, reps: 12, rir: 3, rest: 30s}")
                .collect(Collectors.joining("\n"));
        return "- superset:\n    rounds: 2\n    rest: 2min\n    items:\n" + items + "\n";
    }

    @Test
    void aRoleWrittenOnTheEntryWinsOverTheCatalogueDefault() throws YamlProblem {
        Programme p = bind(oneSession("""
                - {exercise: barbell-romanian-deadlift, role: main, sets: 3, reps: 6, rir: 2, rest: 3min}
                - {exercise: barbell-back-squat, sets: 3, reps: 5, rir: 2, rest: 3min}
                """));
        assertEquals(Optional.of(Role.MAIN), first(p).role());
        ExerciseWork squat = (ExerciseWork) p.weeks().get(0).sessions().get(0).work().get(1);
        assertEquals(Optional.empty(), squat.role());
    }

    @Test
    void perWeekOneRepMaxesApplyFromTheirWeekOn() throws YamlProblem {
        Programme p = bind(Programmes.HEADER + """
                athlete:
                  one-rep-max:
                    barbell-bench-press: 100kg
                    barbell-back-squat:
                      - {from-week: 1, load: 90kg}
                      - {from-week: 3, load: 105kg}
                weeks:
                """ + weeks(4, "- {exercise: barbell-back-squat, sets: 3, reps: 5, load: 70kg, rest: 4min}"));
        var athlete = p.athlete();
        assertEquals(90.0, athlete.oneRepMax("barbell-back-squat").orElseThrow().amount(), "the first stated");
        assertEquals(90.0, athlete.oneRepMax("barbell-back-squat", 2, 5).orElseThrow().amount());
        assertEquals(105.0, athlete.oneRepMax("barbell-back-squat", 3, 1).orElseThrow().amount());
        assertEquals(105.0, athlete.atSession(4, 1).oneRepMax("barbell-back-squat").orElseThrow().amount());
        assertEquals(100.0, athlete.oneRepMax("barbell-bench-press", 4, 1).orElseThrow().amount(), "one value, all block");
        assertEquals(LoadUnit.KG, athlete.oneRepMax("barbell-back-squat", 1, 1).orElseThrow().unit());
    }

    @Test
    void perWeekOneRepMaxesOutOfOrderOrPastTheBlockAreRefused() throws YamlProblem {
        String base = Programmes.HEADER + """
                athlete:
                  one-rep-max:
                    barbell-back-squat:
                      - {from-week: 3, load: 105kg}
                      - {from-week: 2, load: 90kg}
                      - {from-week: 9, load: 120kg}
                weeks:
                """ + weeks(4, "- {exercise: barbell-back-squat, sets: 3, reps: 5, load: 70kg, rest: 4min}");
        List<Violation> v = problems(base);
        assertEquals(2, v.size(), v.toString());
        assertTrue(v.get(0).message().contains("from-week 2 must come after week 3"), v.get(0).message());
        assertTrue(v.get(1).message().contains("after the last week (4)"), v.get(1).message());
    }

    @Test
    void afterATestAPercentageRefersToTheTestedOneRepMaxWhoseValueIsUnknown() throws YamlProblem {
        Programme p = bind(Programmes.HEADER + """
                athlete:
                  one-rep-max:
                    barbell-deadlift:
                      - {from-week: 1, load: 200kg}
                      - {from-week: 4, load: 215kg}
                weeks:
                  - week: 1
                    sessions:
                      - day: 1
                        work:
                          - {exercise: barbell-deadlift, sets: 3, reps: 3, load: 85%, rest: 4min}
                  - week: 2
                    sessions:
                      - day: 2
                        work:
                          - {exercise: barbell-deadlift, warm-up: 5, sets: 1, test: 1rm}
                      - day: 5
                        work:
                          - {exercise: barbell-deadlift, sets: 3, reps: 3, load: 80%, rest: 4min}
                  - week: 3
                    repeat: 1
                  - week: 4
                    repeat: 1
                """);
        var athlete = p.athlete();
        SetPrescription test = ((ExerciseWork) p.weeks().get(1).sessions().get(0).work().get(0)).sets().get(0);
        assertTrue(test.test());
        assertEquals(1, test.reps().max(), "reps: 1 may be left out on a test");
        assertEquals(200.0, athlete.oneRepMax("barbell-deadlift", 2, 2).orElseThrow().amount(), "the test day itself");
        assertEquals(Optional.empty(), athlete.oneRepMax("barbell-deadlift", 2, 5), "after the test: not known");
        assertEquals(Optional.empty(), athlete.oneRepMax("barbell-deadlift", 3, 1));
        assertEquals(215.0, athlete.oneRepMax("barbell-deadlift", 4, 1).orElseThrow().amount(), "restated");
        assertTrue(athlete.steps("barbell-deadlift").get(1).tested());
    }

    @Test
    void aTestIsASingle() throws YamlProblem {
        List<Violation> v = problems(oneSession("- {exercise: barbell-deadlift, sets: 1, reps: 3, test: 1rm}\n"));
        assertEquals(1, v.size(), v.toString());
        assertTrue(v.get(0).message().contains("one rep"), v.get(0).message());
        assertEquals(1, problems(oneSession("- {exercise: plank, sets: 1, hold: 30s, test: 1rm}\n")).size());
        assertEquals(1, problems(oneSession("- {exercise: barbell-deadlift, sets: 1, test: 3rm}\n")).size());
    }

    @Test
    void aSingleOneRepMaxStillLoads() throws YamlProblem {
        Programme p = bind(Programmes.HEADER + """
                athlete:
                  one-rep-max: {barbell-back-squat: 140kg}
                weeks:
                """ + weeks(1, "- {exercise: barbell-back-squat, sets: 3, reps: 5, load: 80%, rest: 4min}"));
        assertEquals(new Load.Absolute(140, LoadUnit.KG), p.athlete().oneRepMax("barbell-back-squat", 1, 1).orElseThrow());
        assertEquals(List.of(), p.athlete().steps("barbell-back-squat"));
    }

    private static String weeks(int count, String work) {
        StringBuilder sb = new StringBuilder();
        for (int w = 1; w <= count; w++) {
            sb.append("  - week: ").append(w).append("\n    sessions:\n      - day: 1\n        work:\n          ")
                    .append(work).append('\n');
        }
        return sb.toString();
    }
}
