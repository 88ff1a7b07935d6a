package dev.mesolint.core.model;

import static dev.mesolint.core.testing.SetBuilder.reps;
import static dev.mesolint.core.testing.TestProgrammes.exercise;
import static dev.mesolint.core.testing.TestProgrammes.oneSession;
import static dev.mesolint.core.testing.TestProgrammes.superset;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.mesolint.core.programme.Technique;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.testing.TestExercises;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Session minutes worked out by hand with the documented defaults: 4 s per rep without a tempo (common practice),
 * 1.5 min per warm-up set, 1 min changeover per exercise, 15 s between superset items, no rest after the session's
 * last set.
 */
class SessionMinutesTests {

    private static double minutes(WorkItem... work) {
        return ProgrammeMetrics.compute(oneSession(work), TestExercises.CATALOGUE, ModelParameters.defaults())
                .weeks().get(0).sessions().get(0).minutes();
    }

    @Test
    void straightSetsWithAWarmUpAndATempo() {
        double minutes = minutes(
                exercise("barbell-bench-press", 1, reps("8").rir("2").rest("2min").times(3)),
                exercise("dumbbell-curl", reps("12").rir("1").rest("60s").tempo("2-0-1-0").times(2)));
        // Bench: changeover 1 + one warm-up 1.5 = 2.5 min; reps 3 x 8 x 4 s = 96 s = 1.6 min;
        //        rest 3 x 2 min = 6 min (the curl follows, so the last bench set rests too).
        // Curl:  changeover 1 min; reps 2 x 12 x 3 s (2-0-1-0) = 72 s = 1.2 min; rest after set 1 only = 1 min.
        // Total: 2.5 + 1.6 + 6 + 1 + 1.2 + 1 = 13.3 min.
        assertEquals(13.3, minutes, 1e-9);
    }

    @Test
    void aSupersetRestsAfterEachRoundAndChangesOverWithinIt() {
        double minutes = minutes(superset("90s",
                exercise("barbell-bench-press", reps("10").rir("1").times(2)),
                exercise("barbell-row", reps("10").rir("1").times(2))));
        // Changeovers 2 x 1 min = 120 s; reps 4 sets x 10 x 4 s = 160 s;
        // round 1: 15 s between items + 90 s after; round 2: 15 s, then the session ends = 120 s. 400 s in all.
        assertEquals(400 / 60.0, minutes, 1e-9);
    }

    @Test
    void aDropSetAddsItsLoadChangeAndExtraReps() {
        double minutes = minutes(exercise("dumbbell-curl",
                List.of(reps("10").rir("0").technique(Technique.DROP_SET).build(1))));
        // Changeover 60 s; 10 reps x 4 s = 40 s; then two drops, each 10 s to change the load and 6 reps x 4 s = 24 s.
        // 60 + 40 + 2 x 34 = 168 s.
        assertEquals(168 / 60.0, minutes, 1e-9);
    }

    @Test
    void restPauseAddsItsPausesAndMiniSets() {
        double minutes = minutes(exercise("dumbbell-curl",
                List.of(reps("10").rir("0").technique(Technique.REST_PAUSE).build(1))));
        // Changeover 60 s; 10 reps x 4 s = 40 s; two mini-sets of 20 s pause + 3 reps x 4 s = 64 s. 164 s.
        assertEquals(164 / 60.0, minutes, 1e-9);
    }

    @Test
    void setsWithoutAStatedRestUseTheDefault() {
        double minutes = minutes(exercise("dumbbell-curl", reps("10").rir("1").times(2)));
        // Changeover 60 s; 2 x 10 x 4 s = 80 s; one default rest of 120 s. 260 s.
        assertEquals(260 / 60.0, minutes, 1e-9);
    }

    @Test
    void setsOfAnExerciseMissingFromTheCatalogueStillTakeTime() {
        double minutes = minutes(exercise("harbourside-mystery-press", reps("10").rir("1").rest("1min").times(2)));
        // Changeover 60 s; 2 x 10 x 4 s = 80 s; one rest of 60 s. 200 s.
        assertEquals(200 / 60.0, minutes, 1e-9);
    }
}
