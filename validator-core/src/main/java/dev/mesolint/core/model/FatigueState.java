package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Muscle;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.Map;

/**
 * Residual fatigue per muscle at one moment of a session. Immutable: each step returns a new state.
 *
 * <p>Held as arrays indexed by muscle ordinal rather than a map: a session computes one state per bout and rest,
 * and this is the model's innermost loop.
 */
final class FatigueState {
    private static final Muscle[] MUSCLES = Muscle.values();

    static final FatigueState FRESH = new FatigueState(new double[MUSCLES.length], new boolean[MUSCLES.length], 0);

    /** Below this, fatigue is dropped: it keeps reports free of 1e-12 residues. */
    private static final double NEGLIGIBLE = 1e-9;

    private final double[] level;
    /** Which muscles carry a level (one may carry 0 after a bout that credits it nothing). */
    private final boolean[] present;
    private final int count;

    private FatigueState(double[] level, boolean[] present, int count) {
        this.level = level;
        this.present = present;
        this.count = count;
    }

    double of(Muscle muscle) {
        return level[muscle.ordinal()];
    }

    /** Non-zero levels, in muscle order. */
    Map<Muscle, Double> levels() {
        EnumMap<Muscle, Double> out = new EnumMap<>(Muscle.class);
        for (int i = 0; i < MUSCLES.length; i++) {
            if (present[i]) {
                out.put(MUSCLES[i], level[i]);
            }
        }
        return out;
    }

    FatigueState recover(double seconds, FatigueModel model) {
        if (seconds <= 0 || count == 0) {
            return this;
        }
        double[] next = new double[level.length];
        boolean[] kept = new boolean[level.length];
        int n = 0;
        for (int i = 0; i < level.length; i++) {
            if (present[i]) {
                double left = model.remaining(MUSCLES[i], level[i], seconds);
                if (left > NEGLIGIBLE) {
                    next[i] = left;
                    kept[i] = true;
                    n++;
                }
            }
        }
        return new FatigueState(next, kept, n);
    }

    /**
     * Adds a bout's fatigue to each muscle the exercise credits, scaled by the credit. Fatigues combine as
     * independent losses, 1 - (1 - old)(1 - new), so the level never reaches 1.
     */
    FatigueState after(Exercise exercise, double primeMoverFatigue) {
        double[] next = Arrays.copyOf(level, level.length);
        boolean[] kept = Arrays.copyOf(present, present.length);
        int n = count;
        for (Map.Entry<Muscle, Double> credit : exercise.muscles().entrySet()) {
            int i = credit.getKey().ordinal();
            double added = Math.min(1, credit.getValue()) * primeMoverFatigue;
            next[i] = 1 - (1 - level[i]) * (1 - added);
            if (!kept[i]) {
                kept[i] = true;
                n++;
            }
        }
        return new FatigueState(next, kept, n);
    }
}
