package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;
import java.util.List;

/**
 * One week of the block, already expanded when it repeats another.
 *
 * @param numberLocation the {@code week:} value, where numbering findings point
 */
public record Week(int number, boolean deload, List<Session> sessions, Location location, Location numberLocation,
        List<Waiver> waivers) implements Located {

    public Week {
        sessions = List.copyOf(sessions);
        waivers = List.copyOf(waivers);
    }
}
