package dev.mesolint.core.report;

import java.util.List;

/**
 * A week × muscle grid of credited hard sets with the number printed in every cell; darker means more sets. A cell
 * below the floor shows "↓ below", over the cap "↑ over", both with a heavy dashed border.
 */
final class VolumeHeatMap {
    private static final double LABEL_W = 150;
    private static final double CELL_W = 86;
    private static final double CELL_H = 30;
    private static final double HEAD_H = 28;
    static final int SHADES = 6;

    private VolumeHeatMap() {
    }

    static String render(ProgrammeFigures figures, String id) {
        List<String> muscles = figures.muscles();
        List<WeekFigures> weeks = figures.weeks();
        double max = 0;
        for (WeekFigures w : weeks) {
            for (String m : muscles) {
                max = Math.max(max, w.hardSets(m));
            }
        }
        Svg svg = new Svg(id, LABEL_W + weeks.size() * CELL_W + 10, HEAD_H + muscles.size() * CELL_H + 6,
                "Hard sets per muscle and week",
                "A grid with one row per muscle and one column per week; each cell prints the week's credited hard "
                        + "sets, darker cells hold more sets, and cells outside the floor-to-cap range are marked in "
                        + "words.");
        for (int c = 0; c < weeks.size(); c++) {
            svg.text(LABEL_W + c * CELL_W + CELL_W / 2, HEAD_H - 10, VolumeChart.weekLabel(weeks.get(c)), "label strong",
                    "middle");
        }
        for (int r = 0; r < muscles.size(); r++) {
            String muscle = muscles.get(r);
            VolumeBounds bounds = figures.weeklySetBounds(muscle);
            double y = HEAD_H + r * CELL_H;
            svg.text(LABEL_W - 8, y + CELL_H / 2 + 4, Html.muscle(muscle), "label", "end");
            for (int c = 0; c < weeks.size(); c++) {
                double sets = weeks.get(c).hardSets(muscle);
                int shade = shade(sets, max);
                double x = LABEL_W + c * CELL_W;
                String mark = bounds.below(sets) ? " ↓ below" : bounds.above(sets) ? " ↑ over" : "";
                String tooltip = Html.muscle(muscle) + ", " + VolumeChart.weekLabel(weeks.get(c)) + ": "
                        + Html.num(sets) + " hard sets (floor " + Html.num(bounds.floor()) + ", cap "
                        + Html.num(bounds.cap()) + ")";
                svg.rect(x + 1, y + 1, CELL_W - 2, CELL_H - 2, "heat heat-" + shade + (mark.isEmpty() ? "" : " out"),
                        tooltip);
                svg.text(x + CELL_W / 2, y + CELL_H / 2 + 4, Html.num(sets) + mark,
                        shade >= SHADES / 2 ? "cell-text on-dark" : "cell-text", "middle");
            }
        }
        return svg.end();
    }

    /** 0 (no sets) to SHADES - 1 (the most sets in the programme). */
    static int shade(double sets, double max) {
        if (sets <= 0 || max <= 0) {
            return 0;
        }
        return Math.max(1, Math.min(SHADES - 1, (int) Math.ceil(sets / max * (SHADES - 1))));
    }
}
