package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.finding.Severity;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportTargetTests {

    @Test
    void parsesFormatEqualsPath() {
        ReportTarget t = ReportTarget.parse("SARIF=target/out/mesolint.sarif");
        assertEquals(ReportFormat.SARIF, t.format());
        assertEquals(Path.of("target/out/mesolint.sarif"), t.path());
        assertEquals(ReportFormat.JUNIT, ReportTarget.parse("junit=a=b.xml").format());
        assertEquals(Path.of("a=b.xml"), ReportTarget.parse("junit=a=b.xml").path());
    }

    @Test
    void rejectsUnknownFormatsAndMissingParts() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ReportTarget.parse("pdf=x"));
        assertTrue(e.getMessage().contains("console, json, sarif, junit, html"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ReportTarget.parse("sarif"));
        assertThrows(IllegalArgumentException.class, () -> ReportTarget.parse("sarif="));
        assertThrows(IllegalArgumentException.class, () -> ReportTarget.parse("=x.sarif"));
    }

    @Test
    void writesEveryFormatIntoNewFolders(@TempDir Path dir) throws Exception {
        ReportInput input = ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR));
        for (ReportFormat format : ReportFormat.values()) {
            Path path = dir.resolve("deep/" + format.id() + "/report." + format.id());
            ReportFiles.write(input, new ReportTarget(format, path));
            String text = Files.readString(path, StandardCharsets.UTF_8);
            String caution = format == ReportFormat.HTML || format == ReportFormat.HTML_SHEET ? Html.esc(Mesolint.CAUTION)
                    : Mesolint.CAUTION;
            assertTrue(text.contains(caution), format + " carries the caution");
        }
    }
}
