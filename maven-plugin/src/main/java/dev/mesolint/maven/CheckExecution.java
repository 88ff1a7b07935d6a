package dev.mesolint.maven;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.SettingSources;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.report.HtmlOptions;
import dev.mesolint.core.report.ReportFormat;
import dev.mesolint.core.report.ReportOptions;
import dev.mesolint.core.report.ReportTarget;
import dev.mesolint.core.report.RunReports;
import dev.mesolint.core.rules.InternalErrorRule;
import dev.mesolint.core.run.CheckRun;
import dev.mesolint.core.run.RunRequest;
import dev.mesolint.core.run.RunResult;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.stream.Collectors;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.logging.Log;

/**
 * One run of the core for a goal, through the core's single run call; this class only logs and turns the core's
 * problems into Maven's exceptions.
 */
final class CheckExecution {
    private final Log log;
    private final RunSettings.Prepared prepared;

    CheckExecution(Log log, RunSettings.Prepared prepared) {
        this.log = log;
        this.prepared = prepared;
    }

    /** Runs {@code request} (the prepared one with the goal's cache, baseline and new-since choices). */
    RunResult run(RunRequest request) throws MojoExecutionException {
        RunResult result;
        try {
            result = CheckRun.run(request, prepared.rules());
        } catch (ConfigProblem e) {
            throw RunSettings.problem(e);
        } catch (IOException e) {
            throw new MojoExecutionException("mesolint: cannot read the programmes: " + e.getMessage(), e);
        }
        SettingSources.describe(result.workspace(), name -> "plugin parameter " + name)
                .forEach(s -> log.debug("mesolint: " + s));
        RunResult.CacheUse cache = result.cache();
        cache.discarded().ifPresent(why -> log.debug("mesolint: not reusing earlier results: " + why));
        if (cache.rejected() > 0) {
            log.info("mesolint: " + cache.rejected() + " cache entr" + (cache.rejected() == 1 ? "y" : "ies")
                    + " failed the checksum; checked afresh");
        }
        cache.notSaved().ifPresent(why -> log.warn("mesolint: could not write the result cache "
                + request.cacheFile().map(Path::toString).orElse("") + ": " + why
                + "; the next build checks every programme again"));
        if (cache.reused() > 0) {
            log.info("mesolint: " + cache.reused() + " programme" + (cache.reused() == 1 ? "" : "s")
                    + " unchanged, results reused from cache" + (cache.checked() > 0 ? "; " + cache.checked()
                    + " checked" : ""));
        }
        if (!request.applyBaseline()) {
            log.debug("mesolint: baseline ignored (plugin parameter ignoreBaseline)");
        }
        request.newSince().ifPresent(since -> log.info("mesolint: findings already present at " + since
                + " are held (newSince); new ones count"));
        return result;
    }

    /** Writes every report of the run; a report that cannot be written is a build error. */
    void writeReports(RunResult result, Duration elapsed, List<ReportTarget> targets, Path folder,
            boolean showReasons, boolean includeReasons) throws MojoExecutionException {
        try {
            ReportOptions options = ReportOptions.DEFAULTS.withGitAt(result.request().root())
                    .withBaselineInForce(result.baselineInForce()).withIncludeReasons(includeReasons);
            RunReports.writeAll(result.reportInput(result.report(), elapsed).withOptions(options).withHtml(coachReport(result, targets, showReasons)), targets);
        } catch (IOException e) {
            throw new MojoExecutionException("mesolint: cannot write the reports to " + folder + ": "
                    + e.getMessage(), e);
        }
        log.info("mesolint: reports written to " + folder + ": " + targets.stream()
                .map(t -> t.path().getFileName().toString()).collect(Collectors.joining(", ")));
    }

    /**
     * The coach's report options: the repository's plate increment, reasons shown or not, and the run's catalogue
     * (read again only when an HTML report is written, for exercise names and capped regions).
     */
    private static HtmlOptions coachReport(RunResult result, List<ReportTarget> targets, boolean showReasons) {
        HtmlOptions options = HtmlOptions.DEFAULTS.withReasons(showReasons)
                .withPlateIncrement(result.workspace().config().plateIncrement());
        boolean html = targets.stream().anyMatch(t -> t.format() == ReportFormat.HTML
                || t.format() == ReportFormat.HTML_SHEET);
        return html ? options.withCatalogue(result.catalogue()) : options;
    }

    /** Files that could not be read, or that mesolint failed on, are a build error, not a finding to fix. */
    static void failOnBrokenRun(RunResult result) throws MojoExecutionException {
        if (!result.unreadable().isEmpty()) {
            throw new MojoExecutionException("mesolint: cannot read " + result.unreadable());
        }
        List<Finding> internal = result.report().active().stream()
                .filter(f -> f.ruleId().equals(InternalErrorRule.ID)).toList();
        if (!internal.isEmpty()) {
            throw new MojoExecutionException("mesolint failed while checking " + internal.size()
                    + " file(s); see the " + InternalErrorRule.ID + " findings above");
        }
    }
}
