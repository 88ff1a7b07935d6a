package dev.mesolint.core.rules;

import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.source.Location;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * Collects where a rule's problem occurs across the expanded weeks and reports each written place once, naming the
 * weeks, day and sets it covers: a problem on a line that four repeated weeks copy is one finding, not four.
 *
 * <p>Occurrences are merged only when they share the place, the waivers in force and the wording, so a waiver
 * written in one repeated week still applies to that week alone; weeks are merged only when the same sets are
 * affected, so a deload week with one set fewer gets its own finding. Confined to one rule run.
 */
final class Occurrences {
    private final Map<Key, Group> groups = new LinkedHashMap<>();

    /** Which set or round of an exercise an occurrence is about: {@code set 2 -> 3}, {@code round 1}. */
    record Step(String noun, String label) {
        static final Step NONE = new Step("", "");
    }

    private record Key(String pointer, List<Waiver> waivers, String subject, String detail, String fix) {
    }

    private static final class Group {
        final Location where;
        final String day;
        final String noun;
        /** The steps affected in each week, weeks in order. */
        final Map<Integer, Set<String>> steps = new TreeMap<>();

        Group(Location where, String day, String noun) {
            this.where = where;
            this.day = day;
            this.noun = noun;
        }
    }

    /**
     * Records one occurrence.
     *
     * @param subject what the finding is about, e.g. the exercise id
     * @param detail  what was measured against which limit
     */
    void add(Week week, Session session, String subject, Location where, List<Waiver> waivers, Step step,
            String detail, String fix) {
        Group g = groups.computeIfAbsent(new Key(where.pointer(), waivers, subject, detail, fix),
                k -> new Group(where, session.label(), step.noun()));
        Set<String> steps = g.steps.computeIfAbsent(week.number(), w -> new LinkedHashSet<>());
        if (!step.label().isEmpty()) {
            steps.add(step.label());
        }
    }

    /** Reports one finding per place and set of steps: {@code subject, weeks 1-4 day 1 (Lower), sets 1-3: detail}. */
    void reportAll(RuleContext context) {
        for (Map.Entry<Key, Group> e : groups.entrySet()) {
            Key k = e.getKey();
            Group g = e.getValue();
            Map<List<String>, Set<Integer>> weeksBySteps = new LinkedHashMap<>();
            g.steps.forEach((week, steps) -> weeksBySteps.computeIfAbsent(List.copyOf(steps), s -> new TreeSet<>())
                    .add(week));
            weeksBySteps.forEach((steps, weeks) -> context.report(g.where, k.waivers(), k.subject() + ", "
                    + (weeks.size() == 1 ? "week " : "weeks ") + ranges(weeks) + " " + g.day + steps(g.noun, steps)
                    + ": " + k.detail(), k.fix()));
        }
    }

    private static String steps(String singular, List<String> steps) {
        if (steps.isEmpty()) {
            return "";
        }
        String noun = steps.size() == 1 ? singular : singular + "s";
        if (steps.stream().allMatch(s -> s.matches("\\d+"))) {
            Set<Integer> numbers = new TreeSet<>();
            steps.forEach(s -> numbers.add(Integer.parseInt(s)));
            return ", " + noun + " " + ranges(numbers);
        }
        return ", " + noun + " " + String.join(", ", steps);
    }

    /** {@code 1-4, 6} for 1, 2, 3, 4, 6. */
    static String ranges(Set<Integer> sorted) {
        List<String> parts = new ArrayList<>();
        Integer start = null;
        Integer previous = null;
        for (int n : sorted) {
            if (previous != null && n == previous + 1) {
                previous = n;
                continue;
            }
            if (start != null) {
                parts.add(start.equals(previous) ? start.toString() : start + "-" + previous);
            }
            start = n;
            previous = n;
        }
        if (start != null) {
            parts.add(start.equals(previous) ? start.toString() : start + "-" + previous);
        }
        return String.join(", ", parts);
    }
}
