package dev.mesolint.core.report;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.ProgrammeInfo;
import java.io.IOException;
import java.io.Writer;
import java.net.URI;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * One self-contained HTML page for coaches: inline CSS and SVG, no script, nothing fetched. Per programme a summary,
 * the charts of its training figures (when the model supplied them) and its findings grouped by week and session,
 * each linked to its line. The caution closes the page. All programme text is escaped.
 */
public final class HtmlReport implements ReportWriter {
    private final Path reportDir;
    private final List<HtmlSection> sections;

    /**
     * @param reportDir the folder the page will be written to, so that links to programme files are relative to it;
     *                  null to link by the paths as shown
     */
    public HtmlReport(Path reportDir) {
        this(reportDir, List.of());
    }

    private HtmlReport(Path reportDir, List<HtmlSection> sections) {
        this.reportDir = reportDir == null ? null : reportDir.toAbsolutePath().normalize();
        this.sections = List.copyOf(sections);
    }

    /** This report with {@code section} added before the programmes, after any added before. */
    public HtmlReport withSection(HtmlSection section) {
        List<HtmlSection> all = new java.util.ArrayList<>(sections);
        all.add(section);
        return new HtmlReport(reportDir, all);
    }

    @Override
    public void write(ReportInput input, Writer out) throws IOException {
        StringBuilder page = new StringBuilder(64 * 1024);
        head(page);
        page.append("<body>\n").append(Svg.patternDefs());
        masthead(page, input);
        page.append("<main>\n");
        sections.forEach(section -> page.append(section.html()));
        List<FileReport> files = input.run().files();
        for (int i = 0; i < files.size(); i++) {
            programme(page, input, files.get(i), "p" + (i + 1));
        }
        if (files.isEmpty()) {
            page.append("<p class=\"no-figures\">No programme files were checked.</p>\n");
        }
        page.append("</main>\n<footer>\n<p class=\"caution\"><strong>Caution.</strong> ").append(Html.esc(Mesolint.CAUTION))
                .append("</p>\n<p>Written by mesolint ").append(Html.esc(Mesolint.version())).append(" · <a href=\"")
                .append(Html.esc(Mesolint.INFORMATION_URI)).append("\">").append(Html.esc(Mesolint.INFORMATION_URI))
                .append("</a></p>\n</footer>\n</body>\n</html>\n");
        out.write(page.toString());
        out.flush();
    }

    private static void head(StringBuilder page) {
        page.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; ")
                .append("style-src 'unsafe-inline'; img-src data:\">\n")
                .append("<link rel=\"icon\" href=\"data:,\">\n")
                .append("<title>mesolint report</title>\n<style>\n").append(HtmlStyles.CSS).append("</style>\n</head>\n");
    }

    private static void masthead(StringBuilder page, ReportInput input) {
        RunReport run = input.run();
        page.append("<header class=\"masthead\">\n<h1>mesolint report</h1>\n<p><span class=\"verdict\">")
                .append(run.failed() ? "FAILED" : "PASSED").append("</span>")
                .append(Html.esc(ConsoleReport.summary(run).replaceAll(" -> FAILED.*$", ""))).append("</p>\n<dl>")
                .append(fact("Fail level", run.failOn().label()))
                .append(fact("Checked folder", input.root().toString()))
                .append(fact("mesolint", Mesolint.version()));
        if (!input.elapsed().isZero()) {
            page.append(fact("Run time", JunitReport.seconds(input.elapsed()) + " s"));
        }
        page.append("</dl>\n");
        if (!run.missing().isEmpty()) {
            page.append("<p><strong>Not found:</strong> ")
                    .append(Html.esc(String.join(", ", run.missing()))).append("</p>\n");
        }
        if (run.files().size() > 1) {
            page.append("<nav aria-label=\"Programmes in this report\"><ol>\n");
            for (int i = 0; i < run.files().size(); i++) {
                FileReport f = run.files().get(i);
                page.append("<li><a href=\"#p").append(i + 1).append("\">").append(Html.esc(title(f)))
                        .append("</a> <span class=\"path\">").append(Html.esc(f.displayPath())).append("</span> — ")
                        .append(Html.esc(counts(f))).append("</li>\n");
            }
            page.append("</ol></nav>\n");
        }
        page.append("</header>\n");
    }

