package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Muscle;

/**
 * Residual fatigue per muscle while one session is computed, on the session's clock. Mutable and confined to that
 * computation: a session steps it once per bout and rest, and this is the model's innermost loop, so it is held
 * as an array by muscle ordinal and changed in place; {@link #snapshot()} gives the levels a set starts with.
 */
final class FatigueState {
    private static final Muscle[] MUSCLES = Muscle.values();

    /** Below this, fatigue is dropped: it keeps reports free of 1e-12 residues. */
    private static final double NEGLIGIBLE = 1e-9;

    /** The recovery time constant of each muscle, by ordinal (shared, never changed). */
    private final double[] tau;
    /** 0 for a muscle without a level. */
    private final double[] level = new double[MUSCLES.length];
    /** Which muscles carry a level (one may carry 0 after a bout that credits it nothing), one bit per ordinal. */
    private long present;

    /** A fresh state, no fatigue anywhere, recovering with the time constants {@link #timeConstants} gave. */
    FatigueState(double[] timeConstants) {
        this.tau = timeConstants;
    }

    /** The model's recovery time constant of each muscle, by ordinal: one array for every session. */
    static double[] timeConstants(FatigueModel model) {
        double[] tau = new double[MUSCLES.length];
        for (Muscle muscle : MUSCLES) {
            tau[muscle.ordinal()] = model.recoveryTimeConstantSeconds(muscle);
        }
        return tau;
    }

    /** The levels now, muscles with none left out. */
    MuscleValues snapshot() {
        return new MuscleValues(level.clone(), present);
    }

    /** Recovery over {@code seconds}: each level decays exponentially with its muscle's time constant. */
    void recover(double seconds) {
        if (seconds <= 0 || present == 0) {
            return;
        }
        // Only two time constants exist (docs/model.md): reuse the decay while it stays the same.
        double lastTau = Double.NaN;
        double decay = 0;
        for (long left = present; left != 0; left &= left - 1) {
            int i = Long.numberOfTrailingZeros(left);
            if (tau[i] != lastTau) {
                lastTau = tau[i];
                decay = FatigueModel.decay(seconds, lastTau);
            }
            double remaining = level[i] * decay;
            if (remaining > NEGLIGIBLE) {
                level[i] = remaining;
            } else {
                level[i] = 0;
                present &= ~MuscleValues.bit(i);
            }
        }
    }

    /**
     * Adds a bout's fatigue to each muscle the exercise credits, scaled by the credit. Fatigues combine as
     * independent losses, 1 - (1 - old)(1 - new), so the level never reaches 1.
     */
    void add(ExerciseFigures exercise, double primeMoverFatigue) {
        for (int k = 0; k < exercise.ordinals.length; k++) {
            int i = exercise.ordinals[k];
            double added = exercise.fatigueShares[k] * primeMoverFatigue;
            level[i] = 1 - (1 - level[i]) * (1 - added);
            present |= MuscleValues.bit(i);
        }
    }
}
