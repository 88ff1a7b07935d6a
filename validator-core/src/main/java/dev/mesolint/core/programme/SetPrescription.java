package dev.mesolint.core.programme;

import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Distance;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.RepTarget;
import dev.mesolint.core.value.RirRange;
import dev.mesolint.core.value.Rpe;
import dev.mesolint.core.value.Tempo;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * One working set as written (after week expansion), before the training model resolves its effort.
 *
 * @param number   1-based position among the exercise's working sets
 * @param reps     the reps; a timed hold or a carry is one continuous effort, written as one rep
 * @param rest     rest after this set; empty when the programme does not say
 * @param hold     a timed hold ({@code hold: 30s}) instead of reps
 * @param distance a carry ({@code distance: 40m}) instead of reps
 * @param test     a 1RM test ({@code test: 1rm}): a single to the lifter's current max, which then replaces the
 *                 stated 1RM of the exercise for the sessions after it
 * @param location the YAML node that wrote the set (for an expanded week, the line in the week it repeats)
 * @param written  where each of the set's values was written, by key ({@code rest}, {@code rir}): on the set, or on
 *                 the exercise entry it inherits from; a key without an entry was not written
 */
public record SetPrescription(int number, RepTarget reps, Optional<RirRange> rir, Optional<Rpe> rpe,
        Optional<Load> load, Optional<Duration> rest, Optional<Tempo> tempo, Optional<Technique> technique,
        Optional<Duration> hold, Optional<Distance> distance, boolean test, Location location,
        List<Waiver> waivers, Map<String, Location> written) implements Located {

    public SetPrescription {
        waivers = List.copyOf(waivers);
        written = Map.copyOf(written);
    }

    /** A set whose values' places are not known (built in code): findings about them point at the set. */
    public SetPrescription(int number, RepTarget reps, Optional<RirRange> rir, Optional<Rpe> rpe,
            Optional<Load> load, Optional<Duration> rest, Optional<Tempo> tempo, Optional<Technique> technique,
            Optional<Duration> hold, Optional<Distance> distance, boolean test, Location location,
            List<Waiver> waivers) {
        this(number, reps, rir, rpe, load, rest, tempo, technique, hold, distance, test, location, waivers,
                Map.of());
    }

    /** Where the value of {@code key} was written (inherited values at the entry), else where the set was. */
    public Location placeOf(String key) {
        return written.getOrDefault(key, location);
    }

    /** A set of reps: no hold, no carry, no test. */
    public SetPrescription(int number, RepTarget reps, Optional<RirRange> rir, Optional<Rpe> rpe,
            Optional<Load> load, Optional<Duration> rest, Optional<Tempo> tempo, Optional<Technique> technique,
            Location location, List<Waiver> waivers) {
        this(number, reps, rir, rpe, load, rest, tempo, technique, Optional.empty(), Optional.empty(), false,
                location, waivers);
    }

    /** This set with other reps, effort and load (what a repeated week's {@code adjust} changes). */
    public SetPrescription with(int newNumber, RepTarget newReps, Optional<RirRange> newRir, Optional<Rpe> newRpe,
            Optional<Load> newLoad, Optional<Technique> newTechnique, List<Waiver> newWaivers) {
        return new SetPrescription(newNumber, newReps, newRir, newRpe, newLoad, rest, tempo, newTechnique, hold,
                distance, test, location, newWaivers, newTechnique.isPresent() ? written : withoutTechnique(written));
    }

    private static Map<String, Location> withoutTechnique(Map<String, Location> places) {
        if (!places.containsKey("technique")) {
            return places; // already immutable: the copy in the constructor keeps it as it is
        }
        Map<String, Location> copy = new java.util.HashMap<>(places);
        copy.remove("technique");
        return copy;
    }

    /**
     * True for a timed hold or a carry: work measured in seconds or metres, which the training model counts as
     * time in the session but not as a hard set (docs/model.md).
     */
    public boolean holdOrCarry() {
        return hold.isPresent() || distance.isPresent();
    }

    /**
     * True when the set states its effort in any form. A hold or a carry needs none: its duration or distance is
     * the prescription, and it earns no stimulating-rep credit. A 1RM test is a maximal single by definition.
     */
    public boolean statesEffort() {
        return rir.isPresent() || rpe.isPresent() || load.isPresent() || reps.amrap() || holdOrCarry() || test;
    }
}
