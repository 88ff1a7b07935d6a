package dev.mesolint.core.report;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.source.Location;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/** Runs and reports shared by the report tests: real checks of the samples, and hand-built runs. */
final class ReportFixtures {
    /** The repository root (the tests run in validator-core/). */
    static final Path ROOT = Path.of("..").toAbsolutePath().normalize();
    static final Path SAMPLES = ROOT.resolve("sample-programs");
    static final List<RuleDefinition> RULES = BuiltInRules.all();

    private ReportFixtures() {
    }

    /** Checks the given files or folders under the repository root with the default configuration. */
    static RunReport check(String... paths) {
        List<Path> inputs = java.util.Arrays.stream(paths).map(ROOT::resolve).toList();
        if (!inputs.stream().allMatch(Files::exists)) {
            throw new IllegalStateException("missing sample: " + inputs);
        }
        return new Checker(CheckRequest.of(inputs, ROOT), RULES).run();
    }

    /** The built-in catalogue, as a run reads it. */
    static dev.mesolint.core.catalogue.Catalogue catalogue() {
        return new Checker(CheckRequest.of(List.of(), ROOT), RULES).catalogue();
    }

    /** The input of a real run with the catalogue the coach's report names exercises and finds caps with. */
    static ReportInput withCatalogue(RunReport run) {
        return input(run).withHtml(HtmlOptions.DEFAULTS.withCatalogue(catalogue()));
    }

    static ReportInput input(RunReport run) {
        return ReportInput.of(run, RULES, ROOT);
    }

    /** Writes {@code input} with the format's writer into a string. */
    static String render(ReportFormat format, ReportInput input) {
        StringWriter out = new StringWriter();
        try {
            format.writer(ROOT.resolve("validator-core/target/report.out")).write(input, out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    static Finding finding(String rule, Severity severity, String file, int line, int column, String pointer,
            String message) {
        return new Finding(rule, severity, file, new Location(line, column, pointer), message,
                "fix for " + message, Optional.empty());
    }

    /**
     * A hand-built run over a loaded programme (the thirty-minute sample, with invented findings: an error, a warning,
     * an info finding and a waived warning) and a file that did not load (a schema error).
     */
    /** {@code run} with the findings whose fingerprint is in {@code fingerprints} marked as held by a baseline. */
    static RunReport baselining(RunReport run, java.util.Set<String> fingerprints) {
        List<FileReport> files = run.files().stream().map(f -> new FileReport(f.displayPath(), f.programme(),
                f.profile(), f.findings().stream()
                        .map(x -> fingerprints.contains(x.fingerprint()) ? x.asBaselined() : x).toList(), f.metrics()))
                .toList();
        return new RunReport(files, run.failOn(), run.missing());
    }

    static RunReport handMadeRun(Severity failOn) {
        String good = "programmes/a.yaml";
        var programme = check("sample-programs/programmes/minimal-30-minutes.yaml").files().get(0).programme();
        Finding error = finding("week-sequence", Severity.ERROR, good, 41, 7, "/weeks/2/week",
                "week 4 follows week 2: week 3 is missing");
        Finding warning = finding("unused-waiver", Severity.WARNING, good, 12, 3, "/waivers/0",
                "waiver for 'x' names no known rule");
        Finding info = finding("unknown-exercise", Severity.INFO, good, 20, 15, "/weeks/0/sessions/0/work/0/exercise",
                "unknown exercise 'benchpress'");
        Finding waived = finding("unused-waiver", Severity.WARNING, good, 30, 3, "/weeks/1/waivers/0",
                "waiver for 'y' names no known rule")
                .waivedBy(new Waiver("unused-waiver", "kept while the club reviews its waivers",
                        new Location(29, 5, "/weeks/1/waivers/0"), false));
        Finding schema = finding("schema", Severity.ERROR, "broken/b.yaml", 3, 1, "/programme",
                "'programme' needs 'goal'");
        return new RunReport(List.of(
                new FileReport(good, programme, "general-fitness", List.of(error, warning, info, waived)),
                new FileReport("broken/b.yaml", Optional.empty(), "hypertrophy", List.of(schema))),
                failOn, List.of());
    }
}
