package dev.mesolint.core.model;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * What a set's written effort and technique alone decide, before the session's clock: the effort, the bouts, each
 * bout's stimulating reps and fatigue, the volume load and the extra reps. Immutable, so that the sets of an entry
 * that repeat the set before share one.
 */
final class SetWork {
    final Effort effort;
    final List<Bout> bouts;
    /** Per bout; empty arrays when the effort is unknown (such a set adds no stimulus or fatigue). */
    final double[] stimulatingReps;
    final double[] fatigue;
    /** The bouts' stimulating reps added up in bout order. */
    final double totalStimulatingReps;
    final boolean hard;
    final OptionalDouble volumeLoad;
    final double extraReps;

    SetWork(Effort effort, List<Bout> bouts, boolean compound, ModelParameters params, StimulusModel stimulus,
            FatigueModel fatigueModel) {
        this.effort = Objects.requireNonNull(effort, "effort");
        this.bouts = bouts;
        int n = effort.known() ? bouts.size() : 0;
        stimulatingReps = new double[n];
        fatigue = new double[n];
        double total = 0;
        for (int b = 0; b < n; b++) {
            Bout bout = bouts.get(b);
            stimulatingReps[b] = stimulus.stimulatingReps(bout.reps(), bout.rir());
            total += stimulatingReps[b];
            fatigue[b] = fatigueModel.fatigueOf(bout, compound);
        }
        totalStimulatingReps = total;
        hard = effort.known() && effort.rir().getAsDouble() <= params.hardSetMaxRir();
        volumeLoad = volumeLoad(effort, bouts);
        extraReps = bouts.size() == 1 ? 0.0 : bouts.stream().skip(1).mapToDouble(Bout::reps).sum();
    }

    private static OptionalDouble volumeLoad(Effort effort, List<Bout> bouts) {
        if (effort.absoluteLoad().isEmpty()) {
            return OptionalDouble.empty();
        }
        double weight = effort.absoluteLoad().getAsDouble();
        if (bouts.size() == 1) {
            // what the sum below gives for a single term, without a stream
            Bout only = bouts.get(0);
            return OptionalDouble.of(only.reps() * only.loadFactor() * weight);
        }
        return OptionalDouble.of(bouts.stream().mapToDouble(b -> b.reps() * b.loadFactor() * weight).sum());
    }
}
