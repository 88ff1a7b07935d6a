package dev.mesolint.core.report;

/** The charts of a programme's training figures, each with a caption that says what it shows and in which unit. */
final class TrainingCharts {
    private TrainingCharts() {
    }

    static void render(StringBuilder page, ProgrammeFigures f, String id) {
        // The heading shares a printed page with the first chart: no heading alone at the foot of a page.
        page.append("<section class=\"figures\" aria-labelledby=\"").append(id).append("-fig\">\n<div class=\"keep\">\n")
                .append("<h3 id=\"").append(id).append("-fig\">Training figures</h3>\n");
        figure(page, "Weekly hard sets per muscle",
                "Credited hard sets each week (a set within the profile's reps-in-reserve limit; a prime mover gets 1 "
                        + "set, a synergist half), against the profile's floor and cap for the muscle.",
                VolumeChart.render(f, id + "-volume"),
                legend(swatch("bar-ok", null), "within range", swatch("bar-low", "hatch"), "below floor (hatched)",
                        swatch("bar-high", "cross"), "over cap (cross-hatched)", line("floor"), "floor (dashed line)",
                        line("cap"), "cap (solid line)"));
        page.append("</div>\n");
        figure(page, "Hard sets by week and muscle",
                "The same figures as a grid, in credited hard sets; darker cells hold more sets.",
                VolumeHeatMap.render(f, id + "-heat"),
                legend(swatch("heat heat-1", null), "few sets", swatch("heat heat-5", null), "many sets",
                        swatch("heat heat-3 out", null), "outside floor-to-cap (dashed border, ↓ below or ↑ over)"));
        figure(page, "Stimulus per session, in fresh-set equivalents",
                "1 fresh-set equivalent is what one hard set of the prime mover gives when done without fatigue. "
                        + "\"Lost to fatigue\" is what fatigue left by the session's earlier sets takes from the later "
                        + "ones; the share in brackets is the lost part of the session's total.",
                StimulusChart.render(f, id + "-stimulus"),
                legend(swatch("bar-kept", null), "stimulus kept (solid)", swatch("bar-lost", "hatch"),
                        "lost to fatigue (hatched)"));
        figure(page, "Session minutes",
                "Estimated length of each session in minutes (reps, rests, warm-up sets and changeovers) against the "
                        + "programme's session budget.",
                SessionTimeChart.render(f, id + "-time"),
                legend(swatch("bar-time", null), "within budget", swatch("bar-high", "cross"),
                        "over budget (cross-hatched)", line("budget"), "budget (dashed line)"));
        page.append("</section>\n");
    }

    static void figure(StringBuilder page, String caption, String note, String svg, String legend) {
        page.append("<figure>\n<figcaption>").append(Html.esc(caption)).append("<p>").append(Html.esc(note))
                .append("</p></figcaption>\n").append(svg).append(legend).append("</figure>\n");
    }

    static String legend(String... swatchAndText) {
        StringBuilder out = new StringBuilder("<ul class=\"legend\">");
        for (int i = 0; i < swatchAndText.length; i += 2) {
            out.append("<li>").append(swatchAndText[i]).append(Html.esc(swatchAndText[i + 1])).append("</li>");
        }
        return out.append("</ul>\n").toString();
    }

    static String swatch(String cssClass, String pattern) {
        String overlay = pattern == null ? "" : "<rect width=\"22\" height=\"14\" fill=\"url(#" + pattern + ")\"/>";
        return "<svg width=\"22\" height=\"14\" aria-hidden=\"true\"><rect width=\"22\" height=\"14\" class=\""
                + cssClass + "\"/>" + overlay + "</svg>";
    }

    static String line(String cssClass) {
        return "<svg width=\"22\" height=\"14\" aria-hidden=\"true\"><line x1=\"11\" y1=\"0\" x2=\"11\" y2=\"14\" class=\""
                + cssClass + "\"/></svg>";
    }
}
