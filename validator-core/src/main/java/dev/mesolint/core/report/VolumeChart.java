package dev.mesolint.core.report;

import java.util.List;

/**
 * Horizontal bars of the weekly credited hard sets per muscle, one bar per week, against the profile's floor (dashed
 * line) and cap (solid line). Bars below the floor are hatched, bars over the cap cross-hatched, and every bar is
 * labelled with its week, its value and its status in words.
 */
final class VolumeChart {
    private static final double LABEL_W = 170;
    private static final double PLOT_W = 430;
    private static final double NOTE_W = 170;
    private static final double BAR_H = 12;
    private static final double BAR_GAP = 3;
    private static final double GROUP_PAD = 12;
    private static final double AXIS_H = 30;

    private VolumeChart() {
    }

    static String render(ProgrammeFigures figures, String id) {
        List<String> muscles = figures.muscles();
        List<WeekFigures> weeks = figures.weeks();
        double max = 1;
        for (String m : muscles) {
            max = Math.max(max, figures.weeklySetBounds(m).cap());
            for (WeekFigures w : weeks) {
                max = Math.max(max, w.hardSets(m));
            }
        }
        double scaleMax = niceCeiling(max);
        double groupH = weeks.size() * (BAR_H + BAR_GAP) - BAR_GAP + GROUP_PAD * 2;
        double height = AXIS_H + muscles.size() * groupH + 10;
        Svg svg = new Svg(id, LABEL_W + PLOT_W + NOTE_W, height, "Weekly hard sets per muscle against floor and cap",
                "For each muscle, one bar per week shows the credited hard sets; a dashed line marks the floor and a "
                        + "solid line the cap of the profile. Each bar is labelled with its week, value and status.");
        axis(svg, scaleMax, height);
        double y = AXIS_H;
        for (int i = 0; i < muscles.size(); i++) {
            String muscle = muscles.get(i);
            VolumeBounds bounds = figures.weeklySetBounds(muscle);
            if (i % 2 == 0) {
                svg.rect(0, y, LABEL_W + PLOT_W + NOTE_W, groupH, "band", null);
            }
            svg.text(LABEL_W - 10, y + groupH / 2 - 2, Html.muscle(muscle), "label strong", "end");
            svg.text(LABEL_W - 10, y + groupH / 2 + 12, "floor " + Html.num(bounds.floor()) + " · cap "
                    + Html.num(bounds.cap()), "label small", "end");
            double by = y + GROUP_PAD;
            for (WeekFigures w : weeks) {
                double sets = w.hardSets(muscle);
                double width = x(sets, scaleMax) - LABEL_W;
                String status = bounds.below(sets) ? "below floor" : bounds.above(sets) ? "over cap" : "";
                String label = weekLabel(w) + " · " + Html.num(sets) + (status.isEmpty() ? "" : " · " + status);
                String tooltip = Html.muscle(muscle) + ", " + weekLabel(w) + ": " + Html.num(sets) + " hard sets"
                        + (status.isEmpty() ? "" : " (" + status + ")");
                if (bounds.below(sets)) {
                    svg.patterned(LABEL_W, by, width, BAR_H, "bar-low", "hatch", tooltip);
                } else if (bounds.above(sets)) {
                    svg.patterned(LABEL_W, by, width, BAR_H, "bar-high", "cross", tooltip);
                } else {
                    svg.rect(LABEL_W, by, width, BAR_H, "bar-ok", tooltip);
                }
                svg.label(LABEL_W + width + 4, by + BAR_H - 2, label, "value");
                by += BAR_H + BAR_GAP;
            }
            double top = y + 4;
            double bottom = y + groupH - 4;
            svg.line(x(bounds.floor(), scaleMax), top, x(bounds.floor(), scaleMax), bottom, "floor",
                    Html.muscle(muscle) + " floor: " + Html.num(bounds.floor()) + " hard sets a week");
            svg.line(x(bounds.cap(), scaleMax), top, x(bounds.cap(), scaleMax), bottom, "cap",
                    Html.muscle(muscle) + " cap: " + Html.num(bounds.cap()) + " hard sets a week");
            y += groupH;
        }
        return svg.end();
    }

    private static void axis(Svg svg, double scaleMax, double height) {
        double step = scaleMax <= 10 ? 2 : scaleMax <= 30 ? 5 : 10;
        for (double v = 0; v <= scaleMax + 1e-9; v += step) {
            double x = x(v, scaleMax);
            svg.line(x, AXIS_H - 6, x, height - 10, "grid", null);
            svg.text(x, AXIS_H - 10, Html.num(v), "tick", "middle");
        }
        svg.text(LABEL_W - 10, AXIS_H - 10, "hard sets / week", "tick", "end");
    }

    private static double x(double value, double scaleMax) {
        return LABEL_W + Math.max(0, value) / scaleMax * PLOT_W;
    }

    static String weekLabel(WeekFigures w) {
        return "W" + w.week() + (w.deload() ? " deload" : "");
    }

    /** The next round number at or above {@code value}: 10, 20, 25, 30, 40... */
    static double niceCeiling(double value) {
        double step = value <= 10 ? 2 : value <= 30 ? 5 : 10;
        return Math.ceil(value / step) * step;
    }
}
