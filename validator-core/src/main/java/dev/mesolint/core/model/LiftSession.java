package dev.mesolint.core.model;

import java.util.List;
import java.util.Objects;

/**
 * One lift's reps per intensity zone in one session: the figures Prilepin's table is read against.
 *
 * @param exerciseId           the exercise
 * @param zones                every zone, index 0 (under the first bound) to 4 (the open top zone), empty ones
 *                             included, so a reader can index them
 * @param unknownIntensityReps reps of sets whose share of 1RM is unknown (in no zone)
 */
public record LiftSession(String exerciseId, List<IntensityZone> zones, double unknownIntensityReps) {

    public LiftSession {
        Objects.requireNonNull(exerciseId, "exerciseId");
        zones = List.copyOf(zones);
    }

    /** Reps in the zone whose lower bound is {@code intensityZone<index>From} (0: under the first bound). */
    public double reps(int index) {
        return zones.get(index).reps();
    }
}
