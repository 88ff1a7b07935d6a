package dev.mesolint.core.catalogue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;

import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.testing.TestExercises;
import java.util.List;
import org.junit.jupiter.api.Test;

class ExerciseIdsTests {
    @Test
    void equalIdsShareOneInstanceAndAnOverlongOneIsLeftAsItIs() {
        String first = ExerciseIds.shared(new String("goblet-squat"));
        assertSame(first, ExerciseIds.shared(new String("goblet-squat")));
        assertEquals("goblet-squat", first);
        String overlong = "x".repeat(81);
        assertSame(overlong, ExerciseIds.shared(overlong));
        assertNull(ExerciseIds.shared(null));
    }

    @Test
    void aProgrammesEntryAndTheCatalogueEntryItNamesHoldTheSameIdInstance() {
        // what lets the model's and the rules' lookups by id match by reference
        ExerciseWork work = new ExerciseWork(new String(TestExercises.SQUAT.id()), 0, List.of(), Location.START,
                Location.START, List.of());
        assertSame(TestExercises.SQUAT.id(), work.exerciseId());
    }
}
