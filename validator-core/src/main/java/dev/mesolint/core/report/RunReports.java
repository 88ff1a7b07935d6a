package dev.mesolint.core.report;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.rule.RuleDefinition;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

/**
 * How a front end turns one run into reports: the report input every writer reads, and the file each format gets in
 * an output folder. Shared by the command line and the Maven plugin so both report a run the same way.
 */
public final class RunReports {
    private RunReports() {
    }

    /** The input for every report of {@code run}, checked under {@code request}'s configuration. */
    public static ReportInput input(RunReport run, List<RuleDefinition> rules, CheckRequest request,
            Duration elapsed) {
        return ReportInput.of(run, rules, request.root()).withConfiguration(request.configuration())
                .withFigures(ModelFigures.underProfiles(request.configuration(), rules))
                .withElapsed(elapsed);
    }

    /** The file a format is written to in an output folder: {@code mesolint.html}, {@code TEST-mesolint.xml}, ... */
    public static ReportTarget inFolder(ReportFormat format, Path folder) {
        String name = switch (format) {
            case CONSOLE -> "mesolint.txt";
            case JSON -> "mesolint.json";
            case SARIF -> "mesolint.sarif";
            case JUNIT -> "TEST-mesolint.xml";
            case HTML -> "mesolint.html";
            case HTML_SHEET -> "mesolint-sheet.html";
        };
        return new ReportTarget(format, folder.resolve(name));
    }

    /**
     * True for the formats that show the training model's figures (HTML charts, the JSON {@code metrics}): they need
     * every programme loaded, so results reused from a cache, which keeps findings only, cannot feed them.
     */
    public static boolean needsFigures(ReportFormat format) {
        return format == ReportFormat.HTML || format == ReportFormat.HTML_SHEET || format == ReportFormat.JSON;
    }

    /**
     * Writes {@code input} to every target. A target that fails does not stop the others: after all were tried, one
     * exception names every failed target, with each failure attached as suppressed.
     */
    public static void writeAll(ReportInput input, List<ReportTarget> targets) throws IOException {
        List<String> failed = new ArrayList<>();
        List<Exception> causes = new ArrayList<>();
        for (ReportTarget target : targets) {
            try {
                ReportFiles.write(input, target);
            } catch (IOException | RuntimeException e) {
                failed.add("the " + target.format().id() + " report " + target.path() + " (" + e.getMessage() + ")");
                causes.add(e);
            }
        }
        if (!failed.isEmpty()) {
            IOException all = new IOException("cannot write " + String.join("; ", failed));
            causes.forEach(all::addSuppressed);
            throw all;
        }
    }
}