    private void programme(StringBuilder page, ReportInput input, FileReport file, String id) {
        page.append("<section class=\"programme\" id=\"").append(id).append("\" aria-labelledby=\"").append(id)
                .append("-h\">\n<h2 id=\"").append(id).append("-h\">").append(Html.esc(title(file)))
                .append(" <span class=\"path\">").append(Html.esc(file.displayPath())).append("</span></h2>\n");
        summary(page, file);
        Optional<ProgrammeFigures> figures = input.figures().of(file);
        if (figures.isPresent()) {
            charts(page, figures.get(), id);
        } else if (file.programme().isPresent()) {
            page.append("<p class=\"no-figures\">Training figures were not computed for this programme, so no charts "
                    + "are shown.</p>\n");
        } else {
            page.append("<p class=\"no-figures\">This file did not load, so its rules did not run and no figures were "
                    + "computed. Fix the findings below first.</p>\n");
        }
        findings(page, input, file, id);
        page.append("</section>\n");
    }

    private static void summary(StringBuilder page, FileReport file) {
        page.append("<dl class=\"facts\">");
        file.programme().ifPresent(p -> {
            ProgrammeInfo info = p.info();
            page.append(fact("Programme id", info.id()));
            if (info.author() != null) {
                page.append(fact("Author", info.author()));
            }
            page.append(fact("Level", info.level().name().toLowerCase(java.util.Locale.ROOT)))
                    .append(fact("Goal", info.goal().yamlName()))
                    .append(fact("Weeks", Integer.toString(p.weeks().size())))
                    .append(fact("Sessions", Integer.toString(p.weeks().stream().mapToInt(w -> w.sessions().size())
                            .sum())));
            info.sessionMinutes().ifPresent(m -> page.append(fact("Session budget", Html.num(m) + " min")));
        });
        page.append(fact("Profile", file.profile())).append("</dl>\n<ul class=\"counts\" aria-label=\"Finding counts\">");
        for (Severity s : List.of(Severity.ERROR, Severity.WARNING, Severity.INFO)) {
            long n = file.active().stream().filter(f -> f.severity() == s).count();
            page.append("<li>").append(n).append(' ').append(plural(s, n)).append("</li>");
        }
        page.append("<li>").append(file.waived().size()).append(" waived</li></ul>\n");
    }

    private static void charts(StringBuilder page, ProgrammeFigures f, String id) {
        page.append("<h3>Training figures</h3>\n");
        figure(page, "Weekly hard sets per muscle",
                "Credited hard sets each week, against the profile's floor and cap for the muscle.",
                VolumeChart.render(f, id + "-volume"),
                legend(swatch("bar-ok", null), "within range", swatch("bar-low", "hatch"), "below floor (hatched)",
                        swatch("bar-high", "cross"), "over cap (cross-hatched)", line("floor"), "floor (dashed line)",
                        line("cap"), "cap (solid line)"));
        figure(page, "Hard sets by week and muscle",
                "The same figures as a grid; darker cells hold more sets.",
                VolumeHeatMap.render(f, id + "-heat"),
                legend(swatch("heat heat-1", null), "few sets", swatch("heat heat-5", null), "many sets",
                        swatch("heat heat-3 out", null), "outside floor-to-cap (dashed border, ↓ below or ↑ over)"));
        figure(page, "Stimulus per session",
                "What fatigue accumulated earlier in the session takes from later sets.",
                StimulusChart.render(f, id + "-stimulus"),
                legend(swatch("bar-kept", null), "stimulus kept (solid)", swatch("bar-lost", "hatch"),
                        "lost to fatigue (hatched)"));
        figure(page, "Session minutes",
                "Estimated length of each session against the programme's session budget.",
                SessionTimeChart.render(f, id + "-time"),
                legend(swatch("bar-time", null), "within budget", swatch("bar-high", "cross"),
                        "over budget (cross-hatched)", line("budget"), "budget (dashed line)"));
    }

    private static void figure(StringBuilder page, String caption, String note, String svg, String legend) {
        page.append("<figure>\n<figcaption>").append(Html.esc(caption)).append("<p>").append(Html.esc(note))
                .append("</p></figcaption>\n").append(svg).append(legend).append("</figure>\n");
    }

    private static String legend(String... swatchAndText) {
        StringBuilder out = new StringBuilder("<ul class=\"legend\">");
        for (int i = 0; i < swatchAndText.length; i += 2) {
            out.append("<li>").append(swatchAndText[i]).append(Html.esc(swatchAndText[i + 1])).append("</li>");
        }
        return out.append("</ul>\n").toString();
    }

    private static String swatch(String cssClass, String pattern) {
        String overlay = pattern == null ? "" : "<rect width=\"22\" height=\"14\" fill=\"url(#" + pattern + ")\"/>";
        return "<svg width=\"22\" height=\"14\" aria-hidden=\"true\"><rect width=\"22\" height=\"14\" class=\""
                + cssClass + "\"/>" + overlay + "</svg>";
    }

