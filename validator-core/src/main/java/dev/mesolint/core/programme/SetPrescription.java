package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.RepTarget;
import dev.mesolint.core.value.RirRange;
import dev.mesolint.core.value.Rpe;
import dev.mesolint.core.value.Tempo;
import java.time.Duration;
import java.util.List;
import java.util.Optional;

/**
 * One working set as written (after week expansion), before the training model resolves its effort.
 *
 * @param number   1-based position among the exercise's working sets
 * @param rest     rest after this set; empty when the programme does not say
 * @param location the YAML node that wrote the set (for an expanded week, the line in the week it repeats)
 */
public record SetPrescription(int number, RepTarget reps, Optional<RirRange> rir, Optional<Rpe> rpe,
        Optional<Load> load, Optional<Duration> rest, Optional<Tempo> tempo, Optional<Technique> technique,
        Location location, List<Waiver> waivers) implements Located {

    public SetPrescription {
        waivers = List.copyOf(waivers);
    }

    /** True when the set states its effort in any form. */
    public boolean statesEffort() {
        return rir.isPresent() || rpe.isPresent() || load.isPresent() || reps.amrap();
    }
}
