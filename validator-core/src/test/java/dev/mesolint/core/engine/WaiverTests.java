package dev.mesolint.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.report.ConsoleReport;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.FixtureHarness;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Waivers as reports show them; where each level of waiver applies is covered by the fixtures. */
class WaiverTests {
    private final List<RuleDefinition> rules = BuiltInRules.all();

    private RunReport check(String fixture) {
        Path file = FixtureHarness.FIXTURES.resolve(fixture);
        return new Checker(new CheckRequest(List.of(file), FixtureHarness.FIXTURES, Severity.WARNING, List.of(),
                ProfileConfiguration.builtIn(rules), YamlLimits.DEFAULTS), rules).run();
    }

    private static String console(RunReport run, boolean showWaived) {
        StringWriter out = new StringWriter();
        new ConsoleReport(showWaived).write(run, new PrintWriter(out));
        return out.toString();
    }

    @Test
    void showWaivedListsEachWaivedFindingWithItsReason() {
        RunReport run = check("short-rest-compound/passing-waived-session.yaml");
        assertEquals(List.of(), run.active());
        assertEquals(2, run.waivedCount());
        String shown = console(run, true);
        assertTrue(shown.contains("short-rest-compound/passing-waived-session.yaml:20:19: waived warning "
                + "short-rest-compound: goblet-squat, week 1 day 1 (Express), sets 1 -> 2, 2 -> 3, 3 -> push-up: "
                + "rest 60 s, the hypertrophy profile asks for at least 120 s after compound sets\n"
                + "    fix: rest: 2min\n"
                + "    waived at line 13: Thirty-minute express session for the lunch-time group.\n"), shown);
        assertTrue(shown.contains("0 errors, 0 warnings, 0 info, 2 waived"), shown);
        String hidden = console(run, false);
        assertFalse(hidden.contains("waived warning"), hidden);
        assertTrue(hidden.contains("2 waived"), hidden);
    }

    @Test
    void aWaiverInOneRepeatedWeekWaivesThatWeekOnly() {
        RunReport run = check("short-rest-compound/failing-waived-repeated-week.yaml");
        List<Finding> findings = run.files().get(0).findings();
        assertEquals(2, findings.size());
        Finding active = run.active().stream().filter(f -> f.ruleId().equals("short-rest-compound")).findFirst()
                .orElseThrow();
        assertTrue(active.message().startsWith("barbell-bench-press, weeks 1, 3 day 1, sets 1 -> 2, 2 -> 3: "),
                active.message());
        Finding waived = run.files().get(0).waived().stream().filter(f -> f.ruleId().equals("short-rest-compound"))
                .findFirst().orElseThrow();
        assertTrue(waived.message().startsWith("barbell-bench-press, week 2 day 1, "), waived.message());
        assertEquals("Test week at the club open day, with short rests to fit the timetable.",
                waived.waiver().orElseThrow().reason());
    }

    @Test
    void aStaleWaiverIsReportedWithItsReason() {
        List<Finding> found = check("unused-waiver/failing.yaml").active().stream()
                .filter(f -> f.ruleId().equals("unused-waiver")).toList();
        assertEquals("waiver for 'short-rest-compound' accepted no short-rest-compound finding (reason given: "
                + "Timed circuit day for the club's open session.)", found.get(0).message());
        assertEquals("waiver for 'short-rest-isolaton' names no known rule (reason given: Finisher with short "
                + "rests on purpose.)", found.get(1).message());
    }

    @Test
    void aWaiverWithoutAReasonBreaksTheFormat() {
        List<Finding> found = check("schema/failing-waiver-without-reason.yaml").active();
        assertEquals(1, found.size());
        assertEquals("schema", found.get(0).ruleId());
        assertTrue(found.get(0).message().contains("is missing 'reason'"), found.get(0).message());
        assertTrue(found.get(0).fix().startsWith("add reason:"), found.get(0).fix());
    }
}
