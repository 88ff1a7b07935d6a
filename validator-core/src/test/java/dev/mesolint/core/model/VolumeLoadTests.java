package dev.mesolint.core.model;

import static dev.mesolint.core.testing.SetBuilder.reps;
import static dev.mesolint.core.testing.TestProgrammes.exercise;
import static dev.mesolint.core.testing.TestProgrammes.programme;
import static dev.mesolint.core.testing.TestProgrammes.session;
import static dev.mesolint.core.testing.TestProgrammes.week;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.Technique;
import dev.mesolint.core.testing.TestExercises;
import dev.mesolint.core.testing.TestProgrammes;
import dev.mesolint.core.value.LoadUnit;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Volume load = reps x weight, in the programme's unit, worked out by hand. */
class VolumeLoadTests {

    private static WeekMetrics fullBodyWeek(Athlete athlete, LoadUnit units) {
        Programme p = programme(athlete, units, week(1, session(1, "Full body",
                exercise("barbell-bench-press", reps("5").rir("2").load("80%").times(3)),
                exercise("barbell-row", reps("10").rir("2").load("60kg").times(2)),
                exercise("dumbbell-curl", reps("12").rir("2").times(2)))));
        return ProgrammeMetrics.compute(p, TestExercises.CATALOGUE, ModelParameters.defaults()).weeks().get(0);
    }

    @Test
    void weightsAndSharesOfAKnownOneRepMaxAddUp() {
        Athlete athlete = TestProgrammes.athleteWithOneRepMax("barbell-bench-press", 100, LoadUnit.KG);
        // Bench 3 x 5 x 80 kg (80% of 100) = 1200; row 2 x 10 x 60 = 1200; curls have no load. 2400 kg.
        assertEquals(2400, fullBodyWeek(athlete, LoadUnit.KG).volumeLoad(), 1e-9);
    }

    @Test
    void aShareOfAnUnknownOneRepMaxAddsNothing() {
        // Row only: 2 x 10 x 60 = 1200 kg.
        WeekMetrics w = fullBodyWeek(Athlete.NONE, LoadUnit.KG);
        assertEquals(1200, w.volumeLoad(), 1e-9);
        assertTrue(w.sessions().get(0).sets().get(0).volumeLoad().isEmpty());
    }

    @Test
    void volumeLoadIsInTheProgrammesUnit() {
        Athlete athlete = TestProgrammes.athleteWithOneRepMax("barbell-bench-press", 100, LoadUnit.KG);
        // 1 lb = 0.45359237 kg exactly (international yard and pound agreement, 1959): 2400 kg = 5291.09 lb.
        assertEquals(2400 / 0.45359237, fullBodyWeek(athlete, LoadUnit.LB).volumeLoad(), 1e-6);
    }

    @Test
    void aDropSetsDropsCountAtTheirLighterLoads() {
        Programme p = programme(week(1, session(1, "Arms", exercise("dumbbell-curl",
                List.of(reps("10").rir("0").load("20kg").technique(Technique.DROP_SET).build(1))))));
        double volume = ProgrammeMetrics.compute(p, TestExercises.CATALOGUE, ModelParameters.defaults())
                .weeks().get(0).volumeLoad();
        // Two drops of 20% each (common practice): 10 x 20 kg + 6 x 16 kg + 6 x 12.8 kg = 200 + 96 + 76.8 = 372.8 kg.
        assertEquals(372.8, volume, 1e-9);
    }
}
