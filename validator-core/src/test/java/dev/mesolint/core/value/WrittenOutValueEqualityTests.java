package dev.mesolint.core.value;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import dev.mesolint.core.catalogue.Role;
import dev.mesolint.core.finding.Measure;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.source.Location;
import java.util.List;
import java.util.Optional;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/**
 * The values whose equals and hashCode are written out (for speed) keep a record's meaning: equal exactly when
 * every component is, with the very hash the JDK gives a record of the same components, checked here against a
 * plain record of those components rather than a formula (so map orders, and reports, cannot change).
 */
class WrittenOutValueEqualityTests {
    private record Pair(double a, double b) {
    }

    private record Reps(int min, int max, boolean amrap) {
    }

    private record One(double a) {
    }

    private record Weight(double amount, LoadUnit unit) {
    }

    private record Measured(double value, double limit, String unit) {
    }

    private record Work(String exerciseId, int warmUpSets, List<SetPrescription> sets, Location location,
            Location exerciseLocation, List<Waiver> waivers, Optional<Role> role) {
    }

    @Property(tries = 300)
    void rirRangesAndMeasuresHashAsRecordsDo(@ForAll @IntRange(min = 0, max = 20) int low,
            @ForAll @IntRange(min = 0, max = 20) int extra) {
        double min = low / 2.0;
        double max = Math.min(10, min + extra / 2.0);
        RirRange range = new RirRange(min, max);
        assertEquals(new Pair(min, max).hashCode(), range.hashCode());
        assertEquals(new RirRange(min, max), range);
        double otherMax = max < 10 ? max + 0.5 : max - 0.5;
        if (otherMax >= min) {
            assertNotEquals(new RirRange(min, otherMax), range);
        }
        Measure measure = new Measure(min, max, "sets");
        assertEquals(new Measured(min, max, "sets").hashCode(), measure.hashCode());
        assertEquals(new Measure(min, max, "sets"), measure);
        assertNotEquals(new Measure(min, max, "s"), measure);
        assertNotEquals(new Measure(min + 1, max, "sets"), measure);
    }

    @Property(tries = 300)
    void repTargetsAndLoadsHashAsRecordsDo(@ForAll @IntRange(min = 1, max = 30) int min,
            @ForAll @IntRange(min = 0, max = 20) int extra, @ForAll @IntRange(min = 1, max = 100) int percent) {
        RepTarget reps = new RepTarget(min, min + extra, false);
        assertEquals(new Reps(min, min + extra, false).hashCode(), reps.hashCode());
        assertEquals(new Reps(0, 0, true).hashCode(), RepTarget.AMRAP.hashCode());
        assertEquals(new RepTarget(min, min + extra, false), reps);
        assertNotEquals(new RepTarget(min, min + extra + 1, false), reps);
        Load.Relative share = new Load.Relative(percent / 100.0);
        assertEquals(new One(percent / 100.0).hashCode(), share.hashCode());
        assertEquals(new Load.Relative(percent / 100.0), share);
        Load.Absolute kilos = new Load.Absolute(percent, LoadUnit.KG);
        assertEquals(new Weight(percent, LoadUnit.KG).hashCode(), kilos.hashCode());
        assertEquals(new Load.Absolute(percent, LoadUnit.KG), kilos);
        assertNotEquals(new Load.Absolute(percent, LoadUnit.LB), kilos);
        assertNotEquals(share, kilos);
    }

    @Property(tries = 100)
    void rpesHashAsRecordsDo(@ForAll @IntRange(min = 10, max = 20) int halves) {
        Rpe rpe = new Rpe(halves / 2.0);
        assertEquals(new One(halves / 2.0).hashCode(), rpe.hashCode());
        assertEquals(new Rpe(halves / 2.0), rpe);
        assertNotEquals(new Rpe(halves < 20 ? (halves + 1) / 2.0 : 9.5), rpe);
        assertNotEquals(new RirRange(0, 10 - halves / 2.0), rpe);
    }

    @Property(tries = 100)
    void exerciseWorkHashesAsARecordDoes(@ForAll @IntRange(min = 0, max = 3) int warmUps,
            @ForAll @IntRange(min = 1, max = 40) int line) {
        Location at = new Location(line, 7, "/weeks/0/sessions/0/work/0");
        Location exerciseAt = new Location(line, 17, at.pointer() + "/exercise");
        ExerciseWork work = new ExerciseWork("barbell-back-squat", warmUps, List.of(), at, exerciseAt, List.of(),
                Optional.of(Role.MAIN));
        assertEquals(new Work("barbell-back-squat", warmUps, List.of(), at, exerciseAt, List.of(),
                Optional.of(Role.MAIN)).hashCode(), work.hashCode());
        assertEquals(new ExerciseWork("barbell-back-squat", warmUps, List.of(), at, exerciseAt, List.of(),
                Optional.of(Role.MAIN)), work);
        assertNotEquals(new ExerciseWork("barbell-back-squat", warmUps + 1, List.of(), at, exerciseAt, List.of(),
                Optional.of(Role.MAIN)), work);
        assertNotEquals(new ExerciseWork("barbell-back-squat", warmUps, List.of(), at, exerciseAt, List.of()), work);
    }
}
