package dev.mesolint.core.format;

import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.source.Location;
import java.util.List;
import java.util.Optional;

/** A week as written, before a {@code repeat} is expanded. */
record WeekDraft(int number, boolean deload, Optional<Integer> repeat, Adjustment adjust, List<Session> sessions,
        Location location, Location numberLocation, Location repeatLocation, List<Waiver> waivers) {
}
