package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.source.Location;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Gathers one rule's per-set hits so that sets written once give one finding, not one per set and week: hits of
 * the same exercise in the same written session, at the same written place, with the same waivers and the same key
 * form a group, whatever week they fall in (a repeated week copies the lines it repeats). The finding names every
 * week and set of the group. Used by one rule for one file; not shared.
 *
 * @param <T> what the rule keeps of each hit for its message
 */
final class SetGroups<T> {

    /** The hits of one place, in the order done; {@link #first()} stands for them in the message. */
    record Group<T>(SessionMetrics session, Location where, List<SetMetrics> sets, TreeSet<Integer> weeks,
            List<T> values) {

        SetMetrics first() {
            return sets.get(0);
        }

        /** The set numbers, in the order done (several weeks may repeat them). */
        List<Integer> numbers() {
            return sets.stream().map(SetMetrics::setNumber).toList();
        }

        /** {@code barbell-back-squat, weeks 1-4 day 2, sets 1-3}. */
        String label() {
            return label(Texts.weeks(weeks));
        }

        private String label(String weeksText) {
            return first().exerciseId() + ", " + weeksText + " day " + session.day() + ", " + Texts.sets(numbers());
        }

        /** {@link #label()} with {@link WeekMerge#WEEKS} for the weeks, for a group kept to one week. */
        String mergeableLabel() {
            return label(WeekMerge.WEEKS);
        }

        void report(RuleContext context, Severity severity, String message, String fix) {
            context.report(where, first().prescription().waivers(), severity, message, fix);
        }

        /** Adds the finding to {@code merge}, which names every week whose finding reads the same. */
        void add(WeekMerge merge, Severity severity, String message, String fix) {
            for (int week : weeks) {
                merge.add(week, where, first().prescription().waivers(), severity, message, fix);
            }
        }
    }

    private final Map<List<Object>, Group<T>> groups = new LinkedHashMap<>();

    /**
     * @param where where the finding points (a field of the set, or the set); compared with its line
     * @param key   hits with different keys are reported apart: put the measured value or the kind of problem in
     *              it, and the week number when the message quotes figures that differ from week to week
     */
    void add(WeekMetrics week, SessionMetrics session, SetMetrics set, Location where, Object key, T value) {
        List<Object> id = List.of(session.day(), session.location().pointer(), where, set.exerciseId(),
                List.copyOf(set.prescription().waivers()), key);
        Group<T> group = groups.computeIfAbsent(id,
                k -> new Group<>(session, where, new ArrayList<>(), new TreeSet<>(), new ArrayList<>()));
        group.sets().add(set);
        group.weeks().add(week.number());
        group.values().add(value);
    }

    List<Group<T>> groups() {
        return List.copyOf(groups.values());
    }
}
