package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;
import java.util.List;

/** A part of a programme that findings can point at, with the waivers in force there. */
public interface Located {

    Location location();

    /** Waivers written on this node or on a node that contains it (whole-file waivers excluded). */
    List<Waiver> waivers();
}
