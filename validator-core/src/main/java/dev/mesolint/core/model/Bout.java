package dev.mesolint.core.model;

/**
 * One continuous run of reps: a working set, or a mini-set that a drop set or rest-pause set adds after it.
 *
 * @param reps               reps done
 * @param rir                reps left in reserve at the end
 * @param pauseBeforeSeconds pause since the previous bout of the same set (0 for the set itself)
 * @param fatigueFactor      multiplier on the fatigue the bout leaves (mini-sets leave more)
 * @param loadFactor         share of the set's load used (a drop set's continuation is lighter)
 */
public record Bout(double reps, double rir, double pauseBeforeSeconds, double fatigueFactor, double loadFactor) {

    /** The set itself. */
    public static Bout main(double reps, double rir) {
        return new Bout(reps, rir, 0, 1, 1);
    }
}
