package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import java.util.Optional;

/**
 * The {@code programme:} header.
 *
 * @param plateIncrement the smallest loading step ({@code plate-increment}); empty when the programme leaves it to
 *                       the repository or the default
 */
public record ProgrammeInfo(String id, String title, String author, Level level, Goal goal,
        Optional<Double> sessionMinutes, LoadUnit units, Optional<Load.Absolute> plateIncrement, Location location) {

    /** A header without its own plate increment. */
    public ProgrammeInfo(String id, String title, String author, Level level, Goal goal,
            Optional<Double> sessionMinutes, LoadUnit units, Location location) {
        this(id, title, author, level, goal, sessionMinutes, units, Optional.empty(), location);
    }
}
