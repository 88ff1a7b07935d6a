package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.RuleConfiguration;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.report.ConsoleReport;
import dev.mesolint.core.report.ReportFiles;
import dev.mesolint.core.report.ReportInput;
import dev.mesolint.core.report.ReportTarget;
import dev.mesolint.core.report.RunReports;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.rules.InternalErrorRule;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code mesolint check PATH...}: checks programme files and folders against the rules. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Checks programme files, and every *.yaml / *.yml below the folders given.",
            "Findings print as path:line:column: severity rule-id: message, with a fix on the next line.",
            "Reports for CI and coaches are written with --report FORMAT=PATH (repeatable), e.g.",
            "  --report sarif=target/mesolint.sarif --report html=target/mesolint.html"},
        footer = {"", "Exit codes: 0 clean, 1 findings at or above the fail level, 2 usage or internal error.", "",
            "Caution: " + Mesolint.CAUTION})
final class CheckCommand implements Callable<Integer> {

    /** Reads {@code FORMAT=PATH}; picocli turns the exception into a usage error with its message. */
    static final class ReportTargetConverter implements CommandLine.ITypeConverter<ReportTarget> {
        @Override
        public ReportTarget convert(String value) {
            try {
                return ReportTarget.parse(value);
            } catch (IllegalArgumentException e) {
                throw new CommandLine.TypeConversionException(e.getMessage());
            }
        }
    }

    @Parameters(arity = "1..*", paramLabel = "PATH", description = "Programme files or folders.")
    List<Path> paths = new ArrayList<>();

    @Option(names = "--fail-on", paramLabel = "LEVEL", defaultValue = "error",
            description = "Exit 1 when a finding reaches this level: error, warning or info (default: ${DEFAULT-VALUE}).")
    String failOn;

    @Option(names = "--root", paramLabel = "DIR",
            description = "Show paths relative to this folder (default: the current folder).")
    Path root;

    @Option(names = "--catalogue", paramLabel = "FILE",
            description = "An extra catalogue file of exercises (repeatable); entries replace built-in ones by id.")
    List<Path> catalogues = new ArrayList<>();

    @Option(names = "--show-waived", description = "Also print findings that a waiver accepts.")
    boolean showWaived;

    @Option(names = "--report", paramLabel = "FORMAT=PATH", converter = ReportTargetConverter.class,
            description = {"Also write a report (repeatable). FORMAT is one of: console, json, sarif, junit, html.",
                "e.g. --report sarif=target/mesolint.sarif --report html=target/mesolint.html"})
    List<ReportTarget> reports = new ArrayList<>();

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Severity level = Severity.parse(failOn).filter(s -> s != Severity.OFF).orElseThrow(() ->
                new CommandLine.ParameterException(spec.commandLine(),
                        "--fail-on must be error, warning or info, not '" + failOn + "'"));
        Path base = root != null ? root : Path.of("").toAbsolutePath();
        CheckRequest request = new CheckRequest(paths, base, level, catalogues, RuleConfiguration.DEFAULTS,
                YamlLimits.DEFAULTS);
        List<RuleDefinition> rules = BuiltInRules.all();
        long started = System.nanoTime();
        RunReport report = new Checker(request, rules).run();
        Duration elapsed = Duration.ofNanos(System.nanoTime() - started);
        new ConsoleReport(showWaived).write(report, spec.commandLine().getOut());
        ReportInput input = RunReports.input(report, rules, request, elapsed);
        for (ReportTarget target : reports) {
            try {
                ReportFiles.write(input, target);
            } catch (IOException e) {
                spec.commandLine().getErr().println("mesolint: cannot write the " + target.format().id()
                        + " report to " + target.path() + ": " + e.getMessage());
                return MesolintCommand.EXIT_USAGE;
            }
        }
        report.missing().forEach(m -> spec.commandLine().getErr().println("mesolint: no such file or folder: " + m));
        boolean missing = !report.missing().isEmpty();
        boolean internal = report.active().stream().anyMatch(f -> f.ruleId().equals(InternalErrorRule.ID));
        if (missing || internal) {
            return MesolintCommand.EXIT_USAGE;
        }
        return report.failed() ? 1 : 0;
    }
}
