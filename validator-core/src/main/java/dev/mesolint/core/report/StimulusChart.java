package dev.mesolint.core.report;

/**
 * One stacked bar per session: the stimulus kept after the fatigue discount (solid) and the part the discount took
 * (hatched), labelled with both figures and the share lost.
 */
final class StimulusChart {
    private static final double LABEL_W = 230;
    private static final double PLOT_W = 330;
    private static final double NOTE_W = 230;
    private static final double ROW_H = 20;
    private static final double WEEK_H = 22;

    private StimulusChart() {
    }

    static String render(ProgrammeFigures figures, String id) {
        double max = figures.weeks().stream().flatMap(w -> w.sessions().stream())
                .mapToDouble(SessionFigures::rawStimulus).max().orElse(0);
        double scale = max <= 0 ? 1 : max;
        int rows = figures.weeks().stream().mapToInt(w -> w.sessions().size()).sum();
        double height = figures.weeks().size() * WEEK_H + rows * ROW_H + 10;
        Svg svg = new Svg(id, LABEL_W + PLOT_W + NOTE_W, height, "Stimulus per session, kept and lost to fatigue",
                "One bar per session: the solid part is the stimulus kept after the fatigue discount, the hatched part "
                        + "the stimulus lost to fatigue accumulated earlier in the session.");
        double y = 4;
        for (WeekFigures w : figures.weeks()) {
            svg.text(4, y + WEEK_H - 7, "Week " + w.week() + (w.deload() ? " (deload)" : ""), "label strong",
                    "start");
            y += WEEK_H;
            for (SessionFigures s : w.sessions()) {
                double raw = s.rawStimulus();
                double kept = s.keptStimulus();
                double lost = Math.max(0, raw - kept);
                double keptW = kept / scale * PLOT_W;
                double lostW = lost / scale * PLOT_W;
                String share = raw <= 0 ? "0%" : Math.round(lost / raw * 100) + "%";
                svg.text(LABEL_W - 8, y + ROW_H - 6, s.label(), "label", "end");
                svg.rect(LABEL_W, y + 3, keptW, ROW_H - 6, "bar-kept",
                        "Week " + w.week() + " " + s.label() + ": " + Html.num(kept) + " stimulus kept");
                svg.patterned(LABEL_W + keptW, y + 3, lostW, ROW_H - 6, "bar-lost", "hatch",
                        "Week " + w.week() + " " + s.label() + ": " + Html.num(lost) + " stimulus lost to fatigue ("
                                + share + ")");
                svg.text(LABEL_W + keptW + lostW + 4, y + ROW_H - 6, Html.num(kept) + " kept · " + Html.num(lost)
                        + " lost (" + share + ")", "value", "start");
                y += ROW_H;
            }
        }
        return svg.end();
    }
}
