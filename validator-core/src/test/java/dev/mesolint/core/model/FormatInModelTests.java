package dev.mesolint.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.format.CatalogueReader;
import dev.mesolint.core.format.FormatSchema;
import dev.mesolint.core.format.ProgrammeBinder;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.testing.Programmes;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlLimits;
import dev.mesolint.core.yaml.YamlProblem;
import java.util.List;
import org.junit.jupiter.api.Test;

/** What the model makes of the format's holds, carries, 5+ sets, ballistic lifts, tests and per-week 1RMs. */
class FormatInModelTests {
    private static final LocatedYamlReader READER = new LocatedYamlReader(YamlLimits.DEFAULTS);
    private static final Catalogue CATALOGUE = new CatalogueReader(READER, FormatSchema.load(FormatSchema.CATALOGUE))
            .builtIn();

    private static ProgrammeMetrics metrics(String text) throws YamlProblem {
        var doc = READER.read(text);
        assertEquals(List.of(), FormatSchema.load(FormatSchema.PROGRAMME).validate(doc));
        Programme p = new ProgrammeBinder().bind(doc).programme().orElseThrow();
        return ProgrammeMetrics.compute(p, CATALOGUE);
    }

    private static String weeks(String athlete, String... sessionsPerWeek) {
        StringBuilder sb = new StringBuilder(Programmes.HEADER).append(athlete).append("weeks:\n");
        for (int w = 0; w < sessionsPerWeek.length; w++) {
            sb.append("  - week: ").append(w + 1).append("\n    sessions:\n      - day: 1\n        work:\n")
                    .append(sessionsPerWeek[w].indent(10));
        }
        return sb.toString();
    }

    private static List<SetMetrics> sets(ProgrammeMetrics m, int week) {
        return m.week(week).orElseThrow().sessions().get(0).sets();
    }

    @Test
    void aHoldTakesItsTimeInTheSessionButIsNoHardSet() throws YamlProblem {
        ProgrammeMetrics with = metrics(weeks("", """
                - {exercise: cable-crunch, sets: 2, reps: 12, rir: 2, rest: 60s}
                - {exercise: plank, sets: 3, hold: 60s, rpe: 8, rest: 60s}
                """));
        ProgrammeMetrics without = metrics(weeks("", "- {exercise: cable-crunch, sets: 2, reps: 12, rir: 2, rest: 60s}\n"));
        SessionMetrics s = with.week(1).orElseThrow().sessions().get(0);
        SessionMetrics base = without.week(1).orElseThrow().sessions().get(0);
        // three 60 s holds with 60 s rests after the first two, and the rest after the crunches now counts
        double addedMinutes = s.minutes() - base.minutes();
        assertTrue(addedMinutes >= 5 - 1e-9, "holds and their rests take at least 5 minutes: " + addedMinutes);
        assertEquals(base.hardSets(Muscle.ABS), s.hardSets(Muscle.ABS), 1e-9, "the plank adds no hard set");
        assertTrue(s.sets().stream().noneMatch(set -> set.exerciseId().equals("plank")));
    }

    @Test
    void aCarryIsTimedAtWalkingPace() throws YamlProblem {
        double longer = metrics(weeks("", "- {exercise: farmer-carry, sets: 1, distance: 120m}\n"))
                .week(1).orElseThrow().sessions().get(0).minutes();
        SessionMetrics shorter = metrics(weeks("", "- {exercise: farmer-carry, sets: 1, distance: 60m}\n"))
                .week(1).orElseThrow().sessions().get(0);
        // 60 m more at about 1 m/s (from memory) is about one minute more
        assertEquals(1.0, longer - shorter.minutes(), 0.01);
        assertEquals(0.0, shorter.hardSets(Muscle.FOREARMS), 1e-9);
    }

    @Test
    void noRepsInReserveAreInferredFromTheLoadOfABallisticLift() throws YamlProblem {
        ProgrammeMetrics m = metrics(weeks("athlete:\n  one-rep-max: {power-clean: 100kg, barbell-back-squat: 150kg}\n",
                """
                - {exercise: power-clean, sets: 5, reps: 3, load: 80%, rest: 2min}
                - {exercise: barbell-back-squat, sets: 3, reps: 5, load: 80%, rest: 3min}
                """));
        SetMetrics clean = sets(m, 1).get(0);
        assertFalse(clean.effort().rir().isPresent(), "a power clean at 80% ends with a missed lift, not failure");
        assertEquals(0.8, clean.effort().loadFraction().getAsDouble(), 1e-9, "the load is still known");
        SetMetrics squat = sets(m, 1).get(5);
        // Brzycki (1993): reps to failure = 37 - 36 x share of 1RM; 80% gives 8.2, so 5 reps leave about 3.2
        assertEquals(3.2, squat.effort().rir().getAsDouble(), 0.05);
    }

    @Test
    void fivePlusIsAtLeastFiveRepsToFailure() throws YamlProblem {
        ProgrammeMetrics m = metrics(weeks("athlete:\n  one-rep-max: {barbell-back-squat: 150kg}\n", """
                - {exercise: barbell-back-squat, sets: 2, reps: 5+, load: 75%, rest: 3min}
                - {exercise: barbell-bench-press, sets: [{reps: 5+, load: 95%}], rest: 3min}
                """));
        List<SetMetrics> sets = sets(m, 1);
        assertEquals(5.0, sets.get(0).reps(), 1e-9, "the first set is a plain 5");
        // Brzycki (1993): 75% gives 37 - 27 = 10 reps to failure
        assertEquals(10.0, sets.get(1).reps(), 0.01);
        assertEquals(0.0, sets.get(1).rir().getAsDouble(), 1e-9);
        // 95% allows fewer than 5 reps to failure (Brzycki): the stated floor is what is done, to failure
        assertTrue(sets.get(2).reps() >= 5);
        assertEquals(0.0, sets.get(2).rir().getAsDouble(), 1e-9);
    }

    @Test
    void eachWeekReadsTheOneRepMaxInForceAndATestIsASingleAtTheMax() throws YamlProblem {
        String squat = "- {exercise: barbell-back-squat, sets: 3, reps: 5, load: 80kg, rest: 3min}\n";
        ProgrammeMetrics m = metrics(weeks("""
                athlete:
                  one-rep-max:
                    barbell-back-squat:
                      - {from-week: 1, load: 100kg}
                      - {from-week: 2, load: 110kg}
                """, squat, squat, "- {exercise: barbell-back-squat, warm-up: 5, sets: 1, test: 1rm}\n" + squat));
        assertEquals(0.8, sets(m, 1).get(0).effort().loadFraction().getAsDouble(), 1e-9);
        assertEquals(80 / 110.0, sets(m, 2).get(0).effort().loadFraction().getAsDouble(), 1e-9);
        SetMetrics test = sets(m, 3).get(0);
        assertEquals(1.0, test.effort().loadFraction().getAsDouble(), 1e-9);
        assertEquals(0.0, test.rir().getAsDouble(), 1e-9);
        assertEquals(110.0, test.effort().absoluteLoad().getAsDouble(), 1e-9, "tested against the max in force");
    }
}
