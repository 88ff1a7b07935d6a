package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Muscle;

/**
 * Residual fatigue a bout of reps leaves in a muscle (0 = fresh, towards 1 = nothing left), and its recovery.
 *
 * <p>The drive grows with reps (reps past the high-rep threshold count extra), falls off exponentially with reps in
 * reserve, and is larger for compound lifts; fatigue = 1 - exp(-drive) keeps it below 1. Recovery is exponential,
 * slower for the large lower-body muscles. A project convention calibrated on the check values in docs/model.md.
 */
public final class FatigueModel {
    private final ModelParameters params;

    public FatigueModel(ModelParameters params) {
        this.params = params;
    }

    /** Fatigue a bout leaves in a prime mover (credit 1), right after it. */
    public double fatigueOf(Bout bout, boolean compound) {
        double effectiveReps = bout.reps()
                + params.highRepExtraWeight() * Math.max(0, bout.reps() - params.highRepThreshold());
        double drive = params.fatiguePerRep() * effectiveReps
                * Math.exp(-params.proximityDecay() * bout.rir())
                * (compound ? params.compoundFatigueFactor() : 1)
                * bout.fatigueFactor();
        return 1 - Math.exp(-drive);
    }

    /**
     * Fatigue left in {@code muscle} after {@code seconds} of recovery. The large lower-body muscles recover
     * {@code lowerBodyRecoveryFactor} times slower, which is why rest matters most after squats, hinges and lunges
     * (Schoenfeld et al. 2016 saw the largest rest effect in the thigh).
     */
    public double remaining(Muscle muscle, double fatigue, double seconds) {
        return fatigue * decay(seconds, recoveryTimeConstantSeconds(muscle));
    }

    /** The time for {@code muscle}'s residual fatigue to fall to 1/e. */
    double recoveryTimeConstantSeconds(Muscle muscle) {
        return params.recoveryTimeConstantSeconds()
                * (isLargeLowerBody(muscle) ? params.lowerBodyRecoveryFactor() : 1);
    }

    /** The share of fatigue left after {@code seconds} with time constant {@code tau}. */
    static double decay(double seconds, double tau) {
        return Math.exp(-seconds / tau);
    }

    private static boolean isLargeLowerBody(Muscle muscle) {
        return switch (muscle) {
            case QUADRICEPS, GLUTES, HAMSTRINGS, ADDUCTORS -> true;
            default -> false;
        };
    }
}
