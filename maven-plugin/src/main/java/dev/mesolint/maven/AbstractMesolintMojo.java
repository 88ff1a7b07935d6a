package dev.mesolint.maven;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.report.ReportFormat;
import dev.mesolint.core.report.ReportTarget;
import dev.mesolint.core.report.RunReports;
import dev.mesolint.core.run.FigureUse;
import dev.mesolint.core.run.RunRequest;
import dev.mesolint.core.run.RunResult;
import java.io.File;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apache.maven.execution.MavenSession;
import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugins.annotations.Parameter;

/** The parameters both goals share, and the one path from parameters to the core's result. */
abstract class AbstractMesolintMojo extends AbstractMojo {

    /**
     * Skips mesolint entirely.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.skip", defaultValue = "false")
    boolean skip;

    /**
     * The folder of programme files to check (every {@code *.yaml} / {@code *.yml} below it, except hidden folders
     * and {@code target}), or a single programme file.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.programmes", defaultValue = "${project.basedir}/programmes")
    File programmes;

    /**
     * The repository configuration file. Default: {@code .mesolint.yaml} in the project folder, when it exists.
     * Plugin parameters override what it says.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.config")
    File config;

    /**
     * The rule profile for every programme, overriding the configuration file and each programme's goal. Default:
     * the configuration file's choice, else the profile named after each programme's goal.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.profile")
    String profile;

    /**
     * The level at which findings fail the build: {@code error}, {@code warning} or {@code info}, or {@code none}
     * to log and report every finding without failing the build. Default: the configuration file's
     * {@code fail-on}, else {@code error}.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.failOn")
    String failOn;

    /**
     * Globs of the programme files to check, relative to {@code programmes} (e.g. {@code strength/**}). Default:
     * every {@code *.yaml} and {@code *.yml} below it.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.includes")
    List<String> includes = new ArrayList<>();

    /**
     * Globs of programme files to leave out, relative to {@code programmes} (e.g. {@code drafts/**}). Default: none.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.excludes")
    List<String> excludes = new ArrayList<>();

    /**
     * Extra catalogue files of exercises, added after the configuration file's; entries replace built-in ones by id.
     * On the command line, comma-separated. Default: none.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.catalogues")
    List<File> catalogues = new ArrayList<>();

    /**
     * A baseline file (written by {@code mesolint baseline}): the findings it holds are shown as baselined and do
     * not fail the build. Default: the configuration file's {@code baseline}, else none.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.baseline")
    File baseline;

    /**
     * Compare with no baseline, even one the configuration file names: every finding counts.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.ignoreBaseline", defaultValue = "false")
    boolean ignoreBaseline;

    /**
     * A git revision (branch, tag or commit): only findings that are new relative to it count, with the baseline's
     * safety policy. Needs the repository's history (in CI, a checkout with full depth).
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.newSince")
    String newSince;

    /**
     * Where the reports and the result cache are written.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.outputDirectory", defaultValue = "${project.build.directory}/mesolint")
    File outputDirectory;

    /**
     * Reuse the findings of unchanged programmes from the last run ({@code cache.json} in the output folder).
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.cache", alias = "useCache", defaultValue = "true")
    boolean cache;

    /**
     * Also log the findings that a waiver accepts, with the waiver's reason.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.showWaived", defaultValue = "false")
    boolean showWaived;

    /**
     * Leave the reasons of the athlete's constraints (health data) out of the HTML report, for a report that will be
     * shared.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.noReasons", defaultValue = "false")
    boolean noReasons;

    /**
     * Keep the reasons of the athlete's constraints (health data) in the SARIF and JSON reports. By default they are
     * left out, as those reports are uploaded to code-scanning services and kept with CI logs.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.includeReasons", defaultValue = "false")
    boolean includeReasons;

    /**
     * Let a run that finds no programme file pass. By default it fails the build, so a misnamed folder, a glob that
     * matches nothing or a link that leads nowhere cannot pass in silence.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.allowEmpty", defaultValue = "false")
    boolean allowEmpty;

    /** Paths in findings are shown relative to this folder. */
    @Parameter(defaultValue = "${project.basedir}", readonly = true, required = true)
    File basedir;

    @Parameter(defaultValue = "${session}", readonly = true)
    MavenSession session;

    @Override
    public final void execute() throws MojoExecutionException, MojoFailureException {
        if (skip) {
            getLog().info("mesolint: skipped (mesolint.skip)");
            return;
        }
        if (OncePerBuild.first(session == null ? null : session.getRequest())) {
            getLog().info("mesolint: Note: " + Mesolint.CAUTION);
        }
        List<ReportTarget> targets = reportTargets();
        // An unchanged build replays the last outcome without loading the checker: no parser, schema or rule.
        Optional<UnchangedBuild> unchanged = useCache() && targets.isEmpty() && (newSince == null || newSince.isBlank())
                ? UnchangedBuild.stamp(this, outputDirectory.toPath()) : Optional.empty();
        if (unchanged.isPresent() && unchanged.get().replayed(getLog())) {
            return;
        }
        if (unchanged.isEmpty()) {
            run(targets);
            return;
        }
        unchanged.get().record(this, () -> run(targets));
    }

