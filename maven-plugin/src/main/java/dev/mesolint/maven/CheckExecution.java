package dev.mesolint.maven;

import dev.mesolint.core.baseline.Baseline;
import dev.mesolint.core.cache.CachedCheck;
import dev.mesolint.core.cache.ResultCache;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.report.HtmlOptions;
import dev.mesolint.core.report.ReportFormat;
import dev.mesolint.core.report.ReportOptions;
import dev.mesolint.core.report.ReportTarget;
import dev.mesolint.core.report.RunReports;
import dev.mesolint.core.review.ChangeReview;
import dev.mesolint.core.review.NewSinceGate;
import dev.mesolint.core.review.Review;
import dev.mesolint.core.review.ReviewRequest;
import dev.mesolint.core.rules.InternalErrorRule;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.logging.Log;

/**
 * One run of the core for a goal: the cached check, the baseline, the reports. Each step is a core call; this class
 * only logs and turns the core's problems into Maven's exceptions.
 */
final class CheckExecution {
    private final Log log;
    private final RunSettings.Prepared prepared;

    CheckExecution(Log log, RunSettings.Prepared prepared) {
        this.log = log;
        this.prepared = prepared;
    }

    /** Checks the programmes, reusing what {@code cacheFile} holds when present; then compares with the baseline. */
    CachedCheck.Outcome check(Optional<Path> cacheFile, boolean ignoreBaseline) throws MojoExecutionException {
        Optional<ResultCache> cache = cacheFile.map(f -> ResultCache.open(f, prepared.key()));
        cache.flatMap(ResultCache::discarded).ifPresent(why -> log.debug("mesolint: not reusing earlier results: "
                + why));
        cache.filter(c -> c.rejectedEntries() > 0).ifPresent(c -> log.info("mesolint: " + c.rejectedEntries()
                + " cache entr" + (c.rejectedEntries() == 1 ? "y" : "ies") + " failed the checksum; checked afresh"));
        CachedCheck.Outcome outcome;
        try {
            outcome = new CachedCheck(prepared.request(), prepared.rules()).run(cache);
        } catch (IOException e) {
            throw new MojoExecutionException("mesolint: cannot read the programmes: " + e.getMessage(), e);
        }
        cache.ifPresent(this::save);
        if (outcome.reused() > 0) {
            log.info("mesolint: " + outcome.reused() + " programme" + (outcome.reused() == 1 ? "" : "s")
                    + " unchanged, results reused from cache" + (outcome.checked() > 0 ? "; " + outcome.checked()
                    + " checked" : ""));
        }
        if (ignoreBaseline) {
            log.debug("mesolint: baseline ignored (plugin parameter ignoreBaseline)");
            return outcome;
        }
        try {
            // After the cache: it keeps the findings themselves, so editing the baseline never invalidates it.
            RunReport compared = Baseline.applyConfigured(prepared.workspace(), outcome.report());
            return new CachedCheck.Outcome(compared, outcome.reused(), outcome.checked(), outcome.unreadable());
        } catch (ConfigProblem e) {
            throw RunSettings.problem(e);
        }
    }

    /**
     * Holds the findings that revision {@code since} already had, with the baseline's safety policy (errors of the
     * athlete-safety rules and findings of files that did not load, then or now, always count).
     */
    CachedCheck.Outcome newSince(CachedCheck.Outcome outcome, String since) throws MojoExecutionException {
        try {
            Review review = ChangeReview.run(new ReviewRequest(prepared.options(), prepared.request().inputs(),
                    Optional.of(since), Optional.empty()), prepared.rules());
            RunReport gated = new NewSinceGate(prepared.rules()).apply(outcome.report(), review);
            log.info("mesolint: findings already present at " + since + " are held (newSince); new ones count");
            return new CachedCheck.Outcome(gated, outcome.reused(), outcome.checked(), outcome.unreadable());
        } catch (ConfigProblem e) {
            throw RunSettings.problem(e);
        }
    }

    /** Writes every report of the run; a report that cannot be written is a build error. */
    void writeReports(CachedCheck.Outcome outcome, Duration elapsed, List<ReportTarget> targets, Path folder,
            boolean showReasons, boolean baselineInForce) throws MojoExecutionException {
        try {
            ReportOptions options = ReportOptions.DEFAULTS.withGitAt(prepared.request().root())
                    .withBaselineInForce(baselineInForce);
            RunReports.writeAll(RunReports.input(outcome.report(), prepared.rules(), prepared.request(), elapsed)
                    .withOptions(options).withHtml(coachReport(targets, showReasons)), targets);
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
    private HtmlOptions coachReport(List<ReportTarget> targets, boolean showReasons) {
        HtmlOptions options = HtmlOptions.DEFAULTS.withReasons(showReasons)
                .withPlateIncrement(prepared.workspace().config().plateIncrement());
        boolean html = targets.stream().anyMatch(t -> t.format() == ReportFormat.HTML
                || t.format() == ReportFormat.HTML_SHEET);
        return html ? options.withCatalogue(new Checker(prepared.request(), prepared.rules()).catalogue()) : options;
    }

    private void save(ResultCache cache) {
        try {
            cache.save();
        } catch (IOException e) {
            log.warn("mesolint: could not write the result cache " + cache.file() + ": " + e.getMessage()
                    + "; the next build checks every programme again");
        }
    }

    /** Files that could not be read, or that mesolint failed on, are a build error, not a finding to fix. */
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
