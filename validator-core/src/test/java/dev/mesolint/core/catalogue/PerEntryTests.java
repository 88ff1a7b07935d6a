package dev.mesolint.core.catalogue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import dev.mesolint.core.testing.TestExercises;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class PerEntryTests {
    private record Made(Exercise entry) {
    }

    @Test
    void anEntryIsWorkedOutOnceAndAnotherEntryWithItsIdGetsItsOwn() {
        List<Exercise> worked = new ArrayList<>();
        PerEntry<Made> perEntry = new PerEntry<>(e -> {
            worked.add(e);
            return new Made(e);
        }, Made::entry);
        Exercise squat = TestExercises.SQUAT;
        Made first = perEntry.of(squat);
        assertSame(first, perEntry.of(squat));
        // a repository's own entry under the built-in id: not the built-in entry's figures
        Exercise ownSquat = new Exercise(squat.id(), "our squat", squat.kind(), squat.pattern(), squat.stability(),
                squat.skill(), Map.of(Muscle.values()[0], 1.0), squat.regions(), "repository", squat.location());
        Made own = perEntry.of(ownSquat);
        assertNotSame(first, own);
        assertSame(ownSquat, own.entry());
        assertEquals(List.of(squat, ownSquat), worked);
    }
}
