package dev.mesolint.core.programme;

import dev.mesolint.core.catalogue.Exercise;
import java.util.List;

/**
 * A programme as rules and metrics see it: header, athlete, local catalogue entries and expanded weeks.
 *
 * @param fileWaivers waivers that apply to the whole file
 */
public record Programme(ProgrammeInfo info, Athlete athlete, List<Exercise> localExercises, List<Week> weeks,
        List<Waiver> fileWaivers) {

    public Programme {
        localExercises = List.copyOf(localExercises);
        weeks = List.copyOf(weeks);
        fileWaivers = List.copyOf(fileWaivers);
    }
}
