package dev.mesolint.core.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.report.JsonReport;
import dev.mesolint.core.report.ReportFormat;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import java.io.StringWriter;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * A run whose only figure-showing report is JSON packs each file's figures as it is checked and drops the model, and
 * its JSON report is byte for byte the one written from the whole model.
 */
class PackedFiguresRunTests {
    private static final Path SAMPLES = Path.of("../sample-programs").toAbsolutePath().normalize();
    private final List<RuleDefinition> rules = BuiltInRules.all();

    @Test
    void aJsonOnlyRunWritesTheSameReportFromPackedFiguresAndHoldsNoModel() throws Exception {
        List<Path> inputs = List.of(SAMPLES.resolve("programmes"), SAMPLES.resolve("sound"),
                SAMPLES.resolve("broken"));
        RunRequest base = RunRequest.of(RunOptions.at(SAMPLES), inputs);
        RunResult whole = CheckRun.run(base.withFigures(FigureUse.ALL), rules);
        RunResult packed = CheckRun.run(base.withFigures(FigureUse.JSON), rules);

        String expected = json(whole);
        assertTrue(expected.contains("\"metrics\""), "the samples have figures to compare");
        assertEquals(expected, json(packed));
        long loaded = packed.report().files().stream().filter(FileReport::loaded).count();
        assertTrue(loaded >= 8, "most samples load");
        assertTrue(packed.report().files().stream().allMatch(f -> f.programme().isEmpty() && f.metrics().isEmpty()),
                "no file keeps its programme or model once packed");
    }

    @Test
    void onlyJsonAmongTheFigureReportsPacks() {
        assertEquals(FigureUse.JSON, FigureUse.of(List.of(ReportFormat.JSON, ReportFormat.SARIF, ReportFormat.CONSOLE)));
        assertEquals(FigureUse.ALL, FigureUse.of(List.of(ReportFormat.JSON, ReportFormat.HTML)));
        assertEquals(FigureUse.ALL, FigureUse.of(List.of(ReportFormat.HTML_SHEET)));
        assertEquals(FigureUse.NONE, FigureUse.of(List.of(ReportFormat.SARIF, ReportFormat.JUNIT)));
    }

    private static String json(RunResult result) throws Exception {
        StringWriter out = new StringWriter();
        new JsonReport().write(result.reportInput(result.report(), Duration.ZERO), out);
        return out.toString();
    }
}
