package dev.mesolint.core.model;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * One lift's (exercise's) strength figures for one week, over its working sets. Intensities are shares of the 1RM
 * the load resolver gives for that week; sets whose share of 1RM is unknown are counted in
 * {@code unknownIntensitySets} and left out of the intensity figures.
 *
 * @param week                the week's number in the block
 * @param exerciseId          the exercise
 * @param sets                working sets of the lift in the week
 * @param reps                reps of those sets (a range at its midpoint; technique mini-sets not included)
 * @param topSetFraction      the heaviest set's share of 1RM; empty when no set's share is known
 * @param topSetLoad          the heaviest set's weight in the programme's unit; empty when no weight is known
 * @param meanIntensity       mean share of 1RM weighted by reps, over the sets whose share is known; empty if none
 * @param volumeLoad          reps x weight over the sets whose weight is known (drop-set continuations at their
 *                            lighter load); empty when no set's weight is known
 * @param heavyReps           reps of sets at or above {@code heavyRepsFrom} (80% of 1RM by default)
 * @param unknownIntensitySets sets whose share of 1RM is unknown
 */
public record LiftWeek(int week, String exerciseId, int sets, double reps, OptionalDouble topSetFraction,
        OptionalDouble topSetLoad, OptionalDouble meanIntensity, OptionalDouble volumeLoad, double heavyReps,
        int unknownIntensitySets) {

    public LiftWeek {
        Objects.requireNonNull(exerciseId, "exerciseId");
    }
}
