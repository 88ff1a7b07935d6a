package dev.mesolint.core.report;

import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.value.Durations;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A session as the rows of a prescription table: one row per run of identical working sets of an exercise, the
 * items of a superset under one heading row ({@code A1}, {@code A2}).
 */
final class PrescriptionRows {

    /** A superset's heading row: its letter, rounds and rest after each round. */
    record Heading(String letter, String text, int line, String pointer) {
    }

    /**
     * One row: {@code volume} is {@code 4 × 5}; {@code cells} are the comparable texts (volume, effort, load, rest,
     * tempo, notes) used to mark what changed from the week before.
     *
     * @param pointer the exercise's YAML node, which findings about it point into
     */
    record Row(Heading heading, String label, String exerciseId, String exercise, String volume, String effort,
            Optional<SetLoads.Worked> load, String rest, String tempo, String notes, int line, String pointer) {
        List<String> cells() {
            return List.of(volume, effort, load.map(SetLoads.Worked::main).orElse(""), rest, tempo, notes);
        }
    }

    private PrescriptionRows() {
    }

    static List<Row> of(int week, Session session, SetLoads loads) {
        List<Row> rows = new ArrayList<>();
        char letter = 'A';
        for (WorkItem item : session.work()) {
            if (item instanceof ExerciseWork work) {
                exercise(rows, null, "", work, loads, new int[] {week, session.day()});
            } else if (item instanceof Superset superset) {
                String rest = superset.rest().map(d -> ", " + Durations.format(d) + " rest after each round").orElse("");
                Heading heading = new Heading(String.valueOf(letter), "Superset " + letter + ": " + superset.rounds()
                        + (superset.rounds() == 1 ? " round" : " rounds") + rest, superset.location().line(),
                        superset.location().pointer());
                int n = 1;
                for (ExerciseWork work : superset.items()) {
                    exercise(rows, heading, letter + Integer.toString(n++), work, loads,
                            new int[] {week, session.day()});
                }
                letter = letter == 'Z' ? 'A' : (char) (letter + 1);
            }
        }
        return rows;
    }

    /** @param when the week and day of the session, for the 1RM in force */
    private static void exercise(List<Row> rows, Heading heading, String label, ExerciseWork work, SetLoads loads,
            int[] when) {
        int warmUps = work.warmUpSets();
        List<SetPrescription> sets = work.sets();
        int start = 0;
        boolean first = true;
        while (start < sets.size()) {
            int end = start + 1;
            while (end < sets.size() && same(sets.get(start), sets.get(end))) {
                end++;
            }
            SetPrescription set = sets.get(start);
            String notes = notes(work, set, first ? warmUps : 0);
            rows.add(new Row(first ? heading : null, label, work.exerciseId(), loads.name(work.exerciseId()),
                    (end - start) + " × " + reps(set), effort(set), loads.of(work.exerciseId(), set, when[0], when[1]),
                    set.rest().map(Durations::format).orElse(""), set.tempo().map(Object::toString).orElse(""), notes,
                    set.location().line(), work.location().pointer()));
            first = false;
            start = end;
        }
    }

    /** Sets that read the same in every column (their numbers and lines aside). */
    private static boolean same(SetPrescription a, SetPrescription b) {
        return a.reps().equals(b.reps()) && a.rir().equals(b.rir()) && a.rpe().equals(b.rpe())
                && a.load().equals(b.load()) && a.rest().equals(b.rest()) && a.tempo().equals(b.tempo())
                && Objects.equals(a.technique(), b.technique()) && a.hold().equals(b.hold())
                && a.distance().equals(b.distance()) && a.test() == b.test();
    }

    private static String reps(SetPrescription set) {
        if (set.hold().isPresent()) {
            return "hold " + Durations.format(set.hold().get());
        }
        if (set.distance().isPresent()) {
            return set.distance().get().toString();
        }
        if (set.test()) {
            return "1RM test";
        }
        if (set.reps().hasFloor()) {
            return set.reps().min() + "+ (then AMRAP)";
        }
        return set.reps().amrap() ? "AMRAP" : set.reps().toString();
    }

    private static String effort(SetPrescription set) {
        List<String> parts = new ArrayList<>();
        set.rir().ifPresent(r -> parts.add("RIR " + r));
        set.rpe().ifPresent(r -> parts.add("RPE " + r));
        return String.join(" · ", parts);
    }

    private static String notes(ExerciseWork work, SetPrescription set, int warmUps) {
        List<String> parts = new ArrayList<>();
        work.role().ifPresent(r -> parts.add(r.yamlName() + " lift"));
        if (warmUps > 0) {
            parts.add(warmUps + (warmUps == 1 ? " warm-up set first" : " warm-up sets first"));
        }
        set.technique().ifPresent(t -> parts.add(t.yamlName().replace('-', ' ')));
        return String.join("; ", parts);
    }
}
