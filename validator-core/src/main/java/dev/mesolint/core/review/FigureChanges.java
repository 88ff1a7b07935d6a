package dev.mesolint.core.review;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.model.LiftWeek;
import dev.mesolint.core.model.MuscleWeek;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * The change in a programme's training figures between two revisions, changed rows only: per week and muscle the
 * working sets, hard sets and stimulus; per session the minutes; per week and exercise the top-set intensity and the
 * volume load.
 */
public record FigureChanges(List<MuscleWeekChange> muscles, List<SessionChange> sessions, List<LiftChange> lifts) {
    public static final FigureChanges NONE = new FigureChanges(List.of(), List.of(), List.of());
    static final double SETS_STEP = 0.1;
    static final double STIMULUS_STEP = 0.01;
    static final double MINUTES_STEP = 0.1;
    static final double PERCENT_STEP = 0.1;
    static final double LOAD_STEP = 1;

    public FigureChanges {
        muscles = List.copyOf(muscles);
        sessions = List.copyOf(sessions);
        lifts = List.copyOf(lifts);
    }

    public boolean changed() {
        return !muscles.isEmpty() || !sessions.isEmpty() || !lifts.isEmpty();
    }

    /** The rows that differ between {@code before} and {@code after}. */
    public static FigureChanges between(ProgrammeMetrics before, ProgrammeMetrics after) {
        return new FigureChanges(muscles(before, after), sessions(before, after), lifts(before, after));
    }

    private static List<MuscleWeekChange> muscles(ProgrammeMetrics before, ProgrammeMetrics after) {
        List<MuscleWeekChange> rows = new ArrayList<>();
        for (int week : weekNumbers(before, after)) {
            Optional<WeekMetrics> b = before.week(week);
            Optional<WeekMetrics> a = after.week(week);
            Map<Muscle, Integer> setsBefore = b.map(FigureChanges::workingSets).orElse(Map.of());
            Map<Muscle, Integer> setsAfter = a.map(FigureChanges::workingSets).orElse(Map.of());
            TreeSet<Muscle> all = new TreeSet<>();
            b.ifPresent(w -> all.addAll(w.muscles().keySet()));
            a.ifPresent(w -> all.addAll(w.muscles().keySet()));
            all.addAll(setsBefore.keySet());
            all.addAll(setsAfter.keySet());
            for (Muscle m : all) {
                MuscleWeekChange row = new MuscleWeekChange(week, m.yamlName(),
                        Delta.of(setsBefore.getOrDefault(m, 0), setsAfter.getOrDefault(m, 0), SETS_STEP),
                        Delta.of(hardSets(b, m), hardSets(a, m), SETS_STEP),
                        Delta.of(stimulus(b, m), stimulus(a, m), STIMULUS_STEP));
                if (row.changed()) {
                    rows.add(row);
                }
            }
        }
        return rows;
    }

    private static TreeSet<Integer> weekNumbers(ProgrammeMetrics before, ProgrammeMetrics after) {
        TreeSet<Integer> weeks = new TreeSet<>();
        before.weeks().forEach(w -> weeks.add(w.number()));
        after.weeks().forEach(w -> weeks.add(w.number()));
        return weeks;
    }

    /** Working sets per prime mover: each set counted once, for the muscle it mainly trains. */
    private static Map<Muscle, Integer> workingSets(WeekMetrics week) {
        Map<Muscle, Integer> sets = new EnumMap<>(Muscle.class);
        for (SessionMetrics s : week.sessions()) {
            for (SetMetrics set : s.sets()) {
                set.primeMover().ifPresent(m -> sets.merge(m, 1, Integer::sum));
            }
        }
        return sets;
    }

    private static double hardSets(Optional<WeekMetrics> week, Muscle m) {
        return week.map(w -> w.hardSets(m)).orElse(0.0);
    }

