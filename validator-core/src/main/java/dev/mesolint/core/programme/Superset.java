package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;
import java.time.Duration;
import java.util.List;
import java.util.Optional;

/**
 * Exercises done back to back, {@code rounds} times, with {@code rest} after each round.
 *
 * <p>Each item holds one set per round; the sets' own {@code rest} is the changeover within a round.
 */
public record Superset(int rounds, Optional<Duration> rest, List<ExerciseWork> items, Location location,
        List<Waiver> waivers) implements WorkItem {

    public Superset {
        items = List.copyOf(items);
        waivers = List.copyOf(waivers);
    }
}
