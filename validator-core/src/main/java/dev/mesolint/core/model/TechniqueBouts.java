package dev.mesolint.core.model;

import dev.mesolint.core.programme.Technique;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Expands a set into its bouts: the set itself, then the mini-sets its technique adds, each to failure.
 *
 * <p>A drop set continues {@code dropSets} times after a short load change, each time with {@code dropSetExtraReps}
 * at a load {@code dropSetLoadDrop} lighter than the one before; a rest-pause
 * set adds {@code restPauseMiniSets} mini-sets of {@code restPauseMiniSetReps} after a short pause. Mini-sets leave
 * {@code techniqueFatigueFactor} times the usual fatigue: they are done with almost no recovery.
 */
final class TechniqueBouts {
    private final ModelParameters params;

    TechniqueBouts(ModelParameters params) {
        this.params = params;
    }

    List<Bout> expand(double reps, double rir, Optional<Technique> technique) {
        if (technique.isEmpty()) {
            return List.of(Bout.main(reps, rir));
        }
        List<Bout> bouts = new ArrayList<>();
        bouts.add(Bout.main(reps, rir));
        switch (technique.get()) {
            case DROP_SET -> {
                double load = 1;
                for (int i = 0; i < params.dropSets(); i++) {
                    load *= 1 - params.dropSetLoadDrop();
                    bouts.add(new Bout(params.dropSetExtraReps(), 0, params.dropSetPauseSeconds(),
                            params.techniqueFatigueFactor(), load));
                }
            }
            case REST_PAUSE -> {
                for (int i = 0; i < params.restPauseMiniSets(); i++) {
                    bouts.add(new Bout(params.restPauseMiniSetReps(), 0, params.restPausePauseSeconds(),
                            params.techniqueFatigueFactor(), 1));
                }
            }
        }
        return List.copyOf(bouts);
    }
}
