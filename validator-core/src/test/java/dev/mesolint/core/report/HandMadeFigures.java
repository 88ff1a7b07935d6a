package dev.mesolint.core.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * Invented figures for the Harbourside upper/lower sample (5 weeks, days 1, 2, 4, 5), standing in for the training
 * model in report tests. They are chosen to show every state the charts draw: biceps below the floor in week 1,
 * quadriceps over the cap in week 4, side delts with a profile-specific range, sessions over the 75-minute budget,
 * and a deload in week 5.
 */
class HandMadeFigures implements ProgrammeFigures {
    static final String FILE = "sample-programs/programmes/upper-lower-hypertrophy.yaml";
    static final double BUDGET = 75;

    /** Weekly hard sets per muscle for weeks 1..5, in display order (a new map per call: no shared state). */
    static Map<String, List<Double>> sets() {
        Map<String, List<Double>> sets = new LinkedHashMap<>();
        sets.put("chest", List.of(9.0, 9.0, 10.0, 10.0, 6.0));
        sets.put("lats", List.of(9.0, 9.0, 10.0, 10.0, 6.0));
        sets.put("upper-back", List.of(6.0, 6.0, 7.0, 7.0, 4.0));
        sets.put("side-delts", List.of(6.0, 6.0, 8.0, 8.0, 4.0));
        sets.put("biceps", List.of(3.0, 6.0, 8.0, 8.0, 4.0));
        sets.put("triceps", List.of(6.0, 6.0, 8.0, 8.0, 4.0));
        sets.put("quadriceps", List.of(12.0, 14.0, 18.0, 22.0, 8.0));
        sets.put("hamstrings", List.of(9.0, 9.0, 9.5, 9.5, 6.0));
        sets.put("glutes", List.of(7.5, 7.5, 8.0, 8.0, 5.0));
        return sets;
    }

    private final String file;

    HandMadeFigures() {
        this(FILE);
    }

    HandMadeFigures(String file) {
        this.file = file;
    }

    @Override
    public String file() {
        return file;
    }

    @Override
    public String programmeId() {
        return "harbour-upper-lower";
    }

    @Override
    public List<WeekFigures> weeks() {
        List<WeekFigures> weeks = new ArrayList<>();
        for (int w = 1; w <= 5; w++) {
            Map<String, MuscleWeek> muscles = new LinkedHashMap<>();
            for (Map.Entry<String, List<Double>> e : sets().entrySet()) {
                double sets = e.getValue().get(w - 1);
                muscles.put(e.getKey(), new MuscleWeek(sets, sets * 5, sets * 4.2));
            }
            weeks.add(new WeekFigures(w, w == 5, muscles, sessions(w)));
        }
        return weeks;
    }

    private static List<SessionFigures> sessions(int week) {
        int[] days = {1, 2, 4, 5};
        String[] names = {"Upper A", "Lower A", "Upper B", "Lower B"};
        int[] lines = {22, 59, 98, 140};
        double[] minutes = {68, 72, 70, 78};
        List<SessionFigures> sessions = new ArrayList<>();
        for (int i = 0; i < days.length; i++) {
            double length = week == 5 ? minutes[i] - 18 : minutes[i] + (week - 1) * 2;
            sessions.add(new SessionFigures(days[i], names[i], lines[i], length, sets(week, i)));
        }
        return sessions;
    }

    /** Six sets a session; each later set keeps a little less of its stimulus. */
    private static List<SetFigures> sets(int week, int session) {
        List<SetFigures> sets = new ArrayList<>();
        String[] exercises = {"barbell-bench-press", "chest-supported-dumbbell-row", "cable-lat-pulldown",
            "cable-curl", "dumbbell-lateral-raise", "machine-leg-press"};
        int count = week == 5 ? 4 : 6;
        for (int s = 0; s < count; s++) {
            double raw = 2.0 + 0.1 * week + 0.05 * session;
            double kept = raw * (1 - 0.04 * s - 0.01 * session);
            sets.add(new SetFigures(exercises[s], 25 + 6 * s, raw, kept));
        }
        return sets;
    }

    @Override
    public VolumeBounds weeklySetBounds(String muscle) {
        return muscle.equals("side-delts") ? new VolumeBounds(6, 16) : VolumeBounds.DEFAULTS;
    }

    @Override
    public OptionalDouble sessionBudgetMinutes() {
        return OptionalDouble.of(BUDGET);
    }
}
