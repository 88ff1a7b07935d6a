package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.ProgrammeInfo;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

class HtmlReportTests {

    /** The upper/lower sample with the hand-made figures, as the Chromium test renders it. */
    static ReportInput sampleWithFigures() {
        RunReport run = ReportFixtures.check(HandMadeFigures.FILE, "sample-programs/broken/week-sequence.yaml");
        ReportFigures figures = file -> file.displayPath().equals(HandMadeFigures.FILE)
                ? Optional.of(new HandMadeFigures()) : Optional.empty();
        return ReportFixtures.input(run).withFigures(figures);
    }

    private static int count(String html, String regex) {
        Matcher m = Pattern.compile(regex).matcher(html);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    @Test
    void drawsTheFourChartsAccessiblyForAProgrammeWithFigures() {
        String html = ReportFixtures.render(ReportFormat.HTML, sampleWithFigures());
        assertEquals(4, count(html, "<svg [^>]*class=\"chart\" role=\"img\""), "volume, heat map, stimulus, minutes");
        // Files come in path order: broken/week-sequence.yaml is p1, the upper/lower programme p2.
        for (String chart : List.of("p2-volume", "p2-heat", "p2-stimulus", "p2-time")) {
            assertTrue(html.contains("aria-labelledby=\"" + chart + "-title " + chart + "-desc\""), chart);
            assertTrue(html.contains("<title id=\"" + chart + "-title\">"), chart);
        }
        assertFalse(html.contains("id=\"p1-volume\""), "the broken sample has no figures");
        assertTrue(html.contains("Training figures were not computed for this programme"));
    }

    @Test
    void chartsStateOutOfRangeValuesInWordsAndPatterns() {
        String html = ReportFixtures.render(ReportFormat.HTML, sampleWithFigures());
        assertTrue(html.contains("W1 · 3 · below floor"), "biceps week 1 is below the floor of 4");
        assertTrue(html.contains("W4 · 22 · over cap"), "quadriceps week 4 is over the cap of 20");
        assertTrue(html.contains("floor 6 · cap 16"), "side delts carry their own range");
        assertTrue(html.contains("3 ↓ below"));
        assertTrue(html.contains("22 ↑ over"));
        assertTrue(html.contains("fill=\"url(#hatch)\"") && html.contains("fill=\"url(#cross)\""));
        assertTrue(html.contains("<pattern id=\"hatch\"") && html.contains("<pattern id=\"cross\""));
        assertTrue(html.contains("W5 deload"));
        // Lower B in week 4 runs 78 + 6 = 84 minutes against a budget of 75.
        assertTrue(html.contains("84 min · 9 over budget"));
        assertTrue(html.contains("class=\"budget\""));
        assertTrue(html.contains(" kept · "), "stimulus bars are labelled kept and lost");
        assertTrue(count(html, "class=\"heat heat-\\d") >= 45, "9 muscles x 5 weeks of cells");
    }

    @Test
    void isSelfContainedWithCautionAndPrintStyles() {
        String html = ReportFixtures.render(ReportFormat.HTML, sampleWithFigures());
        assertTrue(html.startsWith("<!DOCTYPE html>"));
        // One inline script, allowed by its hash and by nothing else: no source, no other inline script.
        assertEquals(1, count(html, "<script>"));
        assertFalse(html.contains("<script src"));
        assertTrue(html.contains("script-src " + HtmlScript.CSP_SOURCE));
        assertFalse(html.contains("unsafe-eval"));
        assertFalse(Pattern.compile("script-src[^;\"]*unsafe-inline").matcher(html).find());
        assertFalse(Pattern.compile("\\s(src|srcset)=").matcher(html).find(), "nothing is loaded");
        assertFalse(html.contains("rel=\"stylesheet\""));
        assertFalse(html.contains("@import"));
        assertTrue(html.contains("default-src 'none'"));
        assertTrue(html.contains("@media print"));
        String footer = html.substring(html.indexOf("<footer>"));
        assertTrue(footer.contains(Html.esc(Mesolint.CAUTION)));
    }

    @Test
    void groupsFindingsByWeekAndSessionWithLinksToTheirLines() {
        RunReport run = ReportFixtures.check("sample-programs/broken/week-sequence.yaml");
        HtmlReport report = new HtmlReport(ReportFixtures.ROOT.resolve("validator-core/target"));
        String html = ReportFixtures.render(ReportFormat.HTML, ReportFixtures.input(run));
        assertTrue(html.contains("<h4>Week 1 · day 1 (Lower)</h4>"), html);
        assertTrue(html.contains("<h4>Week 4</h4>"));
        var finding = run.files().get(0).findings().get(0);
        assertEquals("../../sample-programs/broken/week-sequence.yaml#L" + finding.location().line(),
                report.link(ReportFixtures.input(run), finding));
        assertTrue(html.contains("href=\"../../sample-programs/broken/week-sequence.yaml#L"));
        assertTrue(html.contains(">sample-programs/broken/week-sequence.yaml:" + finding.location().line() + ":"));
    }

    @Test
    void escapesProgrammeTextEverywhere() {
        FileReport real = ReportFixtures.check(HandMadeFigures.FILE).files().get(0);
        Programme p = real.programme().orElseThrow();
        ProgrammeInfo i = p.info();
        String evil = "<script>alert('x')</script> & \"friends\"";
        Programme hostile = new Programme(new ProgrammeInfo(i.id(), evil, "<b>coach</b>", i.level(), i.goal(),
                i.sessionMinutes(), i.units(), i.location()), p.athlete(), p.localExercises(), p.weeks(),
                p.fileWaivers());
        FileReport file = new FileReport("odd <dir>/plan\".yaml", Optional.of(hostile), real.profile(),
                List.of(ReportFixtures.finding("week-sequence", Severity.ERROR, "odd <dir>/plan\".yaml", 3, 1, "",
                        "<img src=x onerror=alert(1)>")));
        ReportFigures figures = f -> Optional.of(new HandMadeFigures(f.displayPath()) {
            @Override
            public List<WeekFigures> weeks() {
                return super.weeks().stream().map(w -> new WeekFigures(w.week(), w.deload(), w.muscles(),
                        w.sessions().stream().map(s -> new SessionFigures(s.day(), "<i>" + s.name(), s.line(),
                                s.minutes(), s.sets())).toList())).toList();
            }
        });
        String html = ReportFixtures.render(ReportFormat.HTML, ReportFixtures.input(new RunReport(List.of(file),
                Severity.ERROR, List.of("<missing>"))).withFigures(figures));
        assertFalse(html.contains("<script>alert"));
        assertFalse(html.contains("<img"));
        assertFalse(html.contains("<b>coach"));
        assertFalse(html.contains("<i>Upper"));
        assertFalse(html.contains("<missing>"));
        assertTrue(html.contains("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; &quot;friends&quot;"));
        assertTrue(html.contains("&lt;i&gt;Upper A"));
    }

    @Test
    void escaperCoversMarkupCharacters() {
        assertEquals("&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;",
                Html.esc("<a href=\"x\" title='y'>&</a>"));
        assertEquals("a\uFFFDb", Html.esc("a\u0000b"));
        assertEquals("9", Html.num(9.0));
        assertEquals("9.5", Html.num(9.46));
    }

    @Test
    void reportsAFileThatDidNotLoadWithoutCharts() {
        RunReport run = ReportFixtures.check("sample-programs/broken/yaml-syntax.yaml");
        String html = ReportFixtures.render(ReportFormat.HTML, ReportFixtures.input(run));
        assertTrue(html.contains("This file did not load"));
        assertFalse(html.contains("class=\"chart\""));
        assertTrue(html.contains("yaml-syntax"));
        assertTrue(html.contains("FAILED"));
    }

    @Test
    void linksWithoutAReportFolderUseTheShownPath() {
        var f = ReportFixtures.finding("schema", Severity.ERROR, "my plans/a.yaml", 7, 2, "", "m");
        assertEquals("my%20plans/a.yaml#L7", new HtmlReport(null).link(ReportFixtures.input(
                new RunReport(List.of(), Severity.ERROR, List.of())), f));
        assertTrue(Path.of("x").toAbsolutePath().isAbsolute());
    }
}
