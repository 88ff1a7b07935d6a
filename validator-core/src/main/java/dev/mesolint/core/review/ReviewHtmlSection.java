package dev.mesolint.core.review;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.report.ProgrammeSection;
import dev.mesolint.core.report.ReportInput;
import java.util.List;
import java.util.Optional;
import org.apache.commons.text.StringEscapeUtils;

/**
 * The HTML report's "changes since REV" section of each programme the change touched: what happened to the file,
 * the changed figures as a table, the limits crossed and the findings new and resolved. Every text is escaped;
 * a programme the change left alone gets no section.
 */
public final class ReviewHtmlSection implements ProgrammeSection {
    private static final String ARROW = "→";
    private final ReviewInput input;

    public ReviewHtmlSection(ReviewInput input) {
        this.input = input;
    }

    @Override
    public void render(ReportInput report, FileReport file, String id, StringBuilder out) {
        Review review = input.review();
        Optional<ProgrammeChange> change = review.changed().stream()
                .filter(p -> p.after().equals(Optional.of(file.displayPath()))).findFirst();
        if (change.isEmpty()) {
            return;
        }
        ProgrammeChange p = change.get();
        out.append("<section class=\"changes\" id=\"").append(id).append("-changes\" aria-labelledby=\"")
                .append(id).append("-changes-title\">\n<h3 id=\"").append(id).append("-changes-title\">Changes since ")
                .append(esc(review.base().label())).append("</h3>\n<p>").append(esc(ReviewText.status(p, ARROW)))
                .append(".</p>\n");
        table(out, p);
        list(out, "Limits crossed", p.limits().stream().map(l -> ReviewText.limit(l, ARROW)).toList());
        list(out, "New findings", p.findings().introduced().stream().map(this::finding).toList());
        list(out, "Resolved findings", p.findings().resolved().stream().map(this::finding).toList());
        out.append("</section>\n");
    }

    private String finding(Finding f) {
        return ReviewText.finding(f, input.message(f));
    }

    private static void table(StringBuilder out, ProgrammeChange p) {
        if (!p.figures().changed()) {
            return;
        }
        out.append("<table>\n<thead><tr><th scope=\"col\">week</th><th scope=\"col\">figure</th>")
                .append("<th scope=\"col\">before → after (change)</th></tr></thead>\n<tbody>\n");
        for (MuscleWeekChange m : p.figures().muscles()) {
            for (ReviewText.Named f : ReviewText.changedFigures(m)) {
                row(out, m.week(), m.muscle() + " " + f.name(), f.delta());
            }
        }
        for (SessionChange s : p.figures().sessions()) {
            row(out, s.week(), ReviewText.session(s) + " minutes", s.minutes());
        }
        for (LiftChange l : p.figures().lifts()) {
            for (ReviewText.Named f : ReviewText.changedFigures(l, p.units().orElse(""))) {
                row(out, l.week(), l.exercise() + " " + f.name(), f.delta());
            }
        }
        out.append("</tbody>\n</table>\n");
    }

    private static void row(StringBuilder out, int week, String figure, Delta d) {
        out.append("<tr><td>").append(week).append("</td><td>").append(esc(figure)).append("</td><td>")
                .append(esc(ReviewText.delta(d, ARROW))).append("</td></tr>\n");
    }

    private static void list(StringBuilder out, String title, List<String> items) {
        if (items.isEmpty()) {
            return;
        }
        out.append("<h4>").append(esc(title)).append("</h4>\n<ul>\n");
        items.forEach(i -> out.append("<li>").append(esc(i)).append("</li>\n"));
        out.append("</ul>\n");
    }

    private static String esc(String text) {
        return StringEscapeUtils.escapeHtml4(text);
    }
}
