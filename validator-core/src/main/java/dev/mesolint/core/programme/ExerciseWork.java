package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;
import java.util.List;

/**
 * An exercise with its working sets, as done in a session.
 *
 * @param exerciseLocation the {@code exercise:} value, where unknown-exercise findings point
 */
public record ExerciseWork(String exerciseId, int warmUpSets, List<SetPrescription> sets, Location location,
        Location exerciseLocation, List<Waiver> waivers) implements WorkItem {

    public ExerciseWork {
        sets = List.copyOf(sets);
        waivers = List.copyOf(waivers);
    }
}
