package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.ConstraintReasons;
import dev.mesolint.core.finding.Finding;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Athlete-constraint reasons (health data) stay out of SARIF and JSON unless asked for, and out of fingerprints. */
class ReportedReasonsTests {
    private static final String FIXTURES = "validator-core/src/test/resources/fixtures/";
    private static final String LOAD_FIXTURE = "Returning from a shoulder sprain";
    private static final String AVOID_FIXTURE = "Pinching at the front of the shoulder";
    // Reasons no rule page quotes (SARIF carries the pages, and they quote the fixtures' own reasons).
    private static final String LOAD_REASON = "Harbourside clinic note L-7731";
    private static final String AVOID_REASON = "Harbourside clinic note A-4410";

    @TempDir
    Path dir;

    /** The two constraint fixtures, with reasons of their own, checked from a folder of their own. */
    private RunReport constraintFixtures() throws IOException {
        Path load = dir.resolve("load.yaml");
        Path avoid = dir.resolve("avoid.yaml");
        Files.writeString(load, Files.readString(ReportFixtures.ROOT.resolve(FIXTURES
                + "constraint-load/failing.yaml")).replace(LOAD_FIXTURE, LOAD_REASON));
        Files.writeString(avoid, Files.readString(ReportFixtures.ROOT.resolve(FIXTURES
                + "constraint-avoid/failing.yaml")).replace(AVOID_FIXTURE, AVOID_REASON));
        return new Checker(CheckRequest.of(List.of(load, avoid), dir), ReportFixtures.RULES).run();
    }

    private String render(ReportFormat format, RunReport run, boolean includeReasons) {
        return ReportFixtures.render(format, ReportInput.of(run, ReportFixtures.RULES, dir)
                .withOptions(ReportOptions.DEFAULTS.withIncludeReasons(includeReasons)));
    }

    @Test
    void sarifAndJsonLeaveTheReasonsOutByDefault() throws IOException {
        RunReport run = constraintFixtures();
        assertTrue(run.active().stream().anyMatch(f -> f.message().contains(LOAD_REASON))
                && run.active().stream().anyMatch(f -> f.message().contains(AVOID_REASON)),
                "the constraint rules quote the reasons; otherwise this test checks nothing");
        for (ReportFormat format : List.of(ReportFormat.SARIF, ReportFormat.JSON)) {
            String report = render(format, run, false);
            assertFalse(report.contains(LOAD_REASON), format + " quotes a constraint reason");
            assertFalse(report.contains(AVOID_REASON), format + " quotes a constraint reason");
            assertTrue(report.contains("the athlete's 70% cap for the shoulder " + ConstraintReasons.LEFT_OUT),
                    format + ": the finding still says which constraint");
        }
    }

    @Test
    void includeReasonsKeepsThem() throws IOException {
        RunReport run = constraintFixtures();
        for (ReportFormat format : List.of(ReportFormat.SARIF, ReportFormat.JSON)) {
            String report = render(format, run, true);
            assertTrue(report.contains(LOAD_REASON) && report.contains(AVOID_REASON), format.toString());
            assertFalse(report.contains(ConstraintReasons.LEFT_OUT), format.toString());
        }
    }

    @Test
    void otherRulesMessagesAndWaiverReasonsAreUntouched() {
        RunReport run = ReportFixtures.handMadeRun(dev.mesolint.core.finding.Severity.ERROR);
        assertEquals(render(ReportFormat.JSON, run, true), render(ReportFormat.JSON, run, false));
        assertEquals(render(ReportFormat.SARIF, run, true), render(ReportFormat.SARIF, run, false));
    }

    @Test
    void fingerprintsNeitherHoldNorFollowTheReason() throws IOException {
        RunReport run = constraintFixtures();
        List<String> before = fingerprints(run);
        Path load = dir.resolve("load.yaml");
        Files.writeString(load, Files.readString(load).replace(LOAD_REASON, "Shoulder sprain in March"));
        Path avoid = dir.resolve("avoid.yaml");
        Files.writeString(avoid, Files.readString(avoid).replace(AVOID_REASON, "Impingement history"));
        List<String> after = fingerprints(new Checker(CheckRequest.of(List.of(load, avoid), dir),
                ReportFixtures.RULES).run());
        assertFalse(before.isEmpty());
        assertEquals(before, after, "rewording a reason keeps every fingerprint");
        assertTrue(before.stream().noneMatch(f -> f.contains("clinic note")), before.toString());
        // The published fingerprints are the same whether reasons are kept or not.
        String kept = render(ReportFormat.JSON, run, true);
        String left = render(ReportFormat.JSON, run, false);
        run.active().forEach(f -> assertTrue(kept.contains(Fingerprints.hash(f)) && left.contains(
                Fingerprints.hash(f))));
    }

    private static List<String> fingerprints(RunReport run) {
        return run.active().stream().map(Finding::fingerprint).sorted().toList();
    }

    @Test
    void snippetsLoseEveryReasonValueInBlockFlowQuotedAndBlockScalarForm() {
        ReportedReasons hidden = new ReportedReasons(ReportOptions.DEFAULTS);
        String left = ConstraintReasons.LEFT_OUT;
        assertEquals("      reason: " + left, hidden.snippet("      reason: Knee surgery in May"));
        assertEquals("    - {avoid: [barbell-upright-row], reason: " + left + "}",
                hidden.snippet("    - {avoid: [barbell-upright-row], reason: impingement history}"));
        assertEquals("  - reason: " + left + "  # from the clinic",
                hidden.snippet("  - reason: \"Knee, left: surgery\"  # from the clinic"));
        assertEquals("      reason: " + left + "\n        " + left + "\n        " + left + "\n      max-load: 70%",
                hidden.snippet("      reason: >-\n        Knee surgery\n        in May\n      max-load: 70%"));
        assertEquals("      load: 80%", hidden.snippet("      load: 80%"));
        String kept = "      reason: Knee surgery in May";
        assertEquals(kept, new ReportedReasons(ReportOptions.DEFAULTS.withIncludeReasons(true)).snippet(kept));
    }
}
