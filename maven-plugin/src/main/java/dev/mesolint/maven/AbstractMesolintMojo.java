package dev.mesolint.maven;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.cache.CachedCheck;
import dev.mesolint.core.cache.ResultCache;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.rules.InternalErrorRule;
import java.io.File;
import java.io.IOException;
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
     * The level at which findings fail the build: {@code error}, {@code warning} or {@code info}. Default: the
     * configuration file's {@code fail-on}, else {@code error}.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.failOn")
    String failOn;

    /**
     * Extra catalogue files of exercises, added after the configuration file's; entries replace built-in ones by id.
     * On the command line, comma-separated. Default: none.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.catalogues")
    List<File> catalogues = new ArrayList<>();

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
    @Parameter(property = "mesolint.cache", defaultValue = "true")
    boolean useCache;

    /**
     * Also log the findings that a waiver accepts, with the waiver's reason.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.showWaived", defaultValue = "false")
    boolean showWaived;

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
        checkParameters();
        CachedCheck.Outcome outcome = check(useCache());
        afterCheck(outcome);
    }

    /** Rejects this goal's own bad parameter values before any work. */
    void checkParameters() throws MojoExecutionException {
    }

    /** Whether this goal reads and writes the result cache. */
    abstract boolean useCache();

    /** What the goal does with the result: log it, fail the build, write reports. */
    abstract void afterCheck(CachedCheck.Outcome outcome) throws MojoExecutionException, MojoFailureException;

    private CachedCheck.Outcome check(boolean cached) throws MojoExecutionException {
        RunSettings.Prepared prepared = new RunSettings(basedir.toPath(), programmes, config, profile, failOn,
                catalogues == null ? List.of() : catalogues).prepare();
        prepared.sources().forEach(s -> getLog().debug("mesolint: " + s));
        Optional<ResultCache> cache = Optional.empty();
        if (cached) {
            ResultCache opened = ResultCache.open(outputDirectory.toPath().resolve("cache.json"), prepared.key());
            opened.discarded().ifPresent(why -> getLog().debug("mesolint: not reusing earlier results: " + why));
            cache = Optional.of(opened);
        }
        CachedCheck.Outcome outcome;
        try {
            outcome = new CachedCheck(prepared.request(), BuiltInRules.all()).run(cache);
        } catch (IOException e) {
            throw new MojoExecutionException("mesolint: cannot read the programmes: " + e.getMessage(), e);
        }
        if (cache.isPresent()) {
            save(cache.get());
        }
        if (outcome.reused() > 0) {
            getLog().info("mesolint: " + outcome.reused() + " programme" + (outcome.reused() == 1 ? "" : "s")
                    + " unchanged, results reused from cache" + (outcome.checked() > 0 ? "; " + outcome.checked()
                    + " checked" : ""));
        }
        return outcome;
    }

    private void save(ResultCache cache) {
        try {
            cache.save();
        } catch (IOException e) {
            getLog().warn("mesolint: could not write the result cache " + cache.file() + ": " + e.getMessage()
                    + "; the next build checks every programme again");
        }
    }

    /** Files that could not be read, or that mesolint failed on, are a BUILD ERROR, not a finding to fix. */
    static void failOnBrokenRun(CachedCheck.Outcome outcome) throws MojoExecutionException {
        if (!outcome.unreadable().isEmpty()) {
            throw new MojoExecutionException("mesolint: cannot read " + outcome.unreadable());
        }
        List<Finding> internal = outcome.report().active().stream()
                .filter(f -> f.ruleId().equals(InternalErrorRule.ID)).toList();
        if (!internal.isEmpty()) {
            throw new MojoExecutionException("mesolint failed while checking " + internal.size()
                    + " file(s); see the " + InternalErrorRule.ID + " findings above");
        }
    }
}
