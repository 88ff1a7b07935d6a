package dev.mesolint.core.report;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Severity;

/**
 * The index of the programmes in a report: a row each with its outcome (a mark and a word, never colour alone) and
 * its counts. The page's script makes the columns sortable; without it the table reads in file order.
 */
final class HtmlIndex {
    private HtmlIndex() {
    }

    static void render(StringBuilder page, RunReport run) {
        page.append("<nav aria-label=\"Programmes in this report\">\n<table class=\"index\">\n<caption>Programmes")
                .append(" (fail level: ").append(run.failOn().label()).append(")</caption>\n<thead><tr>")
                .append("<th scope=\"col\">Result</th><th scope=\"col\">Programme</th><th scope=\"col\">File</th>")
                .append("<th scope=\"col\">Errors</th><th scope=\"col\">Warnings</th><th scope=\"col\">Info</th>")
                .append("<th scope=\"col\">Waived</th></tr></thead>\n<tbody>\n");
        for (int i = 0; i < run.files().size(); i++) {
            FileReport f = run.files().get(i);
            boolean fails = HtmlMarks.fails(f, run.failOn());
            page.append("<tr><td data-sort=\"").append(fails ? 0 : 1).append("\"><span class=\"outcome ")
                    .append(fails ? "fails\">✖ fails" : "passes\">✔ passes").append("</span></td><td><a href=\"#p")
                    .append(i + 1).append("\">").append(Html.esc(HtmlReport.title(f))).append("</a></td><td class=\"path\">")
                    .append(Html.esc(f.displayPath())).append("</td>")
                    .append(count(f, Severity.ERROR)).append(count(f, Severity.WARNING)).append(count(f, Severity.INFO))
                    .append("<td>").append(f.waived().size()).append("</td></tr>\n");
        }
        page.append("</tbody>\n</table>\n</nav>\n");
    }

    private static String count(FileReport f, Severity s) {
        long n = f.active().stream().filter(x -> x.severity() == s).count();
        return "<td data-sort=\"" + n + "\">" + (n == 0 ? "0" : HtmlMarks.glyph(s) + " " + n) + "</td>";
    }

    static String plural(Severity s, long n) {
        return s == Severity.INFO || n == 1 ? s.label() : s.label() + "s";
    }
}
