package dev.mesolint.core.engine;

import dev.mesolint.core.source.Location;
import java.util.Objects;

/**
 * A loaded programme's id and where it is written. Findings and baselines know a programme by its id, so two files
 * with one id are an error ({@link DuplicateProgrammeIds}).
 */
public record ProgrammeIdentity(String id, Location location) {

    public ProgrammeIdentity {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(location, "location");
    }
}
