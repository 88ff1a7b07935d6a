package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The prescription in the coach's report and the athlete's sheet: rows, worked-out loads and their rounding. Every
 * load below is worked by hand from the programme's 1RM and the 2.5 kg default step; the rounding rule (nearest
 * step, down under a cap or at 90% of 1RM or more) is common practice.
 */
class HtmlPrescriptionTests {
    private static final String ROUNDING = "validator-core/src/test/resources/report/plate-rounding.yaml";
    private static final String STRENGTH = "sample-programs/programmes/strength-block.yaml";
    private static final Pattern ROW = Pattern.compile(
            "<tr(?: class=\"in-superset\")?><th scope=\"row\">(?:<span class=\"item\">[^<]*</span> )?([^<]+)</th>"
                    + "<td[^>]*>([^<]+).*?<td class=\"load[^\"]*\">(?:<strong>([^<]+)</strong>)?(.*?)</td>");

    /** One prescription row as shown: exercise, sets x reps, the weight and everything else in the load cell. */
    private record Row(String exercise, String volume, String load, String loadCell) {
    }

    private static String week(String html, String programme, int week) {
        int start = html.indexOf("id=\"" + programme + "-w" + week + "\"");
        assertTrue(start > 0, "week " + week + " of " + programme + " is shown");
        return html.substring(start, html.indexOf("</section>", start));
    }

    private static List<Row> rows(String weekHtml) {
        List<Row> rows = new ArrayList<>();
        Matcher m = ROW.matcher(weekHtml);
        while (m.find()) {
            rows.add(new Row(m.group(1), m.group(2), m.group(3), m.group(4)));
        }
        return rows;
    }

    private static String report(String... files) {
        return ReportFixtures.render(ReportFormat.HTML, ReportFixtures.withCatalogue(ReportFixtures.check(files)));
    }

    @Test
    void worksOutLoadsFromTheOneRepMaxAndRoundsThemToPlates() {
        List<Row> rows = rows(week(report(ROUNDING), "p1", 1));
        assertEquals(List.of("Barbell back squat", "Barbell bench press", "Barbell deadlift"),
                rows.stream().map(Row::exercise).toList());
        assertEquals(List.of("3 × 5", "3 × 5", "2 × 2"), rows.stream().map(Row::volume).toList());
        // Hand-worked: 75% of 142.5 kg = 106.875 kg -> nearest 2.5 kg step 107.5 kg.
        assertEquals("107.5 kg", rows.get(0).load());
        assertTrue(rows.get(0).loadCell().contains("75% of 142.5 kg"), rows.get(0).loadCell());
        // Hand-worked: 70% of 142.5 kg = 99.75 kg under the athlete's 70% shoulder cap -> down to 97.5 kg, not
        // 100 kg (70.2% of 1RM).
        assertEquals("97.5 kg", rows.get(1).load());
        assertTrue(rows.get(1).loadCell().contains("rounded down under the 70% shoulder cap"), rows.get(1).loadCell());
        // Hand-worked: 92.5% of 142.5 kg = 131.8125 kg, near-maximal -> down to 130 kg (nearest would be 132.5 kg).
        assertEquals("130 kg", rows.get(2).load());
        assertTrue(rows.get(2).loadCell().contains("near-maximal"));
    }

    @Test
    void aRepeatedWeekShowsWhatChanged() {
        String html = report(ROUNDING);
        String week2 = week(html, "p1", 2);
        assertTrue(week2.contains("from week 1 (marked Δ)"), week2);
        Row squat = rows(week2).get(0);
        assertEquals("Barbell back squat", squat.exercise());
        // Hand-worked: 77.5% of 142.5 kg = 110.4375 kg -> nearest step 110 kg.
        assertEquals("110 kg", squat.load());
        assertTrue(squat.loadCell().contains("Δ"), "the changed load is marked");
        assertFalse(rows(week(html, "p1", 1)).get(0).loadCell().contains("Δ"), "week 1 has nothing to compare with");
    }

    @Test
    void theStrengthSampleCarriesItsWorkedOutLoads() {
        String html = report(STRENGTH);
        List<Row> week1 = rows(week(html, "p1", 1));
        // Hand-worked, 80% of each 1RM to the nearest 2.5 kg: squat 112 -> 112.5, bench 76 -> 75, deadlift
        // 136 -> 135, overhead press 48 -> 47.5.
        assertEquals("112.5 kg", load(week1, "Barbell back squat"));
        assertEquals("75 kg", load(week1, "Barbell bench press"));
        assertEquals("135 kg", load(week1, "Barbell deadlift"));
        assertEquals("47.5 kg", load(week1, "Barbell overhead press"));
        // Hand-worked, 90% in week 5 is near-maximal, so down: squat 126 -> 125, bench 85.5 -> 85, deadlift
        // 153 -> 152.5, overhead press 54 -> 52.5.
        List<Row> week5 = rows(week(html, "p1", 5));
        assertEquals("125 kg", load(week5, "Barbell back squat"));
        assertEquals("85 kg", load(week5, "Barbell bench press"));
        assertEquals("152.5 kg", load(week5, "Barbell deadlift"));
        assertEquals("52.5 kg", load(week5, "Barbell overhead press"));
        assertTrue(html.contains("Superset A: 3 rounds, 90 s rest after each round"));
        assertTrue(html.contains("rounded to 2.5 kg steps (the default"), "the step and its source are stated");
    }

