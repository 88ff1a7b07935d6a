package dev.mesolint.core.report;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.ProgrammeInfo;
import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * One self-contained HTML page for coaches: inline CSS, SVG and one hashed script, nothing fetched. An index with a
 * pass or fail mark and counts per programme; per programme a summary, the athlete, the prescription with worked-out
 * loads, the charts of its training figures and its findings grouped by week and session, each linked to its line.
 * The caution opens and closes the page. All programme text is escaped.
 */
public final class HtmlReport implements ReportWriter {
    private final Path reportDir;

    /**
     * @param reportDir the folder the page will be written to, so that links to programme files are relative to it;
     *                  null to link by the paths as shown
     */
    public HtmlReport(Path reportDir) {
        this.reportDir = reportDir == null ? null : reportDir.toAbsolutePath().normalize();
    }

    @Override
    public void write(ReportInput input, Writer out) throws IOException {
        StringBuilder page = new StringBuilder(128 * 1024);
        HtmlPage.head(page, "mesolint report", true);
        page.append("<body>\n").append(Svg.patternDefs());
        masthead(page, input);
        page.append("<main>\n");
        HtmlPage.caution(page, "caution-top");
        HowToRead.render(page);
        List<FileReport> files = input.run().files();
        SourceLinks links = new SourceLinks(reportDir, input.root());
        for (int i = 0; i < files.size(); i++) {
            programme(page, input, files.get(i), "p" + (i + 1), links);
        }
        if (files.isEmpty()) {
            page.append("<p class=\"no-figures\">No programme files were checked.</p>\n");
        }
        page.append("</main>\n");
        HtmlPage.footer(page, true);
        out.write(page.toString());
        out.flush();
    }

    private static void masthead(StringBuilder page, ReportInput input) {
        RunReport run = input.run();
        page.append("<header class=\"masthead\">\n<h1>mesolint report</h1>\n<p><span class=\"verdict\">")
                .append(run.failed() ? "✖ FAILED" : "✔ PASSED").append("</span>")
                .append(Html.esc(ConsoleReport.summary(run).replaceAll(" -> FAILED.*$", ""))).append("</p>\n<dl>")
                .append(HtmlPage.fact("Fail level", run.failOn().label()))
                .append(HtmlPage.fact("Checked folder", input.root().toString()))
                .append(HtmlPage.fact("mesolint", Mesolint.version()))
                .append(HtmlPage.fact("rule set", Mesolint.RULE_SET_VERSION));
        if (!input.elapsed().isZero()) {
            page.append(HtmlPage.fact("Run time", JunitReport.seconds(input.elapsed()) + " s"));
        }
        if (!input.html().showReasons()) {
            page.append(HtmlPage.fact("Constraint reasons", "left out"));
        }
        page.append("</dl>\n");
        if (!run.missing().isEmpty()) {
            page.append("<p><strong>Not found:</strong> ")
                    .append(Html.esc(String.join(", ", run.missing()))).append("</p>\n");
        }
        page.append("</header>\n");
        if (!run.files().isEmpty()) {
            HtmlIndex.render(page, run);
        }
    }

