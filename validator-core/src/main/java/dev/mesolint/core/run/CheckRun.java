package dev.mesolint.core.run;

import dev.mesolint.core.baseline.Baseline;
import dev.mesolint.core.cache.CachedCheck;
import dev.mesolint.core.cache.ConfigurationKey;
import dev.mesolint.core.cache.ResultCache;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.DuplicateProgrammeIds;
import dev.mesolint.core.engine.ProgrammeFiles;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.format.FormatSchema;
import dev.mesolint.core.report.ModelFigures;
import dev.mesolint.core.report.PackedFigures;
import dev.mesolint.core.report.ReportFigures;
import dev.mesolint.core.review.ChangeReview;
import dev.mesolint.core.review.ChangedProgrammes;
import dev.mesolint.core.review.NewSinceGate;
import dev.mesolint.core.review.Review;
import dev.mesolint.core.review.ReviewRequest;
import dev.mesolint.core.rule.RuleDefinition;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * Runs the checks for a front end, in the one order every front end needs: open the workspace (configuration and
 * profiles, so a broken one stops the run before any file is read), select the changed programmes if asked, check
 * (through the cache if asked), compare with the baseline, then hold what a revision already had.
 */
public final class CheckRun {
    private CheckRun() {
    }

    /**
     * @throws ConfigProblem a configuration, profile, baseline or revision that cannot be used, located
     * @throws IOException   the programmes cannot be listed or read at all
     */
    public static RunResult run(RunRequest request, List<RuleDefinition> rules) throws ConfigProblem, IOException {
        if (request.cacheFile().isEmpty()) {
            // Every file will be checked: load the programme schema while the configuration is read. (With a
            // cache, the schema may never be needed.)
            FormatSchema.prepare(FormatSchema.PROGRAMME);
        }
        Workspace workspace = Workspace.open(request.options(), rules);
        List<Path> inputs = request.inputs();
        Optional<ChangedProgrammes.Selection> selection = Optional.empty();
        int candidates = 0;
        if (request.changedSince().isPresent()) {
            List<Path> all = programmes(workspace, inputs);
            candidates = all.size();
            selection = Optional.of(changed(workspace, all, request.changedSince().get()));
            inputs = selection.get().programmes();
        }
        CheckRequest checks = workspace.request(inputs).keepingFigures(request.keepFigures());
        ReportFigures figures = ModelFigures.underProfiles(checks.configuration(), rules);
        if (request.figures() == FigureUse.JSON) {
            PackedFigures packed = PackedFigures.underProfiles(checks.configuration(), rules);
            checks = checks.keeping(packed::pack);
            figures = packed;
        }
        if (selection.isPresent() && inputs.isEmpty()) {
            RunReport none = new RunReport(List.of(), checks.failOn(), List.of());
            return new RunResult(workspace, checks, rules, none, List.of(), RunResult.CacheUse.NONE, selection,
                    candidates, Optional.empty(), figures);
        }
        RunReport report;
        List<Path> unreadable = List.of();
        RunResult.CacheUse cache = RunResult.CacheUse.NONE;
        if (request.piped().isPresent()) {
            RunRequest.Piped piped = request.piped().get();
            report = DuplicateProgrammeIds.mark(new Checker(checks, rules).run(piped.path(), piped.content()));
        } else {
            Optional<ResultCache> store = Optional.empty();
            if (request.cacheFile().isPresent()) {
                store = Optional.of(ResultCache.open(request.cacheFile().get(), ConfigurationKey.of(workspace, checks,
                        rules)));
            }
            CachedCheck.Outcome outcome = new CachedCheck(checks, rules).run(store, request.progress());
            report = outcome.report();
            unreadable = outcome.unreadable();
            if (store.isPresent()) {
                cache = new RunResult.CacheUse(true, outcome.reused(), outcome.checked(), store.get().discarded(),
                        store.get().rejectedEntries(), save(store.get()));
            }
        }
        if (request.applyBaseline()) {
            // After the cache: it keeps the findings themselves, so editing the baseline never invalidates it.
            report = Baseline.applyConfigured(workspace, report);
        }
        Optional<Review> review = Optional.empty();
        if (request.newSince().isPresent()) {
            Review r = ChangeReview.run(new ReviewRequest(request.options(), request.inputs(), request.newSince(),
                    Optional.empty()), rules);
            report = new NewSinceGate(rules).apply(report, r);
            review = Optional.of(r);
        }
        return new RunResult(workspace, checks, rules, report, unreadable, cache, selection, candidates, review,
                figures);
    }

    /**
     * The entries a full check would cover: the programmes and the entries it would report as unreadable (a dangling
     * link, a FIFO), so that a changed one of those is reported by a quick check too, never skipped.
     */
    private static List<Path> programmes(Workspace workspace, List<Path> inputs) {
        CheckRequest all = workspace.request(inputs);
        ProgrammeFiles.Discovery found = ProgrammeFiles.find(all.root(), all.inputs(), all.ownFiles());
        List<Path> entries = new ArrayList<>(found.programmes());
        found.refused().forEach(r -> entries.add(r.path()));
        return entries;
    }

    /** The {@code candidates} changed since the revision; every one when a configuring file changed. */
    private static ChangedProgrammes.Selection changed(Workspace workspace, List<Path> candidates,
            RunRequest.ChangedSince since) throws ConfigProblem {
        // The catalogues and team profiles in effect, the configuration and the baseline decide findings too,
        // wherever they are kept.
        Set<Path> configuring = new HashSet<>(workspace.request(List.of()).ownFiles());
        workspace.config().file().ifPresent(configuring::add);
        workspace.baselineFile().ifPresent(configuring::add);
        return ChangedProgrammes.since(workspace.root(), since.revision(), candidates, configuring);
    }

    /** Saves the cache; why it could not be saved, if so (the run's results are complete either way). */
    private static Optional<String> save(ResultCache cache) {
        try {
            cache.save();
            return Optional.empty();
        } catch (IOException e) {
            return Optional.of(String.valueOf(e.getMessage()));
        }
    }
}
