package dev.mesolint.core.finding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import dev.mesolint.core.source.Location;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/**
 * Location, Subject, Facts and Edit write out equals and hashCode (for speed); they must keep a record's meaning:
 * equal exactly when every component is equal, and the hash a record's components give (31 * h + component, from
 * 0), so that maps keyed by them iterate, and so report, in the same order as before.
 */
class WrittenOutEqualityTests {
    @Property(tries = 500)
    void locationsAreEqualExactlyWhenEveryComponentIs(@ForAll @IntRange(min = 1, max = 40) int line,
            @ForAll @IntRange(min = 1, max = 40) int column, @ForAll @IntRange(min = 0, max = 4) int more,
            @ForAll @IntRange(min = 0, max = 5) int which) {
        Location a = new Location(line, column, line + more, column + 1, "/weeks/" + more);
        Location same = new Location(line, column, line + more, column + 1, "/weeks/" + more);
        assertEquals(a, same);
        assertEquals(a.hashCode(), same.hashCode());
        assertEquals(((((line * 31 + column) * 31 + (line + more)) * 31 + column + 1) * 31)
                + ("/weeks/" + more).hashCode(), a.hashCode(), "the record's hash");
        Location other = switch (which) {
            case 0 -> new Location(line + 1, column, line + more + 1, column + 1, a.pointer());
            case 1 -> new Location(line, column + 1, line + more, column + 2, a.pointer());
            case 2 -> new Location(line, column, line + more + 1, column + 1, a.pointer());
            case 3 -> new Location(line, column, line + more, column + 2, a.pointer());
            default -> a.withPointer(a.pointer() + "/sets");
        };
        assertNotEquals(a, other);
    }

    @Property(tries = 300)
    void subjectsAreEqualExactlyWhenEveryComponentIs(@ForAll @IntRange(min = 1, max = 9) int day,
            @ForAll @IntRange(min = 1, max = 12) int week) {
        Subject a = Subject.exercise("barbell-back-squat").withDay(day).withWeeks(List.of(week, week + 1));
        Subject same = Subject.exercise("barbell-back-squat").withDay(day).withWeeks(List.of(week + 1, week, week));
        assertEquals(a, same, "weeks are sorted and distinct either way");
        assertEquals(a.hashCode(), same.hashCode());
        assertEquals(((("barbell-back-squat".hashCode()) * 31 + Integer.hashCode(day)) * 31)
                + List.of(week, week + 1).hashCode(), a.hashCode(), "the record's hash, a null muscle counting 0");
        assertNotEquals(a, a.withDay(day + 1));
        assertNotEquals(a, a.withMuscle("quadriceps"));
        assertNotEquals(a, a.withWeeks(List.of(week)));
    }

    @Property(tries = 200)
    void factsAndEditsKeepTheRecordsMeaning(@ForAll @IntRange(min = 1, max = 30) int line) {
        Location at = new Location(line, 3, "/weeks/0/sessions/0/work/0/rest");
        Edit edit = new Edit(at.pointer(), "rest", "120s", at);
        Edit same = new Edit(at.pointer(), "rest", "120s", new Location(line, 3, at.pointer()));
        assertEquals(edit, same);
        assertEquals(((((at.pointer().hashCode() * 31) + "rest".hashCode()) * 31 + "120s".hashCode()) * 31)
                + at.hashCode(), edit.hashCode(), "the record's hash");
        assertNotEquals(edit, new Edit(at.pointer(), "rest", "90s", at));
        Facts facts = Facts.NONE.withEdit(edit);
        assertEquals(facts, Facts.NONE.withEdit(same));
        assertEquals((Facts.NONE.subject().hashCode() * 31 + Facts.NONE.measure().hashCode()) * 31
                + java.util.Optional.of(edit).hashCode(), facts.hashCode(), "the record's hash");
        assertNotEquals(facts, Facts.NONE);
    }
}
