package dev.mesolint.core.report;

import java.util.OptionalDouble;

/**
 * One bar per session with its estimated minutes against the programme's session budget (a dashed line); sessions
 * over the budget are cross-hatched and say by how much.
 */
final class SessionTimeChart {
    private static final double LABEL_W = 230;
    private static final double PLOT_W = 360;
    private static final double NOTE_W = 200;
    private static final double ROW_H = 20;
    private static final double WEEK_H = 22;
    private static final double AXIS_H = 24;

    private SessionTimeChart() {
    }

    static String render(ProgrammeFigures figures, String id) {
        OptionalDouble budget = figures.sessionBudgetMinutes();
        double max = figures.weeks().stream().flatMap(w -> w.sessions().stream()).mapToDouble(SessionFigures::minutes)
                .max().orElse(0);
        double scaleMax = VolumeChart.niceCeiling(Math.max(1, Math.max(max, budget.orElse(0)) * 1.05));
        int rows = figures.weeks().stream().mapToInt(w -> w.sessions().size()).sum();
        double height = AXIS_H + figures.weeks().size() * WEEK_H + rows * ROW_H + 8;
        String budgetText = budget.isPresent() ? "the dashed line marks the budget of " + Html.num(budget.getAsDouble())
                + " minutes" : "the programme sets no session budget";
        Svg svg = new Svg(id, LABEL_W + PLOT_W + NOTE_W, height, "Session minutes against the budget",
                "One bar per session with its estimated minutes; " + budgetText + ".");
        double step = scaleMax <= 30 ? 5 : scaleMax <= 120 ? 15 : 30;
        for (double v = 0; v <= scaleMax + 1e-9; v += step) {
            double x = LABEL_W + v / scaleMax * PLOT_W;
            svg.line(x, AXIS_H - 4, x, height - 6, "grid", null);
            svg.text(x, AXIS_H - 8, Html.num(v), "tick", "middle");
        }
        svg.text(LABEL_W - 8, AXIS_H - 8, "minutes", "tick", "end");
        double y = AXIS_H;
        for (WeekFigures w : figures.weeks()) {
            svg.text(4, y + WEEK_H - 7, "Week " + w.week() + (w.deload() ? " (deload)" : ""), "label strong",
                    "start");
            y += WEEK_H;
            for (SessionFigures s : w.sessions()) {
                double width = s.minutes() / scaleMax * PLOT_W;
                boolean over = budget.isPresent() && s.minutes() > budget.getAsDouble();
                String tooltip = "Week " + w.week() + " " + s.label() + ": " + Html.num(s.minutes()) + " minutes";
                svg.text(LABEL_W - 8, y + ROW_H - 6, s.label(), "label", "end");
                String note = Html.num(s.minutes()) + " min";
                if (over) {
                    note += " · " + Html.num(s.minutes() - budget.getAsDouble()) + " over budget";
                    svg.patterned(LABEL_W, y + 3, width, ROW_H - 6, "bar-high", "cross", tooltip + " (over budget)");
                } else {
                    svg.rect(LABEL_W, y + 3, width, ROW_H - 6, "bar-time", tooltip);
                }
                svg.label(LABEL_W + width + 4, y + ROW_H - 6, note, "value");
                y += ROW_H;
            }
        }
        if (budget.isPresent()) {
            double x = LABEL_W + budget.getAsDouble() / scaleMax * PLOT_W;
            svg.line(x, AXIS_H - 2, x, height - 6, "budget", "Session budget: " + Html.num(budget.getAsDouble())
                    + " minutes");
        }
        return svg.end();
    }
}
