package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Muscle;
import java.util.EnumMap;
import java.util.Map;

/**
 * Running credited totals per muscle while one session is computed, by muscle ordinal; confined to that
 * computation.
 */
final class MuscleTallies {
    private static final Muscle[] MUSCLES = Muscle.values();

    private final double[] hardSets = new double[MUSCLES.length];
    private final double[] stimulatingReps = new double[MUSCLES.length];
    private final double[] rawStimulus = new double[MUSCLES.length];
    private final double[] unknownEffortSets = new double[MUSCLES.length];
    /** Which muscles some set has credited, one bit per ordinal. */
    private long tallied;

    /** Credits one working set to each muscle of its exercise. */
    void add(ExerciseFigures exercise, boolean effortKnown, boolean hard, double setStimulatingReps,
            MuscleValues muscleStimulus) {
        for (int k = 0; k < exercise.ordinals.length; k++) {
            int i = exercise.ordinals[k];
            double credit = exercise.credits[k];
            hardSets[i] += hard ? credit : 0;
            stimulatingReps[i] += credit * setStimulatingReps;
            rawStimulus[i] += muscleStimulus.at(i);
            unknownEffortSets[i] += effortKnown ? 0 : credit;
            tallied |= MuscleValues.bit(i);
        }
    }

    /** The session's figures per muscle credited, in muscle order. */
    Map<Muscle, MuscleSession> toSessions(DoseResponse dose) {
        Map<Muscle, MuscleSession> muscles = new EnumMap<>(Muscle.class);
        for (long left = tallied; left != 0; left &= left - 1) {
            int i = Long.numberOfTrailingZeros(left);
            muscles.put(MUSCLES[i], new MuscleSession(hardSets[i], stimulatingReps[i], rawStimulus[i],
                    dose.sessionEffective(rawStimulus[i]), unknownEffortSets[i]));
        }
        return muscles;
    }
}
