package dev.mesolint.core.model;

import static dev.mesolint.core.testing.SetBuilder.reps;
import static dev.mesolint.core.testing.TestProgrammes.exercise;
import static dev.mesolint.core.testing.TestProgrammes.oneSession;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.mesolint.core.testing.HarbourDemo;
import dev.mesolint.core.testing.SetBuilder;
import dev.mesolint.core.testing.TestExercises;
import java.util.List;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ProgrammeMetricsTests {

    private static SetMetrics only(SetBuilder set) {
        return ProgrammeMetrics.compute(oneSession(exercise("dumbbell-curl", List.of(set.build(1)))),
                TestExercises.CATALOGUE, ModelParameters.defaults()).weeks().get(0).sessions().get(0).sets().get(0);
    }

    // Common practice: a hard set ends at most 3 reps short of failure. RPE on the RIR-based scale of
    // Zourdos et al. 2016 (RPE 7 = 3 in reserve). Ranges count at their midpoint (project convention).
    @ParameterizedTest(name = "{0} reps, RIR {1}, RPE {2}: hard = {3}")
    @CsvSource({"8, 3, , true", "8, 4, , false", "8, 2-4, , true", "8, 3-5, , false", "8, , 7, true",
            "8, , 6.5, false", "8, 0, , true"})
    void aHardSetLeavesAtMostThreeRepsInReserve(String reps, String rir, String rpe, boolean hard) {
        SetBuilder set = reps(reps);
        if (rir != null) {
            set.rir(rir);
        }
        if (rpe != null) {
            set.rpe(rpe);
        }
        assertEquals(hard, only(set).hard());
    }

    @Test
    void aSetOfUnknownEffortIsNeverHardAndGivesNoStimulus() {
        SetMetrics set = only(reps("10"));
        assertEquals(false, set.hard());
        assertEquals(0, set.stimulatingReps());
        assertEquals(0, set.stimulus());
        assertEquals(EffortSource.UNKNOWN, set.effortSource());
    }

    @Test
    void computingInParallelGivesTheSameFiguresAsComputingOnce() {
        // Files are checked in parallel: the model must hold no shared mutable state.
        ProgrammeMetrics once = HarbourDemo.metrics();
        List<ProgrammeMetrics> parallel = IntStream.range(0, 32).parallel().mapToObj(i -> HarbourDemo.metrics())
                .toList();
        parallel.forEach(m -> assertEquals(once, m));
    }

    @Test
    void theFiguresCannotBeChangedAfterwards() {
        ProgrammeMetrics m = HarbourDemo.metrics();
        assertThrows(UnsupportedOperationException.class, () -> m.weeks().clear());
        assertThrows(UnsupportedOperationException.class, () -> m.weeks().get(0).muscles().clear());
        assertThrows(UnsupportedOperationException.class,
                () -> m.weeks().get(0).sessions().get(0).sets().get(0).fatigueBefore().clear());
    }
}
