package dev.mesolint.core.testing;

import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Goal;
import dev.mesolint.core.programme.Level;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.ProgrammeInfo;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Durations;
import dev.mesolint.core.value.InvalidValueException;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Builds programme records by hand for tests (Harbourside Strength Club demo naming). */
public final class TestProgrammes {
    private static final Location HERE = new Location(1, 1, "");

    private TestProgrammes() {
    }

    public static ExerciseWork exercise(String id, int warmUpSets, List<SetPrescription> sets) {
        return new ExerciseWork(id, warmUpSets, sets, HERE, HERE, List.of());
    }

    public static ExerciseWork exercise(String id, List<SetPrescription> sets) {
        return exercise(id, 0, sets);
    }

    public static Superset superset(String rest, ExerciseWork... items) {
        int rounds = items.length == 0 ? 0 : items[0].sets().size();
        Optional<java.time.Duration> restAfter = Optional.ofNullable(rest).map(TestProgrammes::duration);
        return new Superset(rounds, restAfter, List.of(items), HERE, List.of());
    }

    public static Session session(int day, String name, WorkItem... work) {
        return new Session(day, name, List.of(work), new Location(day * 20, 5, "/weeks/0/sessions/" + day), HERE,
                List.of());
    }

    public static Week week(int number, Session... sessions) {
        return week(number, false, sessions);
    }

    public static Week week(int number, boolean deload, Session... sessions) {
        return new Week(number, deload, List.of(sessions), new Location(number * 100, 3, "/weeks/" + (number - 1)),
                HERE, List.of());
    }

    public static Programme programme(Week... weeks) {
        return programme(Athlete.NONE, LoadUnit.KG, weeks);
    }

    public static Programme programme(Athlete athlete, LoadUnit units, Week... weeks) {
        ProgrammeInfo info = new ProgrammeInfo("harbour-test-block", "Harbourside Strength Club test block",
                "Harbourside Strength Club", Level.INTERMEDIATE, Goal.HYPERTROPHY, Optional.empty(), units, HERE);
        return new Programme(info, athlete, List.of(), List.of(weeks), List.of());
    }

    /** A programme of one week holding one session. */
    public static Programme oneSession(WorkItem... work) {
        return programme(week(1, session(1, "Session A", work)));
    }

    public static Athlete athleteWithOneRepMax(String exerciseId, double amount, LoadUnit unit) {
        return new Athlete(Map.of(exerciseId, new Load.Absolute(amount, unit)), List.of());
    }

    private static java.time.Duration duration(String text) {
        try {
            return Durations.parse(text);
        } catch (InvalidValueException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
    }
}
