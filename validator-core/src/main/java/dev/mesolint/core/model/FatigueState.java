package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Muscle;
import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;

/** Residual fatigue per muscle at one moment of a session. Immutable: each step returns a new state. */
final class FatigueState {
    static final FatigueState FRESH = new FatigueState(new EnumMap<>(Muscle.class));

    /** Below this, fatigue is dropped: it keeps reports free of 1e-12 residues. */
    private static final double NEGLIGIBLE = 1e-9;

    private final Map<Muscle, Double> levels;

    private FatigueState(EnumMap<Muscle, Double> levels) {
        this.levels = Collections.unmodifiableMap(levels);
    }

    double of(Muscle muscle) {
        return levels.getOrDefault(muscle, 0.0);
    }

    /** Non-zero levels, in muscle order. */
    Map<Muscle, Double> levels() {
        return levels;
    }

    FatigueState recover(double seconds, FatigueModel model) {
        if (seconds <= 0 || levels.isEmpty()) {
            return this;
        }
        EnumMap<Muscle, Double> next = new EnumMap<>(Muscle.class);
        levels.forEach((muscle, level) -> {
            double left = model.remaining(muscle, level, seconds);
            if (left > NEGLIGIBLE) {
                next.put(muscle, left);
            }
        });
        return new FatigueState(next);
    }

    /**
     * Adds a bout's fatigue to each muscle the exercise credits, scaled by the credit. Fatigues combine as
     * independent losses, 1 - (1 - old)(1 - new), so the level never reaches 1.
     */
    FatigueState after(Exercise exercise, double primeMoverFatigue) {
        EnumMap<Muscle, Double> next = levels.isEmpty() ? new EnumMap<>(Muscle.class) : new EnumMap<>(levels);
        exercise.muscles().forEach((muscle, credit) -> {
            double added = Math.min(1, credit) * primeMoverFatigue;
            next.put(muscle, 1 - (1 - of(muscle)) * (1 - added));
        });
        return new FatigueState(next);
    }
}
