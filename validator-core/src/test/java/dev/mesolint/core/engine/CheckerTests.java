package dev.mesolint.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.Programmes;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckerTests {
    @TempDir
    Path dir;

    private RunReport check(Path... inputs) {
        return new Checker(CheckRequest.of(List.of(inputs), dir), BuiltInRules.all()).run();
    }

    private Map<String, List<Finding>> byFile(RunReport run) {
        return run.files().stream().collect(Collectors.toMap(FileReport::displayPath, FileReport::findings));
    }

    @Test
    void hostileFilesGetLocatedErrorsAndTheOtherFilesAreStillChecked() throws IOException {
        // Four bench sets: three would be under weekly-volume-min's four for a muscle trained directly.
        Files.writeString(dir.resolve("good.yaml"), Programmes.oneWeek().replace("sets: 3", "sets: 4"));
        Files.writeString(dir.resolve("unknown.yaml"), Programmes.oneWeek().replace("barbell-bench-press",
                "barbel-bench-press"));
        StringBuilder bomb = new StringBuilder("a: &a [x, x, x, x, x, x, x, x, x]\n");
        for (char c = 'b'; c <= 'j'; c++) {
            bomb.append(c).append(": &").append(c).append(" [").append(("*" + (char) (c - 1) + ", ").repeat(8))
                    .append('*').append((char) (c - 1)).append("]\n");
        }
        Files.writeString(dir.resolve("alias-bomb.yaml"), bomb);
        Files.writeString(dir.resolve("deep.yaml"), "[".repeat(10_000) + "]".repeat(10_000));
        Files.write(dir.resolve("binary.yml"), new byte[] {(byte) 0x89, 'P', 'N', 'G', 0, 0, 0, 13, 1, 2});
        try (OutputStream out = Files.newOutputStream(dir.resolve("huge.yaml"))) {
            byte[] line = "# padding line for a twenty megabyte file ..................................\n".getBytes();
            for (long written = 0; written < 20L * 1024 * 1024; written += line.length) {
                out.write(line);
            }
        }

        RunReport run = check(dir);
        Map<String, List<Finding>> files = byFile(run);
        assertEquals(6, files.size(), files.keySet().toString());
        assertEquals(List.of(), files.get("good.yaml"));
        assertEquals(List.of("unknown-exercise"), files.get("unknown.yaml").stream().map(Finding::ruleId).toList());
        for (String hostile : List.of("alias-bomb.yaml", "deep.yaml", "binary.yml", "huge.yaml")) {
            List<Finding> f = files.get(hostile);
            assertEquals(1, f.size(), hostile + ": " + f);
            assertEquals("yaml-syntax", f.get(0).ruleId(), hostile);
            assertEquals(Severity.ERROR, f.get(0).severity());
            assertFalse(f.get(0).fix().isBlank());
            assertTrue(f.get(0).location().line() >= 1);
        }
        assertTrue(files.get("huge.yaml").get(0).message().contains("20.0 MB"));
        assertTrue(run.failed());
    }

    @Test
    void theCleanSampleProgrammesPass() {
        Path samples = Path.of("..", "sample-programs", "programmes");
        RunReport run = new Checker(CheckRequest.of(List.of(samples), samples), BuiltInRules.all()).run();
        assertTrue(run.files().size() >= 4);
        // The CLI's default request, as SampleProgrammesTests checks the built-in profiles: no finding at all.
        assertEquals(List.of(), run.active().stream().map(Finding::toString).toList(),
                "the good samples give no finding");
    }

    @Test
    void everyBrokenStructuralSampleGivesTheFindingItsNamePromises() {
        Path broken = Path.of("..", "sample-programs", "broken");
        RunReport run = new Checker(CheckRequest.of(List.of(broken), broken), BuiltInRules.all()).run();
        for (String rule : List.of("yaml-syntax", "schema", "unknown-exercise", "week-sequence")) {
            FileReport file = run.files().stream().filter(f -> f.displayPath().equals(rule + ".yaml")).findFirst()
                    .orElseThrow();
            assertTrue(file.active().stream().anyMatch(f -> f.ruleId().equals(rule)), rule + ": " + file.findings());
        }
    }

    @Test
    void missingInputsAreListedNotThrown() {
        RunReport run = check(dir.resolve("nope.yaml"));
        assertEquals(List.of(dir.resolve("nope.yaml").toString()), run.missing());
    }

    @Test
    void aWaiverAcceptsTheFindingAndAStaleOneIsReported() throws IOException {
        String text = Programmes.oneWeek().replace("barbell-bench-press", "harbour-sled-press")
                .replace("            rest: 3min\n", """
                            rest: 3min
                            waive:
                              - {rule: unknown-exercise, reason: club-built sled press; entry pending}
                              - {rule: week-sequence, reason: left over from an older draft}
                """);
        Files.writeString(dir.resolve("waived.yaml"), text);
        RunReport run = check(dir);
        List<Finding> findings = run.files().get(0).findings();
        assertEquals(2, findings.size(), findings.toString());
        Finding waived = findings.stream().filter(Finding::waived).findFirst().orElseThrow();
        assertEquals("unknown-exercise", waived.ruleId());
        assertEquals("club-built sled press; entry pending", waived.waiver().orElseThrow().reason());
        Finding stale = run.active().stream().filter(f -> f.ruleId().equals("unused-waiver")).findFirst()
                .orElseThrow();
        assertEquals(21, stale.location().line());
        assertFalse(run.failed(), "an unused waiver is a warning; the fail level is error");
    }
}
