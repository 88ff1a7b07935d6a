package dev.mesolint.core.finding;

import java.util.List;
import java.util.Objects;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * What a finding is about, as data: a muscle, an exercise, a session day, the weeks it occurs in. Any part may be
 * absent ({@code null} for the texts and the day, empty for the weeks).
 *
 * <p>The muscle, exercise and day take part in the fingerprint (two muscles over their limit in one week are two
 * findings); the weeks do not, so that adding a repeat week keeps a baselined finding matched.
 *
 * @param muscle   the muscle's catalogue name ({@code chest}), or null
 * @param exercise the exercise id ({@code barbell-back-squat}), or null
 * @param day      the session day, or null
 * @param weeks    the weeks the finding occurs in, ascending; empty when it is not about weeks
 */
public record Subject(String muscle, String exercise, Integer day, List<Integer> weeks) {

    /** A finding about the file or a place, with nothing more to name. */
    public static final Subject NONE = new Subject(null, null, null, List.of());

    public Subject {
        weeks = ascending(weeks) ? List.copyOf(weeks) : weeks.stream().sorted().distinct().toList();
    }

    /** Strictly ascending already (as every merged finding's weeks are): nothing to sort. */
    private static boolean ascending(List<Integer> weeks) {
        for (int i = 1; i < weeks.size(); i++) {
            if (weeks.get(i - 1) >= weeks.get(i)) {
                return false;
            }
        }
        return true;
    }

    // equals and hashCode as the record's generated ones give them, without their method handles (see Location).
    @Override
    public boolean equals(Object o) {
        return this == o || o instanceof Subject s && Objects.equals(muscle, s.muscle)
                && Objects.equals(exercise, s.exercise) && Objects.equals(day, s.day) && Objects.equals(weeks, s.weeks);
    }

    @Override
    public int hashCode() {
        return ((Objects.hashCode(muscle) * 31 + Objects.hashCode(exercise)) * 31 + Objects.hashCode(day)) * 31
                + Objects.hashCode(weeks);
    }

    public static Subject muscle(String muscle) {
        return NONE.withMuscle(muscle);
    }

    public static Subject exercise(String exercise) {
        return NONE.withExercise(exercise);
    }

    public Subject withMuscle(String name) {
        return new Subject(name, exercise, day, weeks);
    }

    public Subject withExercise(String id) {
        return new Subject(muscle, id, day, weeks);
    }

    public Subject withDay(Integer number) {
        return new Subject(muscle, exercise, number, weeks);
    }

    public Subject withWeeks(List<Integer> numbers) {
        return new Subject(muscle, exercise, day, numbers);
    }

    /** Every part this subject names that {@code other} leaves out is taken from {@code other}. */
    public Subject or(Subject other) {
        return new Subject(muscle != null ? muscle : other.muscle, exercise != null ? exercise : other.exercise,
                day != null ? day : other.day, weeks.isEmpty() ? other.weeks : weeks);
    }

    /** The part of the subject that identifies a finding: muscle, exercise and day, never the weeks. */
    public String identity() {
        return Stream.of(muscle == null ? null : "muscle=" + muscle, exercise == null ? null : "exercise=" + exercise,
                day == null ? null : "day=" + day).filter(Objects::nonNull).collect(Collectors.joining(","));
    }
}
