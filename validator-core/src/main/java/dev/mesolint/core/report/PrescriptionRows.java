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

    static List<Row> of(Session session, SetLoads loads) {
        List<Row> rows = new ArrayList<>();
        char letter = 'A';
        for (WorkItem item : session.work()) {
            if (item instanceof ExerciseWork work) {
                exercise(rows, null, "", work, loads, work.warmUpSets());
            } else if (item instanceof Superset superset) {
                String rest = superset.rest().map(d -> ", " + Durations.format(d) + " rest after each round").orElse("");
                Heading heading = new Heading(String.valueOf(letter), "Superset " + letter + ": " + superset.rounds()
                        + (superset.rounds() == 1 ? " round" : " rounds") + rest, superset.location().line(),
                        superset.location().pointer());
                int n = 1;
                for (ExerciseWork work : superset.items()) {
                    exercise(rows, heading, letter + Integer.toString(n++), work, loads, work.warmUpSets());
                }
                letter = letter == 'Z' ? 'A' : (char) (letter + 1);
            }
        }
        return rows;
    }

    private static void exercise(List<Row> rows, Heading heading, String label, ExerciseWork work, SetLoads loads,
            int warmUps) {
        List<SetPrescription> sets = work.sets();
        int start = 0;
        boolean first = true;
        while (start < sets.size()) {
            int end = start + 1;
            while (end < sets.size() && same(sets.get(start), sets.get(end))) {
                end++;
            }
            SetPrescription set = sets.get(start);
            String notes = notes(set, first ? warmUps : 0);
            rows.add(new Row(first ? heading : null, label, work.exerciseId(), loads.name(work.exerciseId()),
                    (end - start) + " × " + reps(set), effort(set), loads.of(work.exerciseId(), set),
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
                && Objects.equals(a.technique(), b.technique());
    }

    private static String reps(SetPrescription set) {
        return set.reps().amrap() ? "AMRAP" : set.reps().toString();
    }

    private static String effort(SetPrescription set) {
        List<String> parts = new ArrayList<>();
        set.rir().ifPresent(r -> parts.add("RIR " + r));
        set.rpe().ifPresent(r -> parts.add("RPE " + r));
        return String.join(" · ", parts);
    }

    private static String notes(SetPrescription set, int warmUps) {
        List<String> parts = new ArrayList<>();
        if (warmUps > 0) {
            parts.add(warmUps + (warmUps == 1 ? " warm-up set first" : " warm-up sets first"));
        }
        set.technique().ifPresent(t -> parts.add(t.yamlName().replace('-', ' ')));
        return String.join("; ", parts);
    }
}
