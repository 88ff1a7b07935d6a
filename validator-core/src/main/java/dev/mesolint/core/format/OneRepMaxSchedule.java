package dev.mesolint.core.format;

import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.OneRepMaxStep;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.yaml.Pointers;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tools.jackson.databind.JsonNode;

/**
 * Reads {@code athlete.one-rep-max}, where a 1RM is one load ({@code 140kg}) or a list of loads from a week on
 * ({@code [{from-week: 1, load: 90kg}, {from-week: 3, load: 105kg}]}), and adds the 1RM tests written in the
 * expanded weeks ({@code test: 1rm}), so that each session sees the 1RM in force for it.
 */
final class OneRepMaxSchedule {
    private static final String POINTER = "/athlete/one-rep-max";

    private OneRepMaxSchedule() {
    }

    /** The first 1RM stated for each exercise (the one in force at the start of the block). */
    static Map<String, Load.Absolute> firstStated(BindContext ctx, JsonNode oneRepMax) {
        Map<String, Load.Absolute> maxes = new LinkedHashMap<>();
        if (oneRepMax == null) {
            return maxes;
        }
        for (Map.Entry<String, JsonNode> e : oneRepMax.properties()) {
            if (e.getValue().isArray()) {
                stated(ctx, e.getKey(), e.getValue(), Integer.MAX_VALUE, false).stream().findFirst()
                        .flatMap(OneRepMaxStep::value).ifPresent(l -> maxes.put(e.getKey(), l));
            } else {
                ctx.value(oneRepMax, POINTER, e.getKey(), Load::parse)
                        .ifPresent(l -> maxes.put(e.getKey(), (Load.Absolute) l));
            }
        }
        return maxes;
    }

    /** {@code athlete} with the steps of every exercise whose 1RM is stated per week or tested in the block. */
    static Athlete withTests(BindContext ctx, Athlete athlete, JsonNode oneRepMax, List<Week> weeks) {
        int lastWeek = weeks.stream().mapToInt(Week::number).max().orElse(0);
        Map<String, List<OneRepMaxStep>> steps = new LinkedHashMap<>();
        if (oneRepMax != null) {
            for (Map.Entry<String, JsonNode> e : oneRepMax.properties()) {
                if (e.getValue().isArray()) {
                    steps.put(e.getKey(), new ArrayList<>(stated(ctx, e.getKey(), e.getValue(), lastWeek, true)));
                }
            }
        }
        // Plain loops: this visits every set of the expanded block.
        for (Week week : weeks) {
            for (Session session : week.sessions()) {
                for (WorkItem item : session.work()) {
                    if (item instanceof Superset s) {
                        for (ExerciseWork w : s.items()) {
                            addTest(steps, athlete, week, session, w);
                        }
                    } else {
                        addTest(steps, athlete, week, session, (ExerciseWork) item);
                    }
                }
            }
        }
        if (steps.isEmpty()) {
            return athlete;
        }
        steps.values().forEach(list -> list.sort(Comparator.comparingInt(OneRepMaxStep::week)
                .thenComparingInt(OneRepMaxStep::day)));
        return new Athlete(athlete.oneRepMax(), athlete.constraints(), steps);
    }

    /** The 1RM test of {@code w}, if one of its sets is a test; its result counts from the next session on. */
    private static void addTest(Map<String, List<OneRepMaxStep>> steps, Athlete athlete, Week week, Session session,
            ExerciseWork w) {
        for (SetPrescription set : w.sets()) {
            if (set.test()) {
                List<OneRepMaxStep> list = steps.computeIfAbsent(w.exerciseId(), id -> initial(athlete, id));
                // Its value is not known when the block is written.
                list.add(new OneRepMaxStep(week.number(), session.day() + 1, Optional.empty(), true, set.location()));
                return;
            }
        }
    }

    private static List<OneRepMaxStep> initial(Athlete athlete, String exerciseId) {
        List<OneRepMaxStep> list = new ArrayList<>();
        athlete.oneRepMax(exerciseId).ifPresent(l -> list.add(new OneRepMaxStep(1, 1, Optional.of(l), false,
                dev.mesolint.core.source.Location.START)));
        return list;
    }

    /** @param report whether to record ordering errors (the list is read twice: once for the start, once whole) */
    private static List<OneRepMaxStep> stated(BindContext ctx, String exerciseId, JsonNode list, int lastWeek,
            boolean report) {
        List<OneRepMaxStep> out = new ArrayList<>();
        String listPointer = Pointers.child(POINTER, exerciseId);
        int previous = 0;
        for (int i = 0; i < list.size(); i++) {
            JsonNode entry = list.get(i);
            String pointer = Pointers.child(listPointer, i);
            int from = entry.get("from-week").asInt();
            if (report && from <= previous) {
                ctx.reject(Pointers.child(pointer, "from-week"), "from-week " + from + " must come after week "
                        + previous + ": list the 1RMs of " + exerciseId + " in week order, one per week",
                        "write the entries with rising from-week values");
            } else if (report && from > lastWeek) {
                ctx.reject(Pointers.child(pointer, "from-week"), "from-week " + from + " is after the last week ("
                        + lastWeek + ")", "remove the entry or add the week");
            }
            previous = Math.max(previous, from);
            Optional<Load> load = report ? ctx.value(entry, pointer, "load", Load::parse)
                    : Optional.of(entry.get("load").asString()).flatMap(OneRepMaxSchedule::quietly);
            out.add(new OneRepMaxStep(from, 1, load.map(l -> (Load.Absolute) l), false, ctx.at(pointer)));
        }
        return out;
    }

    private static Optional<Load> quietly(String text) {
        try {
            return Optional.of(Load.parse(text));
        } catch (dev.mesolint.core.value.InvalidValueException e) {
            return Optional.empty();
        }
    }
}
