package dev.mesolint.core.programme;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.ExerciseIds;
import dev.mesolint.core.catalogue.Role;
import dev.mesolint.core.source.Location;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * An exercise with its working sets, as done in a session.
 *
 * @param exerciseLocation the {@code exercise:} value, where unknown-exercise findings point
 * @param role             the {@code role:} written on the entry; empty = the catalogue's default
 */
public record ExerciseWork(String exerciseId, int warmUpSets, List<SetPrescription> sets, Location location,
        Location exerciseLocation, List<Waiver> waivers, Optional<Role> role) implements WorkItem {
    // equals and hashCode written out with the record's own values (see Location for why)
    @Override
    public boolean equals(Object o) {
        return this == o || o instanceof ExerciseWork w && Objects.equals(exerciseId, w.exerciseId)
                && warmUpSets == w.warmUpSets && sets.equals(w.sets) && Objects.equals(location, w.location)
                && Objects.equals(exerciseLocation, w.exerciseLocation) && waivers.equals(w.waivers)
                && Objects.equals(role, w.role);
    }

    @Override
    public int hashCode() {
        int h = Objects.hashCode(exerciseId);
        h = h * 31 + warmUpSets;
        h = h * 31 + sets.hashCode();
        h = h * 31 + Objects.hashCode(location);
        h = h * 31 + Objects.hashCode(exerciseLocation);
        h = h * 31 + waivers.hashCode();
        return h * 31 + Objects.hashCode(role);
    }


    public ExerciseWork {
        exerciseId = ExerciseIds.shared(exerciseId);
        sets = List.copyOf(sets);
        waivers = List.copyOf(waivers);
    }

    /** An entry that states no role. */
    public ExerciseWork(String exerciseId, int warmUpSets, List<SetPrescription> sets, Location location,
            Location exerciseLocation, List<Waiver> waivers) {
        this(exerciseId, warmUpSets, sets, location, exerciseLocation, waivers, Optional.empty());
    }

    /** The role in this session: as written, else the catalogue entry's default ({@link Exercise#defaultRole()}). */
    public Role role(Exercise exercise) {
        return role.orElseGet(exercise::defaultRole);
    }

    /** This entry with other sets and waivers (what a repeated week changes). */
    public ExerciseWork with(List<SetPrescription> newSets, List<Waiver> newWaivers) {
        return new ExerciseWork(exerciseId, warmUpSets, newSets, location, exerciseLocation, newWaivers, role);
    }
}
