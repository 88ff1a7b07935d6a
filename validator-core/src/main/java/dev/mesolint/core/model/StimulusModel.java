package dev.mesolint.core.model;

/**
 * Stimulus of a set: the reps close enough to failure to recruit the high-threshold motor units (size principle),
 * scaled by how much of the pool the muscle can still reach when fatigued.
 *
 * <p>A project convention, not a published formula: see docs/model.md.
 */
public final class StimulusModel {
    private final double ceiling;
    private final double tail;
    private final double floor;
    /** 1 - floor, worked out once rather than per set and muscle. */
    private final double growablePool;

    public StimulusModel(ModelParameters params) {
        this.ceiling = params.stimulatingRepsCeiling();
        this.tail = params.stimulatingRepsTail();
        this.floor = params.recruitmentFloor();
        this.growablePool = 1 - floor;
    }

    /**
     * About clamp(K - r, 0, n): only the last K reps before failure count fully, and never more reps than were done.
     * Beyond K - L in reserve the count leaves the straight line K - r for the tail L e^(-(r - K + L)/L), which meets
     * it with the same value and slope and then falls smoothly, staying above 0: sets far from failure still give a
     * little (Robinson et al. 2024). With L = 1.5 the line holds exactly to r = 3.5 and within 0.08 rep at r = 4.
     */
    public double stimulatingReps(double reps, double rir) {
        double bend = ceiling - tail;
        double count = rir <= bend ? ceiling - rir : tail * Math.exp(-(rir - bend) / tail);
        return Math.max(0, Math.min(count, reps));
    }

    /** Share of the still-growable pool reached: (rho - floor) / (1 - floor), never below 0. */
    public double growthShare(double recruitment) {
        return Math.max(0, (recruitment - floor) / growablePool);
    }

    /** Stimulus in units of one fresh hard set (K stimulating reps at full recruitment = 1.0). */
    public double stimulus(double stimulatingReps, double recruitment) {
        return stimulatingReps * growthShare(recruitment) / ceiling;
    }
}
