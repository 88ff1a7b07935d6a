package dev.mesolint.core.report;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Week;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A programme as written, week by session by exercise: sets x reps, effort, the load worked out and rounded to
 * plates, rest, tempo and notes. Cells that differ from the week before carry a Δ. In the coach's report each row
 * links to its line and lists its findings; in the athlete's sheet it shows the prescription only.
 */
final class PrescriptionView {
    /** What the table shows besides the prescription. */
    enum Mode {
        /** The coach's report: findings and source lines beside each row. */
        REPORT,
        /** The athlete's sheet: the prescription only, one week per printed page. */
        SHEET
    }

    /** Fixed column widths, so that the tables of a week line up. */
    private static final String SHEET_COLUMNS = columns(30, 11, 10, 15, 8, 8, 18);
    private static final String REPORT_COLUMNS = columns(21, 9, 9, 15, 7, 7, 13, 13, 6);

    private final Programme programme;
    private final SetLoads loads;
    private final Mode mode;
    private final ShownFindings findings;
    private final SourceLinks links;
    private final String file;

    /** @param findings, links and file are read in {@link Mode#REPORT} only (may be null in the sheet) */
    PrescriptionView(Programme programme, SetLoads loads, Mode mode, ShownFindings findings, SourceLinks links,
            String file) {
        this.programme = programme;
        this.loads = loads;
        this.mode = mode;
        this.findings = findings;
        this.links = links;
        this.file = file;
    }

    /** The rounding rule as the page states it, with the step in use. */
    static String roundingRule(PlateRounding plates, String source) {
        return "Loads written as a share of 1RM are worked out from the athlete's 1RM and rounded to "
                + plates.label() + " steps (" + source + "): to the nearest step, except under an athlete's load cap "
                + "and at near-maximal loads (" + Html.weight(PlateRounding.NEAR_MAXIMAL * 100) + "% of 1RM or more), "
                + "where they go down to the step below so that the bar never holds more than the share written or "
                + "allowed (common practice).";
    }

    void render(StringBuilder page, String id) {
        Week previous = null;
        for (Week week : programme.weeks()) {
            week(page, id + "-w" + week.number(), week, previous, previous == null);
            previous = week;
        }
    }

    private void week(StringBuilder page, String id, Week week, Week previous, boolean first) {
        page.append("<section class=\"week").append(first ? " first" : "").append("\" id=\"").append(id)
                .append("\" aria-labelledby=\"").append(id).append("-h\">\n<div class=\"keep\">\n<h4 id=\"").append(id)
                .append("-h\">Week ").append(week.number());
        if (week.deload()) {
            page.append(" <span class=\"tag\">deload</span>");
        }
        page.append("</h4>\n");
        int changes = 0;
        List<String> tables = new ArrayList<>();
        for (int i = 0; i < week.sessions().size(); i++) {
            Session session = week.sessions().get(i);
            Optional<Session> before = previous == null || i >= previous.sessions().size() ? Optional.empty()
                    : Optional.of(previous.sessions().get(i)).filter(s -> s.day() == session.day());
            StringBuilder table = new StringBuilder();
            changes += session(table, week, session, before.map(s -> PrescriptionRows.of(previous.number(), s, loads)).orElse(null));
            tables.add(table.toString());
        }
        if (previous != null) {
            page.append("<p class=\"week-note\">").append(weekNote(changes, previous.number())).append("</p>\n");
        }
        // The heading stays on the page of the first session's table: no heading alone at the foot of a page.
        boolean open = true;
        for (String table : tables) {
            page.append(table);
            if (open && !table.isEmpty()) {
                page.append("</div>\n");
                open = false;
            }
        }
        if (open) {
            page.append("</div>\n");
        }
        page.append("</section>\n");
    }

    /**
     * Writes one session's table; returns how many cells differ from the same session the week before. In the
     * coach's report a session that repeats the week before shows only its changed rows and rows with findings.
     */
    private int session(StringBuilder page, Week week, Session session, List<PrescriptionRows.Row> before) {
        List<PrescriptionRows.Row> rows = PrescriptionRows.of(week.number(), session, loads);
        boolean onlyChanges = mode == Mode.REPORT && before != null;
        List<boolean[]> changed = new ArrayList<>();
        List<Boolean> shown = new ArrayList<>();
        int changes = 0;
        for (int r = 0; r < rows.size(); r++) {
            PrescriptionRows.Row row = rows.get(r);
            PrescriptionRows.Row old = before == null || r >= before.size() ? null : before.get(r);
            boolean comparable = old != null && old.exerciseId().equals(row.exerciseId())
                    && old.label().equals(row.label());
            List<String> cells = row.cells();
            boolean[] diff = new boolean[cells.size()];
            boolean any = false;
            for (int c = 0; c < cells.size(); c++) {
                diff[c] = before != null && (!comparable || !cells.get(c).equals(old.cells().get(c)));
                changes += diff[c] ? 1 : 0;
                any |= diff[c];
            }
            changed.add(diff);
            shown.add(!onlyChanges || any || !rowFindings(week, rows, r).isEmpty());
        }
        if (!shown.contains(true)) {
            return changes;
        }
        page.append("<table class=\"plan\">\n<caption>").append(Html.esc(capitalised(session.label())))
                .append(onlyChanges ? ": changes only" : "").append("</caption>\n")
                .append(mode == Mode.REPORT ? REPORT_COLUMNS : SHEET_COLUMNS).append("<thead><tr><th scope=\"col\">Exercise</th><th scope=\"col\">Sets × reps</th>")
                .append("<th scope=\"col\">Effort</th><th scope=\"col\">Load</th><th scope=\"col\">Rest</th>")
                .append("<th scope=\"col\">Tempo</th><th scope=\"col\">Notes</th>");
        if (mode == Mode.REPORT) {
            page.append("<th scope=\"col\">Findings</th><th scope=\"col\">Line</th>");
        }
        page.append("</tr></thead>\n<tbody>\n");
        PrescriptionRows.Heading lastHeading = null;
        for (int r = 0; r < rows.size(); r++) {
            if (!shown.get(r)) {
                continue;
            }
            PrescriptionRows.Row row = rows.get(r);
            PrescriptionRows.Heading heading = headingOf(rows, r);
            if (heading != null && heading != lastHeading) {
                heading(page, week, heading, rows);
            }
            lastHeading = heading;
            row(page, row, changed.get(r), rowFindings(week, rows, r));
        }
        page.append("</tbody>\n</table>\n");
        return changes;
    }

