package dev.mesolint.core.report;

import dev.mesolint.core.model.IntensityZone;
import dev.mesolint.core.model.LiftSession;
import dev.mesolint.core.model.LiftWeek;
import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.model.PrilepinTable;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.WeekMetrics;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * The strength picture per lift and week, from the training model's figures: top-set %1RM, mean intensity, volume
 * load and heavy reps as a small range chart and a table, and reps per intensity zone per session, read against
 * Prilepin's table where the programme is checked under the strength profile. Only lifts with a known share of 1RM
 * in some week are shown.
 */
final class StrengthView {
    /** Prilepin's ranges ({@link PrilepinTable}) are shown only with the default zone bounds. */
    private static final double[] DEFAULT_BOUNDS = {0.55, 0.70, 0.80, 0.90};

    private StrengthView() {
    }

    static void render(StringBuilder page, ProgrammeMetrics metrics, SetLoads loads, boolean strengthProfile,
            String id) {
        List<String> lifts = lifts(metrics);
        if (lifts.isEmpty()) {
            return;
        }
        String unit = metrics.units().symbol();
        boolean prilepin = strengthProfile && defaultBounds(metrics.parameters());
        page.append("<section class=\"strength\" aria-labelledby=\"").append(id).append("-str\">\n<div class=\"keep\">\n")
                .append("<h3 id=\"").append(id).append("-str\">Strength figures per lift</h3>\n<p class=\"note\">")
                .append(Html.esc("For each lift written with a share of 1RM: the top set (the heaviest set's share of "
                        + "1RM and its weight rounded to plates), the mean intensity (share of 1RM averaged over reps), volume load (reps × weight, in "
                        + unit + ") and heavy reps (reps at " + SetLoads.percent(metrics.parameters().heavyRepsFrom())
                        + " of 1RM or more). Sets whose share of 1RM is unknown are left out of the intensities."))
                .append("</p>\n");
        TrainingCharts.figure(page, "Top set and mean intensity per week, in % of 1RM",
                "One row per lift and week: the square is the top set, the ring the mean intensity, the line between "
                        + "them the spread of the week's loads.",
                StrengthChart.render(metrics, lifts, loads, id + "-intensity"),
                TrainingCharts.legend(StrengthChart.topSwatch(), "top set (filled square)", StrengthChart.meanSwatch(),
                        "mean intensity (ring)"));
        page.append("</div>\n");
        for (String lift : lifts) {
            weekTable(page, metrics, lift, loads, unit);
            zoneTable(page, metrics, lift, loads.name(lift), prilepin);
        }
        if (prilepin) {
            page.append("<p class=\"note\">").append(Html.esc("Prilepin's ranges are total reps per session in each "
                    + "zone, summarised from elite weightlifters in the competition lifts (the version docs/model.md "
                    + "gives, from memory): a description of what those lifters did, not a target for every lifter. "
                    + "▲ marks a session above the range, ▼ one below it, for zones the session trains."))
                    .append("</p>\n");
        }
        page.append("</section>\n");
    }

    /** Lifts with a known share of 1RM in some week, in the order they first appear. */
    static List<String> lifts(ProgrammeMetrics metrics) {
        Set<String> lifts = new LinkedHashSet<>();
        for (WeekMetrics w : metrics.weeks()) {
            w.lifts().stream().filter(l -> l.topSetFraction().isPresent()).forEach(l -> lifts.add(l.exerciseId()));
        }
        return List.copyOf(lifts);
    }

    private static boolean defaultBounds(ModelParameters p) {
        double[] bounds = {p.intensityZone1From(), p.intensityZone2From(), p.intensityZone3From(),
            p.intensityZone4From()};
        for (int i = 0; i < bounds.length; i++) {
            if (Math.abs(bounds[i] - DEFAULT_BOUNDS[i]) > 1e-9) {
                return false;
            }
        }
        return true;
    }

