package dev.mesolint.core.programme;

import dev.mesolint.core.catalogue.Region;
import dev.mesolint.core.source.Location;
import java.util.List;
import java.util.Optional;

/**
 * A limit on what the athlete may do: a load cap for a region, or exercises to avoid. The reason is required.
 *
 * @param maxLoad share of 1RM (0..1) that no set loading {@code region} may exceed
 */
public record AthleteConstraint(Optional<Region> region, Optional<Double> maxLoad, List<String> avoid, String reason,
        Location location) {

    public AthleteConstraint {
        avoid = List.copyOf(avoid);
    }
}