    /** The superset heading a row sits under (set on the superset's first row only), or null. */
    private static PrescriptionRows.Heading headingOf(List<PrescriptionRows.Row> rows, int r) {
        if (rows.get(r).label().isEmpty()) {
            return null;
        }
        for (int i = r; i >= 0; i--) {
            if (rows.get(i).heading() != null) {
                return rows.get(i).heading();
            }
        }
        return null;
    }

    /** The findings of week {@code week} about a row's exercise, on the exercise's first row only. */
    private List<Finding> rowFindings(Week week, List<PrescriptionRows.Row> rows, int r) {
        PrescriptionRows.Row row = rows.get(r);
        boolean firstOfExercise = r == 0 || !rows.get(r - 1).pointer().equals(row.pointer());
        return mode == Mode.REPORT && firstOfExercise ? findings.inside(row.pointer(), week.number(), f -> true)
                : List.of();
    }

    private void heading(StringBuilder page, Week week, PrescriptionRows.Heading heading,
            List<PrescriptionRows.Row> rows) {
        page.append("<tr class=\"superset\"><th scope=\"rowgroup\" colspan=\"7\">").append(Html.esc(heading.text()))
                .append("</th>");
        if (mode == Mode.REPORT) {
            List<Finding> own = findings.inside(heading.pointer(), week.number(),
                    f -> rows.stream().noneMatch(r -> FindingGroups.contains(r.pointer(), f.location().pointer())));
            page.append("<td>").append(marks(own)).append("</td><td>").append(line(heading.line())).append("</td>");
        }
        page.append("</tr>\n");
    }

    private void row(StringBuilder page, PrescriptionRows.Row row, boolean[] changed, List<Finding> own) {
        page.append("<tr").append(row.label().isEmpty() ? "" : " class=\"in-superset\"").append(">")
                .append("<th scope=\"row\">");
        if (!row.label().isEmpty()) {
            page.append("<span class=\"item\">").append(row.label()).append("</span> ");
        }
        page.append(Html.esc(row.exercise())).append("</th>");
        cell(page, row.volume(), changed[0]);
        cell(page, row.effort(), changed[1]);
        page.append("<td class=\"load").append(changed[2] ? " changed" : "").append("\">");
        if (row.load().isPresent()) {
            SetLoads.Worked load = row.load().get();
            page.append("<strong>").append(Html.esc(load.main())).append("</strong>");
            if (load.roundedDown()) {
                page.append(" <span class=\"down\" title=\"rounded down\">↓</span>");
            }
            page.append(delta(changed[2])).append("<span class=\"detail\">").append(Html.esc(load.detail()))
                    .append("</span>");
        } else {
            page.append("<span class=\"none\">—</span>").append(delta(changed[2]));
        }
        page.append("</td>");
        cell(page, row.rest(), changed[3]);
        cell(page, row.tempo(), changed[4]);
        cell(page, row.notes(), changed[5]);
        if (mode == Mode.REPORT) {
            page.append("<td>").append(marks(own)).append("</td><td>").append(line(row.line())).append("</td>");
        }
        page.append("</tr>\n");
    }

    private static void cell(StringBuilder page, String text, boolean changed) {
        page.append("<td").append(changed ? " class=\"changed\"" : "").append(">")
                .append(text.isEmpty() ? "<span class=\"none\">—</span>" : Html.esc(text)).append(delta(changed))
                .append("</td>");
    }

    private static String delta(boolean changed) {
        return changed ? " <span class=\"delta\" title=\"changed from the week before\">Δ<span class=\"sr\">"
                + " changed from the week before</span></span>" : "";
    }

    private String marks(List<Finding> own) {
        if (own.isEmpty()) {
            return "<span class=\"none\">—</span>";
        }
        List<String> parts = new ArrayList<>();
        own.forEach(f -> parts.add(findings.mark(f)));
        return String.join(" ", parts);
    }

    private String line(int line) {
        return "<a class=\"line\" href=\"" + Html.esc(links.to(file, line)) + "\">L" + line + "</a>";
    }

    private String weekNote(int changes, int previous) {
        if (changes == 0) {
            return "Same as week " + previous + (mode == Mode.REPORT ? "; only rows with findings are shown again." : ".");
        }
        String differ = changes + (changes == 1 ? " entry differs" : " entries differ") + " from week " + previous
                + " (marked Δ)";
        return mode == Mode.REPORT ? differ + "; rows that did not change are not shown again unless they have "
                + "findings." : differ + ".";
    }

    private static String columns(int... percents) {
        StringBuilder out = new StringBuilder("<colgroup>");
        for (int p : percents) {
            out.append("<col style=\"width:").append(p).append("%\">");
        }
        return out.append("</colgroup>\n").toString();
    }

    private static String capitalised(String label) {
        return label.isEmpty() ? label : Character.toUpperCase(label.charAt(0)) + label.substring(1);
    }
}
