package dev.mesolint.core.model;

import static dev.mesolint.core.testing.SetBuilder.reps;
import static dev.mesolint.core.testing.TestProgrammes.exercise;
import static dev.mesolint.core.testing.TestProgrammes.programme;
import static dev.mesolint.core.testing.TestProgrammes.session;
import static dev.mesolint.core.testing.TestProgrammes.week;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.testing.TestExercises;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Acute:chronic ratio of weekly hard sets: this week over the mean of up to four weeks before (Gabbett 2016,
 * BJSM 50(5):273-280), and the change from the week before. Chest hard sets per week: 10, 10, 12, 12, 6 (deload),
 * 14; worked out by hand below.
 */
class TrendTests {

    private static ProgrammeMetrics metrics;

    private static Week chestWeek(int number, int sets, boolean deload) {
        return week(number, deload, session(1, "Push",
                exercise("cable-fly", reps("12").rir("2").times(sets))));
    }

    @BeforeAll
    static void compute() {
        metrics = ProgrammeMetrics.compute(programme(
                chestWeek(1, 10, false), chestWeek(2, 10, false), chestWeek(3, 12, false),
                chestWeek(4, 12, false), chestWeek(5, 6, true), chestWeek(6, 14, false)),
                TestExercises.CATALOGUE, ModelParameters.defaults());
    }

    // week 2: 10 / 10; week 3: 12 / mean(10, 10); week 4: 12 / mean(10, 10, 12) = 12 / 10.667;
    // week 5: 6 / mean(10, 10, 12, 12) = 6 / 11; week 6: 14 / mean(10, 12, 12, 6) = 14 / 10 (week 1 drops out).
    @ParameterizedTest(name = "week {0}: acute:chronic {1}")
    @CsvSource({"2, 1.0", "3, 1.2", "4, 1.125", "5, 0.545454", "6, 1.4"})
    void acuteChronicRatioUsesUpToFourWeeksBefore(int week, double ratio) {
        assertEquals(ratio, metrics.week(week).orElseThrow().acuteChronic(Muscle.CHEST).getAsDouble(), 1e-6);
    }

    // change: week 2: 0; week 3: +2/10; week 4: 0; week 5: -6/12; week 6: +8/6.
    @ParameterizedTest(name = "week {0}: change {1}")
    @CsvSource({"2, 0", "3, 0.2", "4, 0", "5, -0.5", "6, 1.333333"})
    void changeIsRelativeToTheWeekBefore(int week, double change) {
        assertEquals(change, metrics.week(week).orElseThrow().change(Muscle.CHEST).getAsDouble(), 1e-6);
    }

    @Test
    void theFirstWeekHasNoTrend() {
        WeekMetrics first = metrics.week(1).orElseThrow();
        assertTrue(first.acuteChronic().isEmpty());
        assertTrue(first.change().isEmpty());
    }

    @Test
    void deloadWeeksAreListed() {
        assertEquals(List.of(5), metrics.deloadWeeks());
    }

    @Test
    void aMuscleDroppedThisWeekShowsARatioOfZero() {
        ProgrammeMetrics m = ProgrammeMetrics.compute(programme(chestWeek(1, 10, false),
                week(2, session(1, "Pull", exercise("dumbbell-curl", reps("10").rir("1").times(4))))),
                TestExercises.CATALOGUE, ModelParameters.defaults());
        WeekMetrics second = m.week(2).orElseThrow();
        assertEquals(0, second.acuteChronic(Muscle.CHEST).getAsDouble(), 1e-9);
        assertEquals(-1, second.change(Muscle.CHEST).getAsDouble(), 1e-9);
        assertTrue(second.acuteChronic(Muscle.BICEPS).isEmpty(), "no chronic load to compare against");
    }
}
