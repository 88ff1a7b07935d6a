package dev.mesolint.core.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.testing.Programmes;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.RirRange;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlLimits;
import dev.mesolint.core.yaml.YamlProblem;
import java.util.List;
import org.junit.jupiter.api.Test;

class WeekExpansionTests {
    private static final String BLOCK = Programmes.HEADER + """
            weeks:
              - week: 1
                sessions:
                  - day: 1
                    work:
                      - exercise: barbell-back-squat
                        sets: 3
                        reps: 5
                        load: 80%
                        rest: 3min
                      - exercise: dumbbell-lateral-raise
                        sets:
                          - {reps: 12, rir: 2, rest: 90s}
                          - {reps: 12, rir: 1, rest: 90s}
                  - day: 4
                    work:
                      - exercise: barbell-bench-press
                        sets: 3
                        reps: 8
                        rpe: 8
                        rest: 3min
              - week: 2
                repeat: 1
                adjust: {rir: -1, sets: 1, load: +2.5%}
              - week: 3
                repeat: 2
                adjust: {sets: -2, only: [barbell-back-squat]}
                sessions:
                  - day: 6
                    work:
                      - exercise: cable-curl
                        sets: 2
                        reps: 12
                        rir: 1
                        rest: 60s
              - week: 4
                repeat: 1
                deload: true
                adjust: {rir: 2, sets: -1}
            """;

    private static Programme bind(String text) throws YamlProblem {
        ProgrammeBinder.Result r = new ProgrammeBinder().bind(new LocatedYamlReader(YamlLimits.DEFAULTS).read(text));
        assertEquals(List.of(), r.violations());
        return r.programme().orElseThrow();
    }

    private static ExerciseWork exercise(Week week, int day, String id) {
        return week.sessions().stream().filter(s -> s.day() == day).flatMap(s -> s.work().stream())
                .map(ExerciseWork.class::cast).filter(e -> e.exerciseId().equals(id)).findFirst().orElseThrow();
    }

    @Test
    void aRepeatedWeekCopiesSessionsAndAppliesTheChanges() throws YamlProblem {
        Programme p = bind(BLOCK);
        Week w2 = p.weeks().get(1);
        assertEquals(2, w2.sessions().size());
        ExerciseWork squat = exercise(w2, 1, "barbell-back-squat");
        assertEquals(4, squat.sets().size(), "sets: +1");
        assertEquals(0.825, ((Load.Relative) squat.sets().get(0).load().orElseThrow()).fraction(), 1e-9);
        ExerciseWork raise = exercise(w2, 1, "dumbbell-lateral-raise");
        assertEquals(List.of(RirRange.of(1), RirRange.of(0), RirRange.of(0)),
                raise.sets().stream().map(s -> s.rir().orElseThrow()).toList(), "rir -1, and the added set copies the last");
        // rir -1 on an RPE set means one rep closer to failure: RPE 8 -> 9
        assertEquals(9.0, exercise(w2, 4, "barbell-bench-press").sets().get(0).rpe().orElseThrow().value());
    }

    @Test
    void expandedSetsPointAtTheLinesThatWroteThem() throws YamlProblem {
        Programme p = bind(BLOCK);
        SetPrescription w1Raise = exercise(p.weeks().get(0), 1, "dumbbell-lateral-raise").sets().get(1);
        SetPrescription w2Raise = exercise(p.weeks().get(1), 1, "dumbbell-lateral-raise").sets().get(1);
        assertEquals(21, w1Raise.location().line());
        assertEquals(w1Raise.location(), w2Raise.location());
        assertEquals(13, exercise(p.weeks().get(1), 1, "barbell-back-squat").sets().get(3).location().line());
    }

    @Test
    void repeatsChainAndOnlyLimitsTheChanges() throws YamlProblem {
        Week w3 = bind(BLOCK).weeks().get(2);
        assertEquals(List.of(1, 4, 6), w3.sessions().stream().map(s -> s.day()).toList(), "a new day is added in order");
        assertEquals(2, exercise(w3, 1, "barbell-back-squat").sets().size(), "4 sets in week 2, then -2");
        assertEquals(3, exercise(w3, 1, "dumbbell-lateral-raise").sets().size(), "not in 'only': unchanged");
        assertEquals(0.825, ((Load.Relative) exercise(w3, 1, "barbell-back-squat").sets().get(0).load().orElseThrow())
                .fraction(), 1e-9, "week 2's load carries into week 3");
    }

    @Test
    void aDeloadWeekRepeatsWithFewerSetsFurtherFromFailure() throws YamlProblem {
        Week w4 = bind(BLOCK).weeks().get(3);
        assertTrue(w4.deload());
        assertEquals(2, exercise(w4, 1, "barbell-back-squat").sets().size());
        ExerciseWork raise = exercise(w4, 1, "dumbbell-lateral-raise");
        assertEquals(1, raise.sets().size(), "never below one set");
        assertEquals(RirRange.of(4), raise.sets().get(0).rir().orElseThrow());
    }

    @Test
    void repeatingALaterOrMissingWeekIsAViolation() throws YamlProblem {
        String text = Programmes.oneWeek() + """
                  - week: 2
                    repeat: 5
                """;
        ProgrammeBinder.Result r = new ProgrammeBinder().bind(new LocatedYamlReader(YamlLimits.DEFAULTS).read(text));
        assertTrue(r.programme().isEmpty());
        assertEquals(1, r.violations().size());
        assertEquals(20, r.violations().get(0).location().line());
        assertTrue(r.violations().get(0).message().contains("repeats week 5"));
    }

    @Test
    void aTechniqueOnAnEntryBelongsToItsLastSet() throws YamlProblem {
        Programme p = bind(Programmes.oneWeek().replace("rest: 3min", "rest: 3min\n            technique: drop-set"));
        List<SetPrescription> sets = exercise(p.weeks().get(0), 1, "barbell-bench-press").sets();
        assertEquals(List.of(false, false, true), sets.stream().map(s -> s.technique().isPresent()).toList());
    }
}
