package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.engine.RunProgress;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.report.HtmlOptions;
import dev.mesolint.core.report.ReportFormat;
import dev.mesolint.core.report.ReportInput;
import dev.mesolint.core.report.ReportOptions;
import dev.mesolint.core.report.ReportTarget;
import dev.mesolint.core.report.RunReports;
import dev.mesolint.core.review.ChangedProgrammes;
import dev.mesolint.core.review.ReviewHtmlSection;
import dev.mesolint.core.review.ReviewInput;
import dev.mesolint.core.rules.InternalErrorRule;
import dev.mesolint.core.run.CheckRun;
import dev.mesolint.core.run.RunRequest;
import dev.mesolint.core.run.RunResult;
import dev.mesolint.core.text.SafeText;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code mesolint check PATH...}: checks programme files and folders against the rules. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Checks programme files, and every *.yaml / *.yml below the folders given.",
            "Findings print as path:line:column: severity rule-id: message, with a fix on the next line.",
            "Reports for CI and coaches are written with --report FORMAT=PATH (repeatable), e.g.",
            "  --report sarif=target/mesolint.sarif --report html=target/mesolint.html",
            "Standard output carries one document, so it can be piped: --format sarif | jq, or --report sarif=-.",
            "'-' as the PATH reads one programme from standard input (editors: add --stdin-filename PATH)."},
        footer = {"", ConfigOptions.PRECEDENCE, "",
            MesolintCommand.EXIT_CODES,
            "", "Caution: " + Mesolint.CAUTION})
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

    @Parameters(arity = "1..*", paramLabel = "PATH",
            description = "Programme files or folders; '-' reads one programme from standard input.")
    List<Path> paths = new ArrayList<>();

    @Mixin
    OutputOptions output;

    @Mixin
    StandardInput stdin;

    @Mixin
    ConfigOptions options;

    @Mixin
    CacheOptions cache;

    @Mixin
    ConfigOptions.Catalogues catalogues;

    @Option(names = "--fail-on", paramLabel = "LEVEL",
            description = "Exit 1 when a finding reaches this level: error, warning or info "
                    + "(default: fail-on in the configuration, else error).")
    String failOn;

    @Option(names = "--baseline", paramLabel = "FILE",
            description = "Compare with this baseline (written by 'mesolint baseline'): findings it holds are shown "
                    + "as baselined and not counted (default: baseline in the configuration, if any).")
    Path baseline;

    @Option(names = "--new-since", paramLabel = "REV",
            description = "Count only the findings that are new since this git revision (a branch, tag or commit, "
                    + "read from the repository's history: no baseline file). Errors of the safety rules (athlete "
                    + "constraints among them) and findings in files that did not load, at REV or now, always count.")
    String newSince;

    @Option(names = "--changed", paramLabel = "REV", arity = "0..1", fallbackValue = "",
            description = "Check only the programmes added, edited or renamed since git revision REV (default: where "
                    + "this branch left the default branch, else HEAD), uncommitted and untracked files included. A "
                    + "change to .mesolint.yaml, a catalogue or anything under .mesolint/ checks every programme.")
    String changed;

    @Option(names = "--no-baseline", description = "Ignore the configuration's baseline: count every finding.")
    boolean noBaseline;

    @Option(names = "--show-waived", description = "Also print findings that a waiver accepts, with its reason.")
    boolean showWaived;

    @Option(names = "--report", paramLabel = "FORMAT=PATH", converter = ReportTargetConverter.class,
            description = {"Also write a report (repeatable). FORMAT is one of: console, json, sarif, junit, html, "
                    + "html-sheet (the athlete's sheet: the prescription with loads, a week per printed page).",
                "e.g. --report sarif=target/mesolint.sarif --report html=target/mesolint.html"})
    List<ReportTarget> reports = new ArrayList<>();

    @Option(names = "--no-reasons", description = "Leave the reasons of the athlete's constraints (health data) out "
            + "of the HTML report, e.g. for a report that will be shared.")
    boolean noReasons;

    @Option(names = "--include-reasons", description = "Keep the reasons of the athlete's constraints (health data) in "
            + "the SARIF and JSON reports. By default they are left out, as those reports are uploaded to "
            + "code-scanning services and kept with CI logs.")
    boolean includeReasons;

    @Option(names = "--help-uri-base", paramLabel = "URL",
            description = "Where your team publishes the rule reference pages (docs/rules): reports link each rule "
                    + "to URL/RULE-ID.md. Default: no links; SARIF carries each rule's page inline.")
    String helpUriBase;

    @Option(names = "--junit-fail-at", paramLabel = "LEVEL",
            description = "JUnit report: a rule's test case fails on findings at this level or above: error, warning "
                    + "or info (default: the fail level, so a case fails exactly when its findings fail the run).")
    String junitFailAt;

    @Option(names = "--allow-empty",
            description = "Exit 0 when no programme file is found (default: a run that checks nothing fails, exit 2).")
    boolean allowEmpty;

    @CommandLine.ParentCommand
    MesolintCommand parent;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        CommandLine cli = spec.commandLine();
        Optional<Severity> level = level(failOn, "--fail-on");
        Optional<Severity> junitLevel = level(junitFailAt, "--junit-fail-at");
        ReportFormat stdoutFormat = output.stdoutFormat(reports, cli);
        Optional<StandardInput.Document> piped = stdin.read(paths, parent.in(), cli);
        if (changed != null && piped.isPresent()) {
            throw new CommandLine.ParameterException(cli, "--changed selects files of the work tree; it cannot be "
                    + "used with standard input (-)");
        }
        List<Path> located = piped.map(d -> List.of(d.path())).orElse(paths);
        long started = System.nanoTime();
        RunResult result;
        InstalledRules installed;
        try {
            installed = Installed.rules();
            RunOptions runOptions = options.toRunOptions(located, catalogues.files, level,
                    Optional.ofNullable(baseline));
            RunRequest request = RunRequest.of(runOptions, piped.isPresent() ? List.of() : paths)
                    .withFigures(CacheOptions.figureUse(reports, stdoutFormat));
            if (piped.isPresent()) {
                request = request.withPiped(new RunRequest.Piped(piped.get().path(), piped.get().content()));
            }
            if (changed != null) {
                request = request.withChangedSince(new RunRequest.ChangedSince(Optional.of(changed)
                        .filter(c -> !c.isBlank())));
            }
            Optional<String> uncached = cache.notUsed(reports, stdoutFormat);
            if (piped.isEmpty() && uncached.isEmpty()) {
                // Unchanged files cost one read and one hash; the checker is only built when some file changed.
                request = request.withCache(cache.file(runOptions.root()));
            } else if (cache.enabled && !output.quiet) {
                cli.getErr().println("mesolint: cache not used: " + uncached.orElse("standard input is checked "
                        + "afresh"));
            }
            if (noBaseline) {
                request = request.withoutBaseline();
            }
            if (newSince != null) {
                request = request.withNewSince(newSince);
            }
            RunProgress progress = output.progress(cli.getErr());
            try {
                result = CheckRun.run(request.withProgress(progress), installed.rules());
            } finally {
                ProgressLine.finish(progress);
            }
        } catch (ConfigProblem e) {
            return Installed.fail(e, cli.getErr());
        }
        if (result.selection().isPresent() && !said(result, cli)) {
            return 0;
        }
        RunReport report = result.report();
        sayCache(result.cache(), cli.getErr());
        boolean empty = piped.isEmpty() && report.nothingChecked();
        List<String> hidden = report.hidden();
        result.failedCatalogues().forEach(bad -> cli.getErr().println("mesolint: catalogue " + SafeText.line(bad)
                + " did not load (see its findings): its exercises are unknown in this run"));
        // Missing paths first, so that no summary of what was checked comes before the error.
        report.missing().forEach(m -> cli.getErr().println("mesolint: no such file or folder: " + SafeText.line(m)
                + " (check the path; it is read from the current folder)"));
        Duration elapsed = Duration.ofNanos(System.nanoTime() - started);
        Workspace workspace = result.workspace();
        ReportOptions wording = ReportOptions.DEFAULTS.withHelpUriBase(Optional.ofNullable(helpUriBase))
                .withBaselineInForce(result.baselineInForce())
                .withJunitFailAt(junitLevel).withGitAt(workspace.root()).withIncludeReasons(includeReasons);
        HtmlOptions coach = HtmlOptions.DEFAULTS.withPlateIncrement(workspace.config().plateIncrement())
                .withReasons(!noReasons);
        if (reports.stream().anyMatch(t -> t.format() == ReportFormat.HTML || t.format() == ReportFormat.HTML_SHEET)
                || stdoutFormat == ReportFormat.HTML || stdoutFormat == ReportFormat.HTML_SHEET) {
            coach = coach.withCatalogue(result.catalogue());
        }
        if (result.review().isPresent()) {
            coach = coach.withSection(new ReviewHtmlSection(new ReviewInput(result.review().get(), installed.rules(),
                    workspace.root(), !noReasons)));
        }
        ReportInput input = result.reportInput(report, elapsed).withOptions(wording).withHtml(coach);
        if (stdoutFormat == ReportFormat.CONSOLE) {
            if (!report.files().isEmpty() || report.missing().isEmpty()) {
                output.console(showWaived).write(report, cli.getOut());
            }
        } else {
            stdoutFormat.writer(null).write(input, cli.getOut());
            cli.getOut().flush();
        }
        boolean unwritten = false;
        try {
            RunReports.writeAll(input, reports.stream().filter(t -> !t.toStdout()).toList());
        } catch (IOException e) {
            // Every other report was still written; the failed ones keep their previous file untouched.
            cli.getErr().println("mesolint: " + SafeText.line(e.getMessage()));
            unwritten = true;
        }
        if (!output.quiet) {
            // After the report, where it is read; a notice only, it never changes the exit code.
            result.upgradeNotice().ifPresent(lines -> cli.getErr().println("mesolint: "
                    + String.join(System.lineSeparator(), lines.stream().map(SafeText::line).toList())));
        }
        if (!output.quiet) {
            // mesolint's own files among the programmes: checked as what they are, and not in effect from there.
            report.files().forEach(f -> f.checkedAs().ifPresent(kind -> cli.getErr().println("mesolint: "
                    + SafeText.line(kind.notice(f.displayPath())))));
        }
        if (!hidden.isEmpty()) {
            cli.getErr().println("mesolint: " + hidden.size() + " hidden .yaml file" + (hidden.size() == 1 ? "" : "s")
                    + " not checked (folders skip names that start with '.'; name a file to check it): "
                    + SafeText.line(String.join(", ", hidden)));
        }
        if (empty && report.missing().isEmpty()) {
            cli.getErr().println("mesolint: no programme file (*.yaml, *.yml) found in "
                    + SafeText.line(paths.toString()) + ": nothing was checked"
                    + (allowEmpty ? "" : "; pass --allow-empty when that is expected"));
            if (!allowEmpty) {
                return MesolintCommand.EXIT_USAGE;
            }
        }
        boolean missing = !report.missing().isEmpty() || unwritten;
        boolean internal = report.active().stream().anyMatch(f -> f.ruleId().equals(InternalErrorRule.ID));
        if (missing || internal) {
            return MesolintCommand.EXIT_USAGE;
        }
        return report.failed() ? 1 : 0;
    }

    /**
     * Says on standard error what {@code --changed} compared; false when no programme changed (a clean run, not a
     * silent pass).
     */
    private boolean said(RunResult result, CommandLine cli) {
        ChangedProgrammes.Selection selection = result.selection().orElseThrow();
        String since = " since " + SafeText.line(selection.comparedWith());
        if (selection.everyBecause().isPresent()) {
            cli.getErr().println("mesolint: " + SafeText.line(selection.everyBecause().get()) + " changed" + since
                    + ": every programme is checked");
        } else if (selection.programmes().isEmpty()) {
            cli.getErr().println("mesolint: no programme changed" + since + "; " + selection.changedFiles()
                    + " changed file" + (selection.changedFiles() == 1 ? "" : "s") + " compared: nothing to check");
            return false;
        } else if (!output.quiet) {
            cli.getErr().println("mesolint: " + selection.programmes().size() + " of " + result.selectedFrom()
                    + " programmes changed" + since);
        }
        return true;
    }

    /** How much the cache reused (unless quiet), and why it could not be saved. */
    private void sayCache(RunResult.CacheUse use, java.io.PrintWriter err) {
        use.notSaved().ifPresent(why -> err.println("mesolint: the cache could not be saved (" + SafeText.line(why)
                + "); the results of this run are complete"));
        if (!output.quiet && use.rejected() > 0) {
            err.println("mesolint: cache: " + use.rejected() + " damaged entr" + (use.rejected() == 1 ? "y" : "ies")
                    + " (checksum failed) ignored");
        }
        if (!output.quiet && use.used()) {
            err.println("mesolint: cache: " + use.reused() + " unchanged programme" + (use.reused() == 1 ? "" : "s")
                    + " reused, " + use.checked() + " checked");
        }
    }

    private Optional<Severity> level(String text, String option) {
        if (text == null) {
            return Optional.empty();
        }
        return Optional.of(Severity.parseFailLevel(text).orElseThrow(() -> new CommandLine.ParameterException(
                spec.commandLine(), option + " must be error, warning or info, not '" + text + "'")));
    }
}
