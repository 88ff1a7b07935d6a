package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.LoadUnit;
import java.util.Optional;

/** The {@code programme:} header. */
public record ProgrammeInfo(String id, String title, String author, Level level, Goal goal,
        Optional<Double> sessionMinutes, LoadUnit units, Location location) {
}
