package dev.mesolint.core.report;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;

/**
 * A programme's findings, grouped under the weeks and session they concern, each with its severity (a shape and a
 * word), rule, line link, message and fix. The page's script adds severity and rule filters to the block.
 */
final class FindingsView {
    private final ReportInput input;
    private final FileReport file;
    private final ShownFindings findings;
    private final SourceLinks links;

    FindingsView(ReportInput input, FileReport file, ShownFindings findings, SourceLinks links) {
        this.input = input;
        this.file = file;
        this.findings = findings;
        this.links = links;
    }

    void render(StringBuilder page, String id) {
        page.append("<section class=\"findings-block\" aria-labelledby=\"").append(id).append("-findings\">\n")
                .append("<h3 id=\"").append(id).append("-findings\">Findings</h3>\n");
        if (findings.all().isEmpty()) {
            page.append("<p class=\"clean\">✔ No findings: every rule that ran passed.</p>\n</section>\n");
            return;
        }
        for (FindingGroups.Group group : FindingGroups.of(file, findings.all())) {
            page.append("<div class=\"group\">\n<h4>").append(Html.esc(group.title()))
                    .append("</h4>\n<ul class=\"findings\">\n");
            for (Finding f : group.findings()) {
                finding(page, f);
            }
            page.append("</ul>\n</div>\n");
        }
        page.append("</section>\n");
    }

    /** The rule id, linked only when the front end names where the rule reference is published. */
    private void rule(StringBuilder page, String ruleId) {
        String id = Html.esc(ruleId);
        input.options().helpUri(ruleId).ifPresentOrElse(
                uri -> page.append("<a class=\"rule\" href=\"").append(Html.esc(uri)).append("\">").append(id)
                        .append("</a>"),
                () -> page.append("<span class=\"rule\" title=\"mesolint explain ").append(id).append("\">")
                        .append(id).append("</span>"));
    }

    private void finding(StringBuilder page, Finding f) {
        String severity = f.severity().label();
        page.append("<li class=\"finding ").append(severity).append(f.waived() ? " is-waived" : "")
                .append("\" id=\"").append(findings.id(f)).append("\" data-severity=\"")
                .append(f.waived() ? "waived" : severity).append("\" data-rule=\"").append(Html.esc(f.ruleId()))
                .append("\"><div class=\"head\">");
        if (f.waived()) {
            page.append("<span class=\"badge waived\">○ waived ").append(severity).append("</span>");
        } else {
            page.append("<span class=\"badge ").append(severity).append("\">").append(HtmlMarks.glyph(f.severity()))
                    .append(' ').append(severity).append("</span>");
        }
        rule(page, f.ruleId());
        page
                .append("<a class=\"where\" href=\"").append(Html.esc(links.to(f.file(), f.location().line())))
                .append("\">").append(Html.esc(f.file() + ":" + f.location().line() + ":" + f.location().column()))
                .append("</a>");
        if (f.baselined()) {
            page.append("<span class=\"path\">in baseline</span>");
        }
        page.append("</div><p class=\"message\">").append(Html.esc(text(f.message()))).append("</p><p class=\"fix\">")
                .append(Html.esc(text(f.fix()))).append("</p>");
        f.waiver().ifPresent(w -> page.append("<p class=\"waiver\">").append(Html.esc(w.reason())).append(" (line ")
                .append(w.location().line()).append(")</p>"));
        page.append("</li>\n");
    }

    /** The text as shown: constraint reasons replaced when the report leaves them out. */
    private String text(String text) {
        return input.html().showReasons() || file.programme().isEmpty() ? text
                : AthleteBlock.withoutReasons(text, file.programme().get());
    }
}