    private static double stimulus(Optional<WeekMetrics> week, Muscle m) {
        return week.map(w -> w.muscles().get(m)).map(MuscleWeek::stimulus).orElse(0.0);
    }

    /** Sessions keyed by week, day and their order on that day (two sessions may share a day). */
    private record SessionKey(int week, int day, int order) implements Comparable<SessionKey> {
        @Override
        public int compareTo(SessionKey o) {
            int c = Integer.compare(week, o.week);
            c = c != 0 ? c : Integer.compare(day, o.day);
            return c != 0 ? c : Integer.compare(order, o.order);
        }
    }

    private static Map<SessionKey, SessionMetrics> sessionsByKey(ProgrammeMetrics metrics) {
        Map<SessionKey, SessionMetrics> byKey = new TreeMap<>();
        for (WeekMetrics w : metrics.weeks()) {
            Map<Integer, Integer> seen = new LinkedHashMap<>();
            for (SessionMetrics s : w.sessions()) {
                int order = seen.merge(s.day(), 1, Integer::sum);
                byKey.put(new SessionKey(w.number(), s.day(), order), s);
            }
        }
        return byKey;
    }

    private static List<SessionChange> sessions(ProgrammeMetrics before, ProgrammeMetrics after) {
        Map<SessionKey, SessionMetrics> b = sessionsByKey(before);
        Map<SessionKey, SessionMetrics> a = sessionsByKey(after);
        TreeSet<SessionKey> keys = new TreeSet<>(b.keySet());
        keys.addAll(a.keySet());
        List<SessionChange> rows = new ArrayList<>();
        for (SessionKey k : keys) {
            SessionMetrics sb = b.get(k);
            SessionMetrics sa = a.get(k);
            Delta minutes = new Delta(sb == null ? OptionalDouble.empty() : OptionalDouble.of(sb.minutes()),
                    sa == null ? OptionalDouble.empty() : OptionalDouble.of(sa.minutes()), MINUTES_STEP);
            if (minutes.changed()) {
                rows.add(new SessionChange(k.week(), k.day(), (sa != null ? sa : sb).name(), minutes));
            }
        }
        return rows;
    }

    /** Every lift of every week, keyed by week then exercise. */
    private static Map<String, LiftWeek> liftsByKey(ProgrammeMetrics metrics) {
        Map<String, LiftWeek> byKey = new TreeMap<>();
        for (WeekMetrics w : metrics.weeks()) {
            for (LiftWeek lift : w.lifts()) {
                byKey.put(String.format(Locale.ROOT, "%06d|%s", w.number(), lift.exerciseId()), lift);
            }
        }
        return byKey;
    }

    private static OptionalDouble percent(LiftWeek lift) {
        return lift == null || lift.topSetFraction().isEmpty() ? OptionalDouble.empty()
                : OptionalDouble.of(lift.topSetFraction().getAsDouble() * 100);
    }

    private static OptionalDouble volumeLoad(LiftWeek lift) {
        return lift == null ? OptionalDouble.empty() : lift.volumeLoad();
    }

    private static List<LiftChange> lifts(ProgrammeMetrics before, ProgrammeMetrics after) {
        Map<String, LiftWeek> b = liftsByKey(before);
        Map<String, LiftWeek> a = liftsByKey(after);
        TreeSet<String> keys = new TreeSet<>(b.keySet());
        keys.addAll(a.keySet());
        List<LiftChange> rows = new ArrayList<>();
        for (String k : keys) {
            LiftWeek lb = b.get(k);
            LiftWeek la = a.get(k);
            int bar = k.indexOf('|');
            LiftChange row = new LiftChange(Integer.parseInt(k.substring(0, bar)), k.substring(bar + 1),
                    new Delta(percent(lb), percent(la), PERCENT_STEP),
                    new Delta(volumeLoad(lb), volumeLoad(la), LOAD_STEP));
            if (row.changed()) {
                rows.add(row);
            }
        }
        return rows;
    }
}