    private static void weekTable(StringBuilder page, ProgrammeMetrics metrics, String lift, SetLoads loads,
            String unit) {
        String name = loads.name(lift);
        page.append("<table class=\"figures-table\">\n<caption>").append(Html.esc(name))
                .append(": per week</caption>\n<thead><tr><th scope=\"col\">Week</th><th scope=\"col\">Sets</th>")
                .append("<th scope=\"col\">Reps</th><th scope=\"col\">Top set</th>")
                .append("<th scope=\"col\">Mean intensity</th><th scope=\"col\">Volume load</th>")
                .append("<th scope=\"col\">Heavy reps</th></tr></thead>\n<tbody>\n");
        for (WeekMetrics w : metrics.weeks()) {
            Optional<LiftWeek> found = w.lift(lift);
            if (found.isEmpty()) {
                continue;
            }
            LiftWeek l = found.get();
            page.append("<tr><th scope=\"row\">").append(w.number()).append(w.deload() ? " (deload)" : "")
                    .append("</th><td>").append(l.sets()).append("</td><td>").append(Html.num(l.reps()))
                    .append("</td><td>").append(share(l.topSetFraction()));
            // The weight on the bar, rounded to plates as the prescription rounds it.
            if (l.topSetLoad().isPresent() && l.topSetFraction().isPresent()) {
                double weight = loads.plates().round(l.topSetLoad().getAsDouble(), l.topSetFraction().getAsDouble(),
                        loads.capFor(lift).isPresent()).weight();
                page.append(" · ").append(Html.weight(weight)).append(' ').append(unit);
            }
            page.append("</td><td>").append(share(l.meanIntensity())).append("</td><td>")
                    .append(l.volumeLoad().isPresent() ? Html.num(l.volumeLoad().getAsDouble()) + " " + unit : "—")
                    .append("</td><td>").append(Html.num(l.heavyReps())).append("</td></tr>\n");
        }
        page.append("</tbody>\n</table>\n");
    }

    private static void zoneTable(StringBuilder page, ProgrammeMetrics metrics, String lift, String name,
            boolean prilepin) {
        List<String[]> rows = new ArrayList<>();
        List<IntensityZone> header = null;
        for (WeekMetrics w : metrics.weeks()) {
            for (SessionMetrics s : w.sessions()) {
                Optional<LiftSession> found = s.lift(lift);
                if (found.isEmpty()) {
                    continue;
                }
                header = found.get().zones();
                String[] row = new String[header.size() + 1];
                row[0] = "Week " + w.number() + " · day " + s.day();
                for (IntensityZone z : header) {
                    row[z.index() + 1] = zoneCell(z, prilepin);
                }
                rows.add(row);
            }
        }
        if (header == null) {
            return;
        }
        page.append("<table class=\"figures-table zones\">\n<caption>").append(Html.esc(name))
                .append(": reps per intensity zone and session</caption>\n<thead><tr><th scope=\"col\">Session</th>");
        for (IntensityZone z : header) {
            page.append("<th scope=\"col\">").append(Html.esc(zoneName(z)));
            if (prilepin && z.index() >= 1) {
                page.append("<span class=\"detail\">Prilepin ").append(PrilepinTable.minReps(z.index())).append("–")
                        .append(PrilepinTable.maxReps(z.index()))
                        .append("</span>");
            }
            page.append("</th>");
        }
        page.append("</tr></thead>\n<tbody>\n");
        for (String[] row : rows) {
            page.append("<tr><th scope=\"row\">").append(Html.esc(row[0])).append("</th>");
            for (int i = 1; i < row.length; i++) {
                page.append(row[i]);
            }
            page.append("</tr>\n");
        }
        page.append("</tbody>\n</table>\n");
    }

    private static String zoneCell(IntensityZone z, boolean prilepin) {
        if (z.reps() <= 0) {
            return "<td><span class=\"none\">—</span></td>";
        }
        String reps = Html.num(z.reps());
        if (prilepin && z.index() >= 1) {
            int min = PrilepinTable.minReps(z.index());
            int max = PrilepinTable.maxReps(z.index());
            if (z.reps() > max) {
                return "<td class=\"out\">" + reps + " ▲ <span class=\"detail\">above " + max + "</span></td>";
            }
            if (z.reps() < min) {
                return "<td class=\"out\">" + reps + " ▼ <span class=\"detail\">below " + min + "</span></td>";
            }
        }
        return "<td>" + reps + "</td>";
    }

    /** {@code under 55%}, {@code 55–70%}, {@code 90% and over}. */
    static String zoneName(IntensityZone z) {
        if (z.index() == 0) {
            return "under " + SetLoads.percent(z.below().orElse(0));
        }
        return z.below().isPresent() ? Html.weight(z.from() * 100) + "–" + SetLoads.percent(z.below().getAsDouble())
                : SetLoads.percent(z.from()) + " and over";
    }

    static String share(OptionalDouble share) {
        return share.isPresent() ? SetLoads.percent(Math.round(share.getAsDouble() * 1000) / 1000.0) : "—";
    }
}
