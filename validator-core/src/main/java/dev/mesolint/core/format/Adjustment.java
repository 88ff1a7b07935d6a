package dev.mesolint.core.format;

import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import dev.mesolint.core.value.RepTarget;
import dev.mesolint.core.value.RirRange;
import dev.mesolint.core.value.Rpe;
import java.util.Optional;
import java.util.Set;

/**
 * The {@code adjust:} changes of a repeated week. Effort changes are expressed as reps in reserve: {@code rir: -1}
 * and {@code rpe: +1} both mean one rep closer to failure, whichever form a set states its effort in.
 *
 * @param loadPoints percentage points added to %1RM loads
 * @param loadWeight weight added to absolute loads, with {@link #loadUnit}
 * @param only       exercise ids the changes are limited to; empty = all
 */
record Adjustment(double rirDelta, int setsDelta, int repsDelta, double loadPoints, double loadWeight,
        LoadUnit loadUnit, Set<String> only) {

    static final Adjustment NONE = new Adjustment(0, 0, 0, 0, 0, LoadUnit.KG, Set.of());

    boolean appliesTo(String exerciseId) {
        return only.isEmpty() || only.contains(exerciseId);
    }

    Optional<RirRange> rir(Optional<RirRange> rir) {
        return rir.map(r -> r.plus(rirDelta));
    }

    Optional<Rpe> rpe(Optional<Rpe> rpe) {
        return rpe.map(r -> new Rpe(Math.max(5, Math.min(10, r.value() - rirDelta))));
    }

    RepTarget reps(RepTarget reps) {
        if (reps.hasFloor() && repsDelta != 0) {
            return RepTarget.atLeast(Math.max(1, Math.min(RepTarget.MAX_REPS, reps.min() + repsDelta)));
        }
        if (reps.amrap() || repsDelta == 0) {
            return reps;
        }
        int min = Math.max(1, Math.min(RepTarget.MAX_REPS, reps.min() + repsDelta));
        int max = Math.max(min, Math.min(RepTarget.MAX_REPS, reps.max() + repsDelta));
        return new RepTarget(min, max, false);
    }

    Optional<Load> load(Optional<Load> load) {
        return load.map(l -> {
            if (l instanceof Load.Relative r && loadPoints != 0) {
                return new Load.Relative(Math.max(0.01, Math.min(1.0, r.fraction() + loadPoints / 100.0)));
            }
            if (l instanceof Load.Absolute a && loadWeight != 0) {
                double added = loadUnit.convert(loadWeight, a.unit());
                return new Load.Absolute(Math.max(0.5, a.amount() + added), a.unit());
            }
            return l;
        });
    }
}
