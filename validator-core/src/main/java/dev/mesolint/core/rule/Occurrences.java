package dev.mesolint.core.rule;

import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.WholeNumbers;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * How every rule reports a problem on a line that repeated weeks copy: once per written place, naming the weeks it
 * occurs in. A problem on a line that four repeated weeks copy is one finding ({@code weeks 1-4}), not four.
 *
 * <p>A rule adds one finding per week, with {@link #WEEKS} standing for the week in its message; findings at the
 * same place, with the same waivers, severity, message and fix are reported once, naming every week they were added
 * for. So a waiver written in one repeated week still applies to that week alone, and a week whose finding reads
 * differently (a deload week with one set fewer) gets a finding of its own. Rules add their findings in one of three
 * ways, all merged here:
 * <ul>
 * <li>{@link #add(int, Location, List, Severity, String, String)}: a finding the rule words itself (model rules
 *     that report a session, through {@link Places});</li>
 * <li>{@link #add(Week, Session, String, Location, List, Step, String, String)}: the steps (sets, rounds) of an
 *     exercise that a problem affects, one at a time; the finding names them, and weeks are merged only when the
 *     same steps are affected ({@code weeks 1-4 day 1 (Lower), sets 1 -> 2, 2 -> 3});</li>
 * <li>{@link SetHits}: the model rules' per-set hits, grouped by written place; the rule words the finding from
 *     the group and adds it with {@link Group#add}.</li>
 * </ul>
 * Then {@link #report} reports them all, each finding's {@link Subject} carrying its weeks. Part of the API for rule
 * packs: their rules merge repeated weeks the same way. Confined to one rule run for one file.
 */
public final class Occurrences {
    /** Stands for the weeks in a message until the findings are reported: {@code week 2}, {@code weeks 1-4}. */
    public static final String WEEKS = "{weeks}";

    /** Which set or round of an exercise an occurrence is about: {@code set 2 -> 3}, {@code round 1}. */
    public record Step(String noun, String label) {
        public static final Step NONE = new Step("", "");
    }

    /**
     * A finding as reported, but for its weeks. Location equality includes the line; waivers compare by identity;
     * the facts' weeks are filled in when reported.
     */
    private record Finding(Location where, List<Waiver> waivers, Severity severity, String message, String fix,
            Facts facts) {
        // Written out (as Location's are): these records key the merging maps, once per finding and week.
        @Override
        public boolean equals(Object o) {
            return this == o || o instanceof Finding f && Objects.equals(where, f.where)
                    && Objects.equals(waivers, f.waivers) && severity == f.severity
                    && Objects.equals(message, f.message) && Objects.equals(fix, f.fix)
                    && Objects.equals(facts, f.facts);
        }

        @Override
        public int hashCode() {
            return ((((Objects.hashCode(where) * 31 + Objects.hashCode(waivers)) * 31 + Objects.hashCode(severity))
                    * 31 + Objects.hashCode(message)) * 31 + Objects.hashCode(fix)) * 31 + Objects.hashCode(facts);
        }
    }

    /** A problem of one exercise at one written place, whose steps are collected week by week. */
    private record StepKey(String pointer, List<Waiver> waivers, String subject, String detail, String fix,
            Facts facts) {
        @Override
        public boolean equals(Object o) {
            return this == o || o instanceof StepKey k && Objects.equals(pointer, k.pointer)
                    && Objects.equals(waivers, k.waivers)
                    && Objects.equals(subject, k.subject) && Objects.equals(detail, k.detail)
                    && Objects.equals(fix, k.fix) && Objects.equals(facts, k.facts);
        }

        @Override
        public int hashCode() {
            return ((((Objects.hashCode(pointer) * 31 + Objects.hashCode(waivers)) * 31 + Objects.hashCode(subject))
                    * 31 + Objects.hashCode(detail)) * 31 + Objects.hashCode(fix)) * 31 + Objects.hashCode(facts);
        }
    }

    private static final class Steps {
        final Location where;
        final String day;
        final String noun;
        /** The steps affected in each week, weeks in order. */
        final Map<Integer, Set<String>> byWeek = new TreeMap<>();

        Steps(Location where, String day, String noun) {
            this.where = where;
            this.day = day;
            this.noun = noun;
        }
    }

    private final Map<Finding, TreeSet<Integer>> findings = new LinkedHashMap<>();
    private final Map<StepKey, Steps> steps = new LinkedHashMap<>();

    /**
     * Adds week {@code week}'s finding; {@link #WEEKS} in {@code message} (its first occurrence) stands for the
     * weeks. Reported at {@code severity}: {@link RuleContext#severity()}, or a second severity derived from it.
     */
    public void add(int week, Location where, List<Waiver> waivers, Severity severity, String message, String fix) {
        add(week, where, waivers, severity, message, fix, Facts.NONE);
    }

    /** As {@link #add(int, Location, List, Severity, String, String)}, with what the finding is about. */
    public void add(int week, Location where, List<Waiver> waivers, Severity severity, String message, String fix,
            Facts facts) {
        findings.computeIfAbsent(new Finding(where, List.copyOf(waivers), severity, message, fix, facts),
                f -> new TreeSet<>()).add(week);
    }

    /**
     * Records that a problem affects one step of an exercise in one week, reported at the rule's severity as
     * {@code subject, weeks 1-4 day 1 (Lower), sets 1-3: detail}. Occurrences are merged only when they share the
     * place, the waivers in force and the wording; weeks are merged only when the same steps are affected.
     *
     * @param subject the exercise id the finding is about
     * @param step    the set or round, or {@link Step#NONE} for a finding about the exercise as a whole
     * @param detail  what was measured against which limit
     */
    public void add(Week week, Session session, String subject, Location where, List<Waiver> waivers, Step step,
            String detail, String fix) {
        add(week, session, subject, where, waivers, step, detail, fix, Facts.NONE);
    }

    /**
     * As {@link #add(Week, Session, String, Location, List, Step, String, String)}, with a measure or an edit; the
     * subject's exercise and day are filled in from {@code subject} and {@code session}.
     */
    public void add(Week week, Session session, String subject, Location where, List<Waiver> waivers, Step step,
            String detail, String fix, Facts facts) {
        Facts about = facts.withSubject(facts.subject().or(Subject.exercise(subject).withDay(session.day())));
        Steps s = steps.computeIfAbsent(new StepKey(where.pointer(), waivers, subject, detail, fix, about),
                k -> new Steps(where, session.label(), step.noun()));
        Set<String> labels = s.byWeek.computeIfAbsent(week.number(), w -> new LinkedHashSet<>());
        if (!step.label().isEmpty()) {
            labels.add(step.label());
        }
    }

    /** Reports every finding added, once per place and wording, with the weeks it occurs in. */
    public void report(RuleContext context) {
        steps.forEach((k, s) -> s.byWeek.forEach((week, labels) -> add(week, s.where, k.waivers(),
                context.severity(), k.subject() + ", " + WEEKS + " " + s.day + steps(s.noun, List.copyOf(labels))
                        + ": " + k.detail(), k.fix(), k.facts())));
        steps.clear();
        findings.forEach((f, weeks) -> context.report(f.where(), f.waivers(), f.severity(),
                withWeeks(f.message(), weeks), f.fix(),
                f.facts().withSubject(f.facts().subject().withWeeks(List.copyOf(weeks)))));
        findings.clear();
    }

    /** {@code message} with its first {@link #WEEKS} replaced by the weeks (any later one is the user's text). */
    private static String withWeeks(String message, Set<Integer> weeks) {
        int at = message.indexOf(WEEKS);
        return at < 0 ? message
                : message.substring(0, at) + Ranges.weeks(weeks) + message.substring(at + WEEKS.length());
    }

    /** {@code , sets 1-3}, {@code , rounds 1 -> 2, 2 -> 3}, or nothing for a finding without steps. */
    private static String steps(String singular, List<String> labels) {
        if (labels.isEmpty()) {
            return "";
        }
        String noun = labels.size() == 1 ? singular : singular + "s";
        if (labels.stream().allMatch(WholeNumbers::digitsOnly)) {
            TreeSet<Integer> numbers = new TreeSet<>();
            labels.forEach(s -> numbers.add(Integer.parseInt(s)));
            return ", " + noun + " " + Ranges.of(numbers);
        }
        return ", " + noun + " " + String.join(", ", labels);
    }

    /**
     * One model rule's per-set hits, gathered so that sets written once give one finding, not one per set and week:
     * hits of the same exercise in the same written session, at the same written place, with the same waivers and
     * the same key form a group, whatever week they fall in. The finding names every week and set of the group.
     *
     * @param <T> what the rule keeps of each hit for its message
     */
    public static final class SetHits<T> {
        private final Map<List<Object>, Group<T>> groups = new LinkedHashMap<>();

        /**
         * @param where where the finding points (a field of the set, or the set); compared with its line
         * @param key   hits with different keys are reported apart: put the measured value or the kind of problem
         *              in it, and the week number when the message quotes figures that differ from week to week
         */
        public void add(WeekMetrics week, SessionMetrics session, SetMetrics set, Location where, Object key,
                T value) {
            List<Object> id = List.of(session.day(), session.location().pointer(), where, set.exerciseId(),
                    List.copyOf(set.prescription().waivers()), key);
            Group<T> group = groups.computeIfAbsent(id,
                    k -> new Group<>(session, where, new ArrayList<>(), new TreeSet<>(), new ArrayList<>()));
            group.sets().add(set);
            group.weeks().add(week.number());
            group.values().add(value);
        }

        public List<Group<T>> groups() {
            return List.copyOf(groups.values());
        }
    }

    /** The hits of one place, in the order done; {@link #first()} stands for them in the message. */
    public record Group<T>(SessionMetrics session, Location where, List<SetMetrics> sets, TreeSet<Integer> weeks,
            List<T> values) {

        public SetMetrics first() {
            return sets.get(0);
        }

        /** The set numbers, in the order done (several weeks may repeat them). */
        public List<Integer> numbers() {
            return sets.stream().map(SetMetrics::setNumber).toList();
        }

        /** {@code barbell-back-squat, {weeks} day 2 (Lower), sets 1-3}: {@link #WEEKS} becomes the group's weeks. */
        public String label() {
            return first().exerciseId() + ", " + WEEKS + " " + Places.day(session) + ", " + Ranges.sets(numbers());
        }

        /** Adds the group's finding to {@code out} for each of its weeks, with the set's waivers. */
        public void add(Occurrences out, Severity severity, String message, String fix) {
            add(out, severity, message, fix, Facts.NONE);
        }

        /** As {@link #add(Occurrences, Severity, String, String)}, with a measure or an edit. */
        public void add(Occurrences out, Severity severity, String message, String fix, Facts facts) {
            Facts about = facts.withSubject(facts.subject()
                    .or(Subject.exercise(first().exerciseId()).withDay(session.day())));
            for (int week : weeks) {
                out.add(week, where, first().prescription().waivers(), severity, message, fix, about);
            }
        }
    }
}
