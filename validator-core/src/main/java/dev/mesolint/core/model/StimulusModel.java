package dev.mesolint.core.model;

/**
 * Stimulus of a set: the reps close enough to failure to recruit the high-threshold motor units (size principle),
 * scaled by how much of the pool the muscle can still reach when fatigued.
 *
 * <p>A project convention, not a published formula: see docs/model.md.
 */
public final class StimulusModel {
    private final double ceiling;
    private final double floor;

    public StimulusModel(ModelParameters params) {
        this.ceiling = params.stimulatingRepsCeiling();
        this.floor = params.recruitmentFloor();
    }

    /** clamp(K - r, 0, n): only the last K reps before failure count, and never more reps than were done. */
    public double stimulatingReps(double reps, double rir) {
        return Math.max(0, Math.min(ceiling - rir, reps));
    }

    /** Share of the still-growable pool reached: (rho - floor) / (1 - floor), never below 0. */
    public double growthShare(double recruitment) {
        return Math.max(0, (recruitment - floor) / (1 - floor));
    }

    /** Stimulus in units of one fresh hard set (K stimulating reps at full recruitment = 1.0). */
    public double stimulus(double stimulatingReps, double recruitment) {
        return stimulatingReps * growthShare(recruitment) / ceiling;
    }
}
