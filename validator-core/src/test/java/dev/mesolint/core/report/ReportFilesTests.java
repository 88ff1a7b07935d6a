package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.source.Location;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.json.JsonMapper;

/** Report files: written whole or not at all, never through a link, and one failure never stops the others. */
class ReportFilesTests {

    private static ReportInput surrogateRun() {
        Finding f = new Finding("short-rest-compound", Severity.WARNING, "programmes/a.yaml", new Location(3, 7, ""),
                "session 'x \ud800 y\u001b[31m' rests 60 s", "rest: 2min", Optional.empty());
        RunReport run = new RunReport(List.of(new FileReport("programmes/a.yaml", Optional.empty(), "hypertrophy",
                List.of(f))), Severity.ERROR, List.of());
        return ReportFixtures.input(run);
    }

    @Test
    void aLoneSurrogateNoLongerStopsAnyWriter(@TempDir Path dir) throws IOException {
        ReportInput input = surrogateRun();
        for (ReportFormat format : ReportFormat.values()) {
            Path path = dir.resolve("r." + format.id());
            ReportFiles.write(input, new ReportTarget(format, path));
            String text = Files.readString(path, StandardCharsets.UTF_8);
            // The console form shows the lone half as its code; the structured forms replace it.
            String expected = format == ReportFormat.CONSOLE ? "x \\ud800 y" : "x \uFFFD y";
            // The athlete's sheet shows the prescription only, not findings.
            assertTrue(format == ReportFormat.HTML_SHEET || text.contains(expected), format + " replaces it");
            assertFalse(text.contains("\u001b"), format + " holds no raw escape");
        }
        JsonMapper.builder().build().readTree(dir.resolve("r.json").toFile());
        JsonMapper.builder().build().readTree(dir.resolve("r.sarif").toFile());
    }

    @Test
    void anExistingLinkAtTheTargetIsReplacedNotFollowed(@TempDir Path dir) throws IOException {
        Path victim = Files.writeString(dir.resolve("victim.txt"), "keep");
        Path target = Files.createSymbolicLink(dir.resolve("out.json"), victim);
        ReportFiles.write(surrogateRun(), new ReportTarget(ReportFormat.JSON, target));
        assertEquals("keep", Files.readString(victim));
        assertFalse(Files.isSymbolicLink(target));
        assertTrue(Files.readString(target).contains("short-rest-compound"));
    }

    @Test
    void aFailedTargetLeavesNoPartialFileAndTheOthersAreWritten(@TempDir Path dir) throws IOException {
        Path blocked = Files.createDirectories(dir.resolve("taken.json"));  // a folder where the file should go
        Path sarif = dir.resolve("ok.sarif");
        IOException e = assertThrows(IOException.class, () -> RunReports.writeAll(surrogateRun(),
                List.of(new ReportTarget(ReportFormat.JSON, blocked), new ReportTarget(ReportFormat.SARIF, sarif))));
        assertTrue(e.getMessage().contains("the json report"), e.getMessage());
        assertTrue(Files.readString(sarif).contains("short-rest-compound"), "the SARIF after the failed JSON");
        try (var left = Files.list(dir)) {
            assertEquals(List.of("ok.sarif", "taken.json"), left.map(p -> p.getFileName().toString()).sorted()
                    .toList(), "no temporary file is left behind");
        }
    }
}
