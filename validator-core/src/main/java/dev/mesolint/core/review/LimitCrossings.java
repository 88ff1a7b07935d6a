package dev.mesolint.core.review;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.report.ProgrammeFigures;
import dev.mesolint.core.report.VolumeBounds;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeSet;

/**
 * The profile limits a change crosses: a muscle's weekly hard sets moving over the cap or under the floor (or back),
 * and a session's minutes moving over the programme's budget (or back). Each side is judged under its own profile, so
 * a change of profile that moves a limit counts too.
 */
final class LimitCrossings {
    private LimitCrossings() {
    }

    /** Where a figure stands against its limits. */
    private enum Standing {
        BELOW, WITHIN, ABOVE
    }

    static List<LimitCrossing> between(ProgrammeMetrics before, ProgrammeFigures boundsBefore,
            ProgrammeMetrics after, ProgrammeFigures boundsAfter) {
        List<LimitCrossing> crossings = new ArrayList<>();
        TreeSet<Integer> weeks = new TreeSet<>();
        before.weeks().forEach(w -> weeks.add(w.number()));
        after.weeks().forEach(w -> weeks.add(w.number()));
        for (int week : weeks) {
            Optional<WeekMetrics> b = before.week(week);
            Optional<WeekMetrics> a = after.week(week);
            TreeSet<Muscle> muscles = new TreeSet<>();
            b.ifPresent(w -> muscles.addAll(w.muscles().keySet()));
            a.ifPresent(w -> muscles.addAll(w.muscles().keySet()));
            for (Muscle m : muscles) {
                double setsBefore = b.map(w -> w.hardSets(m)).orElse(0.0);
                double setsAfter = a.map(w -> w.hardSets(m)).orElse(0.0);
                VolumeBounds vb = boundsBefore.weeklySetBounds(m.yamlName());
                VolumeBounds va = boundsAfter.weeklySetBounds(m.yamlName());
                crossing(week, m.yamlName(), setsBefore, standing(vb, setsBefore), setsAfter, va,
                        standing(va, setsAfter)).ifPresent(crossings::add);
            }
            if (a.isPresent()) {
                sessionBudget(week, b, a.get(), boundsBefore.sessionBudgetMinutes(),
                        boundsAfter.sessionBudgetMinutes(), crossings);
            }
        }
        return crossings;
    }

    private static Standing standing(VolumeBounds bounds, double sets) {
        return bounds.above(sets) ? Standing.ABOVE : bounds.below(sets) ? Standing.BELOW : Standing.WITHIN;
    }

    private static Optional<LimitCrossing> crossing(int week, String muscle, double before, Standing was,
            double after, VolumeBounds limits, Standing is) {
        if (was == is) {
            return Optional.empty();
        }
        String measure = "weekly hard sets";
        LimitCrossing.Kind kind;
        double limit;
        if (is == Standing.ABOVE) {
            kind = LimitCrossing.Kind.NOW_ABOVE_CAP;
            limit = limits.cap();
        } else if (is == Standing.BELOW) {
            kind = LimitCrossing.Kind.NOW_BELOW_FLOOR;
            limit = limits.floor();
        } else if (was == Standing.ABOVE) {
            kind = LimitCrossing.Kind.BACK_UNDER_CAP;
            limit = limits.cap();
        } else {
            kind = LimitCrossing.Kind.BACK_OVER_FLOOR;
            limit = limits.floor();
        }
        return Optional.of(new LimitCrossing(week, muscle, measure, before, after, limit, kind));
    }

    /** Sessions are matched by day and order on the day, as in the figure tables. */
    private static void sessionBudget(int week, Optional<WeekMetrics> before, WeekMetrics after,
            OptionalDouble budgetBefore, OptionalDouble budgetAfter, List<LimitCrossing> crossings) {
        List<SessionMetrics> was = before.map(WeekMetrics::sessions).orElse(List.of());
        for (int i = 0; i < after.sessions().size(); i++) {
            SessionMetrics now = after.sessions().get(i);
            Optional<SessionMetrics> then = sameSession(was, after.sessions(), i);
            boolean overBefore = then.isPresent() && budgetBefore.isPresent()
                    && then.get().minutes() > budgetBefore.getAsDouble();
            boolean overAfter = budgetAfter.isPresent() && now.minutes() > budgetAfter.getAsDouble();
            if (then.isEmpty() || overBefore == overAfter) {
                continue;
            }
            double limit = (overAfter ? budgetAfter : budgetBefore).getAsDouble();
            crossings.add(new LimitCrossing(week, "day " + now.day() + " (" + now.name() + ")", "session minutes",
                    then.get().minutes(), now.minutes(), limit, overAfter ? LimitCrossing.Kind.NOW_OVER_BUDGET
                            : LimitCrossing.Kind.BACK_WITHIN_BUDGET));
        }
    }

    private static Optional<SessionMetrics> sameSession(List<SessionMetrics> was, List<SessionMetrics> now, int i) {
        int day = now.get(i).day();
        long order = now.subList(0, i).stream().filter(s -> s.day() == day).count();
        return was.stream().filter(s -> s.day() == day).skip(order).findFirst();
    }
}