    /** A real run: settings, the (per-file cached) check, the baseline, reports, then the goal's verdict. */
    private void run(List<ReportTarget> targets) throws MojoExecutionException, MojoFailureException {
        boolean figures = targets.stream().anyMatch(t -> RunReports.needsFigures(t.format()));
        if (useCache() && figures) {
            getLog().debug("mesolint: not using the cache: the html and json reports need every programme loaded");
        }
        boolean reportOnly = "none".equalsIgnoreCase(failOn == null ? "" : failOn.trim());
        RunSettings.Prepared prepared = new RunSettings(basedir.toPath(), programmes, config, profile,
                reportOnly ? null : failOn, catalogues == null ? List.of() : catalogues, baseline,
                includes == null ? List.of() : includes, excludes == null ? List.of() : excludes).prepare();
        RunRequest request = prepared.request().withFigures(
                FigureUse.of(targets.stream().map(ReportTarget::format).toList()));
        if (useCache() && !figures) {
            request = request.withCache(outputDirectory.toPath().resolve("cache.json"));
        }
        if (ignoreBaseline) {
            request = request.withoutBaseline();
        }
        if (newSince != null && !newSince.isBlank()) {
            request = request.withNewSince(newSince.trim());
        }
        CheckExecution execution = new CheckExecution(getLog(), prepared);
        long started = System.nanoTime();
        RunResult result = execution.run(request);
        Optional<List<String>> notice = result.upgradeNotice();
        if (notice.isPresent() && OncePerBuild.first(session == null ? null : session.getRequest(), "rules-version")) {
            notice.get().forEach(line -> getLog().warn("mesolint: " + line));
        }
        if (!targets.isEmpty()) {
            execution.writeReports(result, Duration.ofNanos(System.nanoTime() - started), targets,
                    reportFolder().toPath(), !noReasons, includeReasons);
        }
        // mesolint's own files among the programmes: checked as what they are, and not in effect from there.
        result.report().files().forEach(f -> f.checkedAs().ifPresent(kind -> getLog().info("mesolint: "
                + kind.notice(f.displayPath()))));
        if (result.report().nothingChecked()) {
            emptyRun();
        }
        lastRunProgrammes = result.cache().reused() + result.cache().checked();
        afterCheck(result, reportOnly);
    }

    /** A run that checked no programme: a build error unless {@code allowEmpty}; said either way. */
    private void emptyRun() throws MojoExecutionException {
        String where = "no programme file (*.yaml, *.yml) found in " + shown(programmes)
                + (includes == null || includes.isEmpty() ? "" : " matching includes " + includes)
                + (excludes == null || excludes.isEmpty() ? "" : " outside excludes " + excludes);
        if (!allowEmpty) {
            throw new MojoExecutionException("mesolint: " + where + ": nothing was checked; check programmes "
                    + "(mesolint.programmes), includes and excludes, or set allowEmpty (mesolint.allowEmpty) when "
                    + "that is expected");
        }
        getLog().info("mesolint: " + where + ": nothing was checked (allowEmpty)");
    }

    /** A path as the user wrote it in the POM's terms: relative to the project folder when it is inside it. */
    private String shown(File file) {
        Path base = basedir.toPath().toAbsolutePath().normalize();
        Path path = file.toPath().toAbsolutePath().normalize();
        return path.startsWith(base) && !path.equals(base) ? base.relativize(path).toString().replace('\\', '/')
                : path.toString();
    }

    /** How many programme files the last real run covered (for the unchanged-build record). */
    int lastRunProgrammes;

    /** The report formats this goal writes, as configured. */
    abstract List<String> reportFormats();

    /** The folder this goal writes its reports to: the output folder, unless the goal writes into a site. */
    File reportFolder() {
        return outputDirectory;
    }

    /** Whether this goal reads and writes the result cache. */
    abstract boolean useCache();

    /**
     * What the goal does with the result: log it, fail the build, write reports.
     *
     * @param reportOnly {@code failOn} is {@code none}: findings never fail the build
     */
    abstract void afterCheck(RunResult result, boolean reportOnly) throws MojoExecutionException,
            MojoFailureException;

    private List<ReportTarget> reportTargets() throws MojoExecutionException {
        List<ReportTarget> targets = new ArrayList<>();
        for (String name : reportFormats() == null ? List.<String>of() : reportFormats()) {
            ReportFormat format = ReportFormat.parse(name).orElseThrow(() -> new MojoExecutionException(
                    "mesolint: reports (mesolint.reports): unknown format '" + name + "'; formats: "
                            + ReportFormat.names()));
            targets.add(RunReports.inFolder(format, reportFolder().toPath()));
        }
        return targets;
    }
}