    private static String load(List<Row> rows, String exercise) {
        return rows.stream().filter(r -> r.exercise().equals(exercise)).findFirst()
                .orElseThrow(() -> new AssertionError(exercise + " not in " + rows)).load();
    }

    @Test
    void rowsListTheirFindingsAndLinkToTheirLine() {
        String html = report("sample-programs/broken/constraint-load.yaml");
        String week1 = week(html, "p1", 1);
        assertTrue(week1.contains("<a class=\"mark error\" href=\"#p1-f1\">✖ constraint-load</a>"), week1);
        assertTrue(html.contains("id=\"p1-f1\""), "the mark links to the finding");
        assertTrue(Pattern.compile("<a class=\"line\" href=\"[^\"]*constraint-load.yaml#L\\d+\">L\\d+</a>")
                .matcher(week1).find());
        // Hand-worked: 80% of 70 kg = 56 kg under the 70% shoulder cap -> down to 55 kg.
        assertEquals("55 kg", rows(week1).get(0).load());
    }

    @Test
    void theAthleteBlockShowsMaxesConstraintsAndTheFindingsTheyCaused() {
        String html = report("sample-programs/broken/constraint-load.yaml");
        String athlete = html.substring(html.indexOf("<section class=\"athlete\""), html.indexOf("<section class=\"plan\""));
        assertTrue(athlete.contains("<th scope=\"row\">Barbell bench press</th><td>70 kg</td>"), athlete);
        assertTrue(athlete.contains("Load cap: at most 70% of 1RM on exercises that load the shoulder"));
        assertTrue(athlete.contains("Returning from a shoulder problem"), "the reason is shown in the local report");
        assertTrue(athlete.contains("href=\"#p1-f1\""), "the constraint links the finding it caused");
    }

    @Test
    void reasonsCanBeLeftOutOfAReportThatWillBeShared() {
        var run = ReportFixtures.check("sample-programs/broken/constraint-load.yaml");
        String html = ReportFixtures.render(ReportFormat.HTML, ReportFixtures.input(run)
                .withHtml(HtmlOptions.DEFAULTS.withReasons(false)));
        assertFalse(html.contains("Returning from a shoulder problem"), "neither in the athlete block nor in messages");
        assertTrue(html.contains(AthleteBlock.REASON_LEFT_OUT));
        assertTrue(html.contains("constraint-load"), "the finding itself stays");
    }

    @Test
    void theSheetHoldsThePrescriptionWithLoadsAndTheCautionOnly() {
        var run = ReportFixtures.check(STRENGTH, "sample-programs/broken/yaml-syntax.yaml");
        String sheet = ReportFixtures.render(ReportFormat.HTML_SHEET, ReportFixtures.withCatalogue(run));
        assertTrue(sheet.contains("<body class=\"sheet\">"));
        assertTrue(sheet.contains(Html.esc(dev.mesolint.core.Mesolint.CAUTION)));
        assertFalse(sheet.contains("<script"));
        assertFalse(sheet.contains(">Findings<"), "no findings column or section");
        assertFalse(sheet.contains("Reports pinching"), "no constraint reasons on an athlete's sheet");
        assertEquals("112.5 kg", load(rows(week(sheet, "p2", 1)), "Barbell back squat"));
        assertEquals(6, rows(sheet).stream().filter(r -> r.exercise().equals("Barbell back squat")).count(),
                "every week is printed in full: six weeks, one squat row each");
        assertTrue(sheet.contains("did not load, so it has no sheet"));
    }

    @Test
    void theStrengthViewShowsTopSetsMeanIntensityAndZonesAgainstPrilepin() {
        String html = report(STRENGTH);
        String view = html.substring(html.indexOf("<section class=\"strength\""));
        view = view.substring(0, view.indexOf("</section>"));
        // Week 1 squat: 4 x 5 at 80% of 140 kg: top set 80%, 112 kg -> 112.5 kg on plates (nearest, common practice);
        // mean intensity 80%; 20 reps; volume load 20 x 112 kg = 2240 kg (the model's unrounded weight); all 20 reps
        // at 80% or more are heavy reps.
        assertTrue(view.contains("<tr><th scope=\"row\">1</th><td>4</td><td>20</td><td>80% · 112.5 kg</td>"
                + "<td>80%</td><td>2240 kg</td><td>20</td></tr>"), view);
        // Week 5: 3 x 3 at 90%: 126 kg is near-maximal, so down to 125 kg (common practice).
        assertTrue(view.contains("<td>90% · 125 kg</td>"), view);
        // Prilepin's table (from memory, as docs/model.md gives it): 80-90% holds 10-20 reps a session; week 1's
        // 20 squat reps at 80% are inside, so not marked.
        assertTrue(view.contains("Prilepin 10–20"));
        assertTrue(view.contains("id=\"p1-intensity\""), "the range chart is drawn");
        // Under the hypertrophy profile the zones are shown without Prilepin's ranges.
        String hypertrophy = report("sample-programs/broken/constraint-load.yaml");
        assertTrue(hypertrophy.contains("reps per intensity zone and session"));
        assertFalse(hypertrophy.contains("Prilepin 10–20"));
    }
}
