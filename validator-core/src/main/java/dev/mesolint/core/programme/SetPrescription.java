package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.RepTarget;
import dev.mesolint.core.value.RirRange;
import dev.mesolint.core.value.Rpe;
import dev.mesolint.core.value.Tempo;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * One working set as written (after week expansion), before the training model resolves its effort.
 *
 * @param number   1-based position among the exercise's working sets
 * @param rest     rest after this set; empty when the programme does not say
 * @param location the YAML node that wrote the set (for an expanded week, the line in the week it repeats)
 * @param written  where each of the set's values was written, by key ({@code rest}, {@code rir}): on the set, or on
 *                 the exercise entry it inherits from; a key without an entry was not written
 */
public record SetPrescription(int number, RepTarget reps, Optional<RirRange> rir, Optional<Rpe> rpe,
        Optional<Load> load, Optional<Duration> rest, Optional<Tempo> tempo, Optional<Technique> technique,
        Location location, List<Waiver> waivers, Map<String, Location> written) implements Located {

    public SetPrescription {
        waivers = List.copyOf(waivers);
        written = Map.copyOf(written);
    }

    /** A set whose values' places are not known (built in code): findings about them point at the set. */
    public SetPrescription(int number, RepTarget reps, Optional<RirRange> rir, Optional<Rpe> rpe,
            Optional<Load> load, Optional<Duration> rest, Optional<Tempo> tempo, Optional<Technique> technique,
            Location location, List<Waiver> waivers) {
        this(number, reps, rir, rpe, load, rest, tempo, technique, location, waivers, Map.of());
    }

    /** Where the value of {@code key} was written (inherited values at the entry), else where the set was. */
    public Location placeOf(String key) {
        return written.getOrDefault(key, location);
    }

    /** True when the set states its effort in any form. */
    public boolean statesEffort() {
        return rir.isPresent() || rpe.isPresent() || load.isPresent() || reps.amrap();
    }
}
