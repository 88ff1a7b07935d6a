package dev.mesolint.core.report;

import dev.mesolint.core.model.LiftWeek;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.model.WeekMetrics;
import java.util.List;
import java.util.Optional;

/**
 * A range chart of each lift's intensity by week: a filled square at the top set's share of 1RM, a ring at the mean
 * intensity, a line between them, on a scale from 50% to 100% of 1RM. Shapes, not colours, tell the two apart.
 */
final class StrengthChart {
    private static final double LABEL_W = 200;
    private static final double PLOT_W = 400;
    private static final double NOTE_W = 190;
    private static final double ROW_H = 18;
    private static final double LIFT_H = 22;
    private static final double AXIS_H = 22;
    private static final double FROM = 0.5;
    private static final double TO = 1.0;

    private StrengthChart() {
    }

    static String render(ProgrammeMetrics metrics, List<String> lifts, SetLoads loads, String id) {
        int rows = 0;
        for (String lift : lifts) {
            rows += metrics.liftWeeks(lift).size();
        }
        double height = AXIS_H + lifts.size() * LIFT_H + rows * ROW_H + 8;
        Svg svg = new Svg(id, LABEL_W + PLOT_W + NOTE_W, height, "Top set and mean intensity per lift and week",
                "For each lift and week, the top set's share of 1RM (square) and the mean intensity (ring), on a "
                        + "scale from 50% to 100% of 1RM.");
        for (int p = 50; p <= 100; p += 10) {
            double x = x(p / 100.0);
            svg.line(x, AXIS_H - 4, x, height - 4, "grid", null);
            svg.text(x, AXIS_H - 8, p + "%", "tick", "middle");
        }
        double y = AXIS_H;
        for (String lift : lifts) {
            svg.text(4, y + LIFT_H - 7, loads.name(lift), "label strong", "start");
            y += LIFT_H;
            for (WeekMetrics w : metrics.weeks()) {
                Optional<LiftWeek> found = w.lift(lift);
                if (found.isEmpty()) {
                    continue;
                }
                LiftWeek l = found.get();
                double mid = y + ROW_H / 2;
                svg.text(LABEL_W - 8, mid + 4, "Week " + w.number() + (w.deload() ? " (deload)" : ""), "label", "end");
                String what = loads.name(lift) + ", week " + w.number() + ": top set "
                        + StrengthView.share(l.topSetFraction()) + ", mean intensity " + StrengthView.share(l.meanIntensity());
                if (l.topSetFraction().isPresent() && l.meanIntensity().isPresent()) {
                    svg.line(x(l.meanIntensity().getAsDouble()), mid, x(l.topSetFraction().getAsDouble()), mid,
                            "spread", null);
                }
                l.meanIntensity().ifPresent(m -> svg.circle(x(m), mid, 4.5, "mean-dot", what));
                l.topSetFraction().ifPresent(t -> svg.rect(x(t) - 4.5, mid - 4.5, 9, 9, "top-dot", what));
                svg.text(LABEL_W + PLOT_W + 8, mid + 4, "top " + StrengthView.share(l.topSetFraction()) + " · mean "
                        + StrengthView.share(l.meanIntensity()), "value", "start");
                y += ROW_H;
            }
        }
        return svg.end();
    }

    private static double x(double share) {
        double clamped = Math.max(FROM, Math.min(TO, share));
        return LABEL_W + (clamped - FROM) / (TO - FROM) * PLOT_W;
    }

    static String topSwatch() {
        return "<svg width=\"22\" height=\"14\" aria-hidden=\"true\"><rect x=\"6\" y=\"2.5\" width=\"9\" height=\"9\" "
                + "class=\"top-dot\"/></svg>";
    }

    static String meanSwatch() {
        return "<svg width=\"22\" height=\"14\" aria-hidden=\"true\"><circle cx=\"11\" cy=\"7\" r=\"4.5\" "
                + "class=\"mean-dot\"/></svg>";
    }
}
