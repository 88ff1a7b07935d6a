package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Severity;
import java.util.List;
import org.junit.jupiter.api.Test;

class FindingGroupsTests {

    @Test
    void groupsTheWeekSequenceSampleByWeekAndSession() {
        FileReport file = ReportFixtures.check("sample-programs/broken/week-sequence.yaml").files().get(0);
        List<FindingGroups.Group> groups = FindingGroups.of(file, file.findings());
        assertEquals(List.of("Week 1 · day 1 (Lower)", "Week 4"), groups.stream().map(FindingGroups.Group::title)
                .toList());
        assertEquals(1, groups.get(0).findings().size());
        assertEquals("week-sequence", groups.get(1).findings().get(0).ruleId());
    }

    @Test
    void usesPointersWhenTheMessageNamesNoWeekAndKeepsFileFindingsFirst() {
        FileReport loaded = ReportFixtures.check("sample-programs/programmes/minimal-30-minutes.yaml").files().get(0);
        var inSession = ReportFixtures.finding("unknown-exercise", Severity.ERROR, "a.yaml", 40, 13,
                "/weeks/0/sessions/1/work/2/exercise", "unknown exercise 'x'");
        var wholeFile = ReportFixtures.finding("unused-waiver", Severity.WARNING, "a.yaml", 3, 1, "/waivers/0",
                "waiver for 'z' names no known rule");
        var byMessage = ReportFixtures.finding("unknown-exercise", Severity.ERROR, "a.yaml", 40, 13,
                "/weeks/0/sessions/1/work/2/exercise", "in week 3, unknown exercise 'x'");
        FileReport file = new FileReport("a.yaml", loaded.programme(), loaded.profile(),
                List.of(inSession, wholeFile, byMessage));
        List<FindingGroups.Group> groups = FindingGroups.of(file, file.findings());
        assertEquals(List.of("Whole programme", "Week 1 · day 3 (Thirty-minute B)", "Week 3 · day 3 (Thirty-minute B)"),
                groups.stream().map(FindingGroups.Group::title).toList());
    }

    @Test
    void filesThatDidNotLoadGroupByMessageOnly() {
        FileReport file = new FileReport("b.yaml", java.util.Optional.empty(), "hypertrophy", List.of(
                ReportFixtures.finding("schema", Severity.ERROR, "b.yaml", 9, 3, "/weeks/1/sessions/0/day",
                        "week 2 day 9 is not a day of the week"),
                ReportFixtures.finding("schema", Severity.ERROR, "b.yaml", 2, 1, "/programme", "needs 'goal'")));
        assertEquals(List.of("Whole programme", "Week 2 · day 9"), FindingGroups.of(file, file.findings()).stream()
                .map(FindingGroups.Group::title).toList());
    }

    @Test
    void aFindingAboutRepeatedWeeksGoesUnderThoseWeeksNotTheWeekTheyCopy() {
        // Repeated weeks copy week 1's lines, so the pointer is in week 1; the message names weeks 2-4.
        FileReport loaded = ReportFixtures.check("sample-programs/programmes/minimal-30-minutes.yaml").files().get(0);
        var repeated = ReportFixtures.finding("constraint-load", Severity.ERROR, "a.yaml", 40, 13,
                "/weeks/0/sessions/0/work/0/load", "barbell-bench-press, weeks 2-4 day 1 (x), sets 1-3: too heavy");
        var first = ReportFixtures.finding("constraint-load", Severity.ERROR, "a.yaml", 40, 13,
                "/weeks/0/sessions/0/work/0/load", "barbell-bench-press, week 1 day 1 (x), sets 1-3: too heavy");
        FileReport file = new FileReport("a.yaml", loaded.programme(), loaded.profile(), List.of(repeated, first));
        List<FindingGroups.Group> groups = FindingGroups.of(file, file.findings());
        String session = loaded.programme().get().weeks().get(0).sessions().get(0).label();
        assertEquals(List.of("Week 1 · " + session, "Weeks 2-4 · " + session),
                groups.stream().map(FindingGroups.Group::title).toList());
        assertEquals(java.util.Set.of(2, 3, 4), groups.get(1).weeks());
    }

    @Test
    void theSubjectsWeeksAndDayWinOverTheMessage() {
        FileReport loaded = ReportFixtures.check("sample-programs/programmes/minimal-30-minutes.yaml").files().get(0);
        var structured = ReportFixtures.finding("volume-spike", Severity.WARNING, "a.yaml", 40, 13,
                "/weeks/0/sessions/0/work/0", "a message that names no week")
                .withFacts(dev.mesolint.core.finding.Facts.about(dev.mesolint.core.finding.Subject.NONE
                        .withWeeks(List.of(3, 4)).withDay(1)));
        FileReport file = new FileReport("a.yaml", loaded.programme(), loaded.profile(), List.of(structured));
        FindingGroups.Group group = FindingGroups.of(file, file.findings()).get(0);
        assertEquals(java.util.Set.of(3, 4), group.weeks());
        assertEquals(1, group.day());
    }

    @Test
    void readsTheWeeksAMessageNamesFirst() {
        assertEquals(java.util.Set.of(3), FindingWeeks.of("chest, week 3: 16 hard sets, 2 x the mean of weeks 1-2"));
        assertEquals(java.util.Set.of(1, 2, 4, 5, 6), FindingWeeks.of("squat, weeks 1-2, 4-6 day 1: x"));
        assertEquals(java.util.Set.of(), FindingWeeks.of("needs 'goal'"));
        assertEquals("Weeks 1-2, 4-6", FindingWeeks.title(new java.util.TreeSet<>(List.of(1, 2, 4, 5, 6))));
    }
}
