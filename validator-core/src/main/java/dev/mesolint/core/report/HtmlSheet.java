package dev.mesolint.core.report;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.programme.Programme;
import java.io.IOException;
import java.io.Writer;
import java.util.List;

/**
 * The athlete's sheet: just the prescription with worked-out loads, one week per printed page, with the caution and
 * no findings, figures or constraint reasons. Files that did not load are named with a pointer to the full report.
 */
public final class HtmlSheet implements ReportWriter {

    @Override
    public void write(ReportInput input, Writer out) throws IOException {
        StringBuilder page = new StringBuilder(64 * 1024);
        HtmlPage.head(page, "Training sheet", false);
        page.append("<body class=\"sheet\">\n<main>\n");
        List<FileReport> files = input.run().files();
        boolean first = true;
        for (int i = 0; i < files.size(); i++) {
            FileReport file = files.get(i);
            if (file.programme().isEmpty()) {
                page.append("<p class=\"no-figures\">").append(Html.esc(file.displayPath()))
                        .append(" did not load, so it has no sheet; the full report lists its findings.</p>\n");
                continue;
            }
            programme(page, input, file.programme().get(), "p" + (i + 1), first);
            first = false;
        }
        if (first) {
            HtmlPage.caution(page, "caution-top");
        }
        // No footer: the caution heads every programme, and a footer alone would print a page of its own.
        page.append("</main>\n</body>\n</html>\n");
        out.write(page.toString());
        out.flush();
    }

    private static void programme(StringBuilder page, ReportInput input, Programme p, String id, boolean first) {
        PlateRounding plates = PlateRounding.of(p.info().plateIncrement(), input.html().plateIncrement(),
                p.info().units());
        SetLoads loads = new SetLoads(p, plates, input.html().catalogue());
        String title = p.info().title() != null && !p.info().title().isBlank() ? p.info().title() : p.info().id();
        page.append("<section class=\"programme").append(first ? " first" : "").append("\" id=\"").append(id)
                .append("\" aria-labelledby=\"").append(id).append("-h\">\n<header class=\"sheet-head\">\n<h1 id=\"")
                .append(id).append("-h\">").append(Html.esc(title)).append("</h1>\n");
        HtmlPage.caution(page, "caution-top");
        page.append("<p class=\"note\">Written by mesolint ").append(Html.esc(dev.mesolint.core.Mesolint.version()))
                .append(" from ").append(Html.esc(p.info().id())).append(". ").append(Html.esc(PrescriptionView.roundingRule(plates,
                p.info().plateIncrement().isPresent() || input.html().plateIncrement().isPresent()
                        ? "as the programme's coach set it" : "the default"))).append("</p>\n</header>\n");
        new PrescriptionView(p, loads, PrescriptionView.Mode.SHEET, null, null, null).render(page, id);
        page.append("</section>\n");
    }
}
