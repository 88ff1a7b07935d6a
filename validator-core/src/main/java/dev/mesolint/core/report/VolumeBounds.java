package dev.mesolint.core.report;

/**
 * The weekly hard-set range a profile asks of one muscle (the {@code weekly-volume-min} and {@code weekly-volume-max}
 * parameters).
 */
public record VolumeBounds(double floor, double cap) {
    /** The rules' defaults. */
    public static final VolumeBounds DEFAULTS = new VolumeBounds(4, 20);

    public VolumeBounds {
        if (floor < 0 || cap < floor) {
            throw new IllegalArgumentException("need 0 <= floor <= cap, got " + floor + " and " + cap);
        }
    }

    public boolean below(double sets) {
        return sets > 0 && sets < floor;
    }

    public boolean above(double sets) {
        return sets > cap;
    }
}
