package dev.mesolint.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.report.ReportFormat;
import dev.mesolint.core.report.ReportInput;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.Programmes;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run whose reports show neither figures nor the prescription keeps no programme model per file (held to the end
 * of a 10,000-file run it filled a 256 MB heap), yet every report still knows each file loaded.
 */
class ModelKeptOnlyWhenShownTests {
    @TempDir
    Path dir;

    private FileReport checked(boolean keep) throws IOException {
        Path file = dir.resolve("block.yaml");
        Files.writeString(file, Programmes.oneWeek());
        return new Checker(CheckRequest.of(List.of(file), dir).keepingFigures(keep), BuiltInRules.all()).run()
                .files().get(0);
    }

    @Test
    void withoutFiguresTheModelIsDroppedAndTheFileStillCountsAsLoaded() throws IOException {
        FileReport lean = checked(false);
        assertTrue(lean.programme().isEmpty() && lean.metrics().isEmpty());
        assertTrue(lean.loaded());
        assertEquals("harbour-test", lean.identity().orElseThrow().id());
        FileReport full = checked(true);
        assertTrue(full.programme().isPresent() && full.metrics().isPresent() && full.loaded());
        assertEquals(full.findings(), lean.findings(), "the rules saw the same model either way");
    }

    @Test
    void theJunitReportOfALeanRunHasNoLoadError() throws IOException {
        RunReport run = new RunReport(List.of(checked(false)), dev.mesolint.core.finding.Severity.ERROR, List.of());
        StringWriter out = new StringWriter();
        ReportFormat.JUNIT.writer(dir.resolve("junit.xml")).write(ReportInput.of(run, BuiltInRules.all(), dir), out);
        assertTrue(out.toString().contains("<testsuite name=\"block.yaml\""), out.toString());
        assertFalse(out.toString().contains("<error"), out.toString());
        assertFalse(out.toString().contains("the file did not load"), "its rules are reported as run: " + out);
    }
}