    private void programme(StringBuilder page, ReportInput input, FileReport file, String id, SourceLinks links) {
        boolean fails = HtmlMarks.fails(file, input.run().failOn());
        page.append("<section class=\"programme\" id=\"").append(id).append("\" aria-labelledby=\"").append(id)
                .append("-h\">\n<details open>\n<summary><h2 id=\"").append(id).append("-h\">")
                .append("<span class=\"outcome ").append(fails ? "fails" : "passes").append("\">")
                .append(fails ? "✖ fails" : "✔ passes").append("</span> ").append(Html.esc(title(file)))
                .append(" <span class=\"path\">").append(Html.esc(file.displayPath())).append("</span></h2></summary>\n");
        summary(page, file);
        ShownFindings findings = new ShownFindings(file, id);
        Optional<Programme> programme = file.programme();
        if (programme.isPresent()) {
            Programme p = programme.get();
            PlateRounding plates = PlateRounding.of(p.info().plateIncrement(), input.html().plateIncrement(),
                    p.info().units());
            SetLoads loads = new SetLoads(p, plates, input.html().catalogue());
            AthleteBlock.render(page, p, loads, findings, input.html().showReasons(), id);
            page.append("<section class=\"plan\" aria-labelledby=\"").append(id).append("-plan\">\n<h3 id=\"")
                    .append(id).append("-plan\">Prescription</h3>\n<p class=\"note\">")
                    .append(Html.esc(PrescriptionView.roundingRule(plates, stepSource(p, input)))).append("</p>\n");
            new PrescriptionView(p, loads, PrescriptionView.Mode.REPORT, findings, links, file.displayPath())
                    .render(page, id);
            page.append("</section>\n");
            boolean strength = p.info().goal() == dev.mesolint.core.programme.Goal.STRENGTH
                    || file.profile().equals("strength");
            file.metrics().ifPresent(m -> StrengthView.render(page, m, loads, strength, id));
        }
        Optional<ProgrammeFigures> figures = input.figures().of(file);
        if (figures.isPresent()) {
            TrainingCharts.render(page, figures.get(), id);
        } else if (programme.isPresent()) {
            page.append("<p class=\"no-figures\">Training figures were not computed for this programme, so no charts "
                    + "are shown.</p>\n");
        } else {
            page.append("<p class=\"no-figures\">This file did not load, so its rules did not run and no figures were "
                    + "computed. Fix the findings below first.</p>\n");
        }
        new FindingsView(input, file, findings, links).render(page, id);
        for (ProgrammeSection section : input.html().sections()) {
            section.render(input, file, id, page);
        }
        page.append("</details>\n</section>\n");
    }

    /** The finding's line as a link relative to the report's folder: {@code ../programmes/a.yaml#L41}. */
    String link(ReportInput input, dev.mesolint.core.finding.Finding f) {
        return new SourceLinks(reportDir, input.root()).to(f.file(), f.location().line());
    }

    private static String stepSource(Programme p, ReportInput input) {
        if (p.info().plateIncrement().isPresent()) {
            return "the programme's plate-increment";
        }
        return input.html().plateIncrement().isPresent() ? "the repository's plate-increment"
                : "the default; set plate-increment in the programme or the repository configuration";
    }

    private static void summary(StringBuilder page, FileReport file) {
        page.append("<dl class=\"facts\">");
        file.programme().ifPresent(p -> {
            ProgrammeInfo info = p.info();
            page.append(HtmlPage.fact("Programme id", info.id()));
            if (info.author() != null) {
                page.append(HtmlPage.fact("Author", info.author()));
            }
            page.append(HtmlPage.fact("Level", info.level().name().toLowerCase(Locale.ROOT)))
                    .append(HtmlPage.fact("Goal", info.goal().yamlName()))
                    .append(HtmlPage.fact("Weeks", Integer.toString(p.weeks().size())))
                    .append(HtmlPage.fact("Sessions", Integer.toString(p.weeks().stream()
                            .mapToInt(w -> w.sessions().size()).sum())));
            info.sessionMinutes().ifPresent(m -> page.append(HtmlPage.fact("Session budget", Html.num(m) + " min")));
        });
        page.append(HtmlPage.fact("Profile", file.profile())).append("</dl>\n<ul class=\"counts\" "
                + "aria-label=\"Finding counts\">");
        for (Severity s : List.of(Severity.ERROR, Severity.WARNING, Severity.INFO)) {
            long n = file.active().stream().filter(f -> f.severity() == s).count();
            page.append("<li>").append(HtmlMarks.glyph(s)).append(' ').append(n).append(' ')
                    .append(HtmlIndex.plural(s, n)).append("</li>");
        }
        page.append("<li>○ ").append(file.waived().size()).append(" waived</li></ul>\n");
    }

    static String title(FileReport file) {
        return file.programme().map(Programme::info)
                .map(i -> i.title() != null && !i.title().isBlank() ? i.title() : i.id())
                .orElse(file.displayPath());
    }
}