    private static String line(String cssClass) {
        return "<svg width=\"22\" height=\"14\" aria-hidden=\"true\"><line x1=\"11\" y1=\"0\" x2=\"11\" y2=\"14\" class=\""
                + cssClass + "\"/></svg>";
    }

    private void findings(StringBuilder page, ReportInput input, FileReport file, String id) {
        page.append("<h3>Findings</h3>\n");
        List<Finding> shown = file.findings().stream().filter(f -> f.severity() != Severity.OFF).toList();
        if (shown.isEmpty()) {
            page.append("<p class=\"clean\">No findings: every rule that ran passed.</p>\n");
            return;
        }
        for (FindingGroups.Group group : FindingGroups.of(file, shown)) {
            page.append("<h4>").append(Html.esc(group.title())).append("</h4>\n<ul class=\"findings\">\n");
            for (Finding f : group.findings()) {
                finding(page, input, f);
            }
            page.append("</ul>\n");
        }
    }

    private void finding(StringBuilder page, ReportInput input, Finding f) {
        String severity = f.severity().label();
        page.append("<li class=\"finding ").append(severity).append(f.waived() ? " is-waived" : "").append("\">")
                .append("<div class=\"head\">");
        if (f.waived()) {
            page.append("<span class=\"badge waived\">○ waived ").append(severity).append("</span>");
        } else {
            page.append("<span class=\"badge ").append(severity).append("\">").append(glyph(f.severity())).append(' ')
                    .append(severity).append("</span>");
        }
        page.append("<a class=\"rule\" href=\"").append(Html.esc(RuleDocs.uri(f.ruleId()))).append("\">")
                .append(Html.esc(f.ruleId())).append("</a>")
                .append("<a class=\"where\" href=\"").append(Html.esc(link(input, f))).append("\">")
                .append(Html.esc(f.file() + ":" + f.location().line() + ":" + f.location().column())).append("</a>");
        if (f.baselined()) {
            page.append("<span class=\"path\">in baseline</span>");
        }
        page.append("</div><p class=\"message\">").append(Html.esc(f.message())).append("</p><p class=\"fix\">")
                .append(Html.esc(f.fix())).append("</p>");
        f.waiver().ifPresent(w -> page.append("<p class=\"waiver\">").append(Html.esc(w.reason())).append(" (line ")
                .append(w.location().line()).append(")</p>"));
        page.append("</li>\n");
    }

    /** The finding's line as a link relative to the report's folder: {@code ../programmes/a.yaml#L41}. */
    String link(ReportInput input, Finding f) {
        String target;
        Path file = Path.of(f.file());
        if (reportDir != null) {
            Path absolute = file.isAbsolute() ? file : input.root().resolve(file).normalize();
            target = reportDir.getRoot() != null && reportDir.getRoot().equals(absolute.getRoot())
                    ? reportDir.relativize(absolute).toString().replace('\\', '/')
                    : absolute.toUri().toString();
        } else {
            target = f.file();
        }
        return encode(target) + "#L" + f.location().line();
    }

    private static String encode(String path) {
        if (path.startsWith("file:")) {
            return path;
        }
        try {
            return new URI(null, null, path, null).toASCIIString();
        } catch (URISyntaxException e) {
            return path;
        }
    }

    private static String title(FileReport file) {
        return file.programme().map(Programme::info)
                .map(i -> i.title() != null && !i.title().isBlank() ? i.title() : i.id())
                .orElse(file.displayPath());
    }

    private static String counts(FileReport f) {
        long e = f.active().stream().filter(x -> x.severity() == Severity.ERROR).count();
        long w = f.active().stream().filter(x -> x.severity() == Severity.WARNING).count();
        long i = f.active().stream().filter(x -> x.severity() == Severity.INFO).count();
        return e + " " + plural(Severity.ERROR, e) + ", " + w + " " + plural(Severity.WARNING, w) + ", " + i + " info";
    }

    private static String plural(Severity s, long n) {
        return s == Severity.INFO || n == 1 ? s.label() : s.label() + "s";
    }

    private static String glyph(Severity s) {
        return switch (s) {
            case ERROR -> "✖";
            case WARNING -> "▲";
            case INFO, OFF -> "●";
        };
    }

    private static String fact(String term, String value) {
        return "<div><dt>" + Html.esc(term) + "</dt><dd>" + Html.esc(value) + "</dd></div>";
    }
}
