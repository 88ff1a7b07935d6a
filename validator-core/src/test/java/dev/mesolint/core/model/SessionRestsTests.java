package dev.mesolint.core.model;

import static dev.mesolint.core.testing.SetBuilder.reps;
import static dev.mesolint.core.testing.TestProgrammes.exercise;
import static dev.mesolint.core.testing.TestProgrammes.session;
import static dev.mesolint.core.testing.TestProgrammes.superset;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.WorkItem;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/**
 * The rests the rest rules judge come from the model's session plan (docs/model.md, "Order within a session"): the
 * written rest after straight sets, the round's rest plus the changeovers for a superset (15 s for a changeover
 * that is not written, {@code supersetChangeoverSeconds}, common practice), nothing after the session's last set.
 */
class SessionRestsTests {

    private static List<RestGap> rests(WorkItem... work) {
        return SessionRests.of(session(1, "Session A", work), ModelParameters.defaults());
    }

    @Test
    void straightSetsRestAfterEachSetAndTheLastSetOnlyWhenMoreWorkFollows() {
        ExerciseWork bench = exercise("barbell-bench-press", reps("8").rir("2").rest("2min").times(3));
        ExerciseWork curl = exercise("dumbbell-curl", reps("12").rir("1").rest("60s").times(2));
        List<RestGap> gaps = rests(bench, curl);
        // Bench 1 -> 2, 2 -> 3, 3 -> curl; curl 1 -> 2; the curl's last set ends the session.
        assertEquals(4, gaps.size());
        assertEquals(List.of(1, 2, 3, 1), gaps.stream().map(RestGap::position).toList());
        assertEquals(curl, gaps.get(2).following().orElseThrow());
        assertTrue(gaps.get(1).following().isEmpty());
        assertEquals(OptionalDouble.of(120), gaps.get(0).seconds());
        assertEquals(OptionalDouble.of(60), gaps.get(3).seconds());
    }

    @Test
    void aRestTheProgrammeDoesNotWriteIsUnknownNotTheModelsDefault() {
        List<RestGap> gaps = rests(exercise("barbell-bench-press", reps("8").rir("2").times(2)),
                exercise("dumbbell-curl", reps("12").rir("1").times(1)));
        assertEquals(2, gaps.size());
        assertTrue(gaps.stream().allMatch(g -> g.seconds().isEmpty()));
    }

    @Test
    void aSupersetItemGetsTheRoundsRestPlusTheChangeoversWrittenOrNot() {
        Superset written = superset("60s",
                exercise("barbell-bench-press", reps("10").rir("2").rest("30s").times(3)),
                exercise("barbell-row", reps("10").rir("2").times(3)));
        List<RestGap> gaps = rests(written);
        // Rounds 1 -> 2 and 2 -> 3, each for both items; the last round ends the session.
        assertEquals(4, gaps.size());
        assertTrue(gaps.stream().allMatch(g -> g.seconds().equals(OptionalDouble.of(90))
                && g.changeoverSeconds() == 30 && g.superset().orElseThrow() == written));
        assertEquals(List.of(1, 1, 2, 2), gaps.stream().map(RestGap::position).toList());

        List<RestGap> unwritten = rests(superset("60s",
                exercise("barbell-bench-press", reps("10").rir("2").times(2)),
                exercise("barbell-row", reps("10").rir("2").times(2))),
                exercise("dumbbell-curl", reps("12").rir("1").times(1)));
        // The 15 s changeover the model's clock spends between the items counts; the last round leads to the curl.
        assertEquals(4, unwritten.size());
        assertTrue(unwritten.stream().allMatch(g -> g.seconds().equals(OptionalDouble.of(75))));
        assertTrue(unwritten.get(3).following().isPresent());
    }

    @Test
    void aSupersetWithoutARoundRestIsUnknownEvenWithWrittenChangeovers() {
        List<RestGap> gaps = rests(superset(null,
                exercise("barbell-bench-press", reps("10").rir("2").rest("30s").times(2)),
                exercise("barbell-row", reps("10").rir("2").times(2))));
        assertEquals(2, gaps.size());
        assertTrue(gaps.stream().allMatch(g -> g.seconds().isEmpty()));
    }
}
