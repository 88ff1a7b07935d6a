package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;
import java.util.List;

/** One training session on a day of the week. */
public record Session(int day, String name, List<WorkItem> work, Location location, Location dayLocation,
        List<Waiver> waivers) implements Located {

    public Session {
        work = List.copyOf(work);
        waivers = List.copyOf(waivers);
    }

    /** A short label for messages: {@code day 1 (Upper A)}. */
    public String label() {
        return name == null || name.isBlank() ? "day " + day : "day " + day + " (" + name + ")";
    }
}
