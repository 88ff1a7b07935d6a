package dev.mesolint.core.run;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.ProgrammeFiles;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.review.ChangedProgrammes;
import dev.mesolint.core.review.Review;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.report.ReportFigures;
import dev.mesolint.core.report.ReportInput;
import dev.mesolint.core.report.RunReports;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Optional;

/**
 * What one run found, and what a front end needs to say about it: the findings (baseline and new-since gate
 * applied as asked), how the cache served, what was selected, the notices. Nothing here is printed; the front end
 * decides how.
 */
public final class RunResult {
    /**
     * How the result cache served the run.
     *
     * @param used      false when the run had no cache (everything else is then zero or empty)
     * @param discarded why the stored results could not be reused (another configuration or build, say)
     * @param rejected  stored entries that failed their checksum (damaged or edited), checked afresh
     * @param notSaved  why this run's results could not be stored; they are complete either way
     */
    public record CacheUse(boolean used, int reused, int checked, Optional<String> discarded, int rejected,
            Optional<String> notSaved) {
        static final CacheUse NONE = new CacheUse(false, 0, 0, Optional.empty(), 0, Optional.empty());
    }

    private final Workspace workspace;
    private final CheckRequest request;
    private final List<RuleDefinition> rules;
    private final RunReport report;
    private final List<Path> unreadable;
    private final CacheUse cache;
    private final Optional<ChangedProgrammes.Selection> selection;
    private final int candidates;
    private final Optional<Review> review;
    private final ReportFigures figures;

    RunResult(Workspace workspace, CheckRequest request, List<RuleDefinition> rules, RunReport report,
            List<Path> unreadable, CacheUse cache, Optional<ChangedProgrammes.Selection> selection, int candidates,
            Optional<Review> review, ReportFigures figures) {
        this.workspace = workspace;
        this.request = request;
        this.rules = List.copyOf(rules);
        this.report = report;
        this.unreadable = List.copyOf(unreadable);
        this.cache = cache;
        this.selection = selection;
        this.candidates = candidates;
        this.review = review;
        this.figures = figures;
    }

    public Workspace workspace() {
        return workspace;
    }

    /** The request the checks ran with (inputs after any selection, root, fail level, catalogues, profiles). */
    public CheckRequest request() {
        return request;
    }

    public RunReport report() {
        return report;
    }

    /** Programme files that could not be read at all (each also has a finding saying so). */
    public List<Path> unreadable() {
        return unreadable;
    }

    public CacheUse cache() {
        return cache;
    }

    /** What a changed-since selection chose, when one was asked for. */
    public Optional<ChangedProgrammes.Selection> selection() {
        return selection;
    }

    /** How many programmes a changed-since selection chose from (all the inputs hold). */
    public int selectedFrom() {
        return candidates;
    }

    /** True when a changed-since selection found no changed programme: nothing was checked, and that is clean. */
    public boolean nothingChanged() {
        return selection.isPresent() && selection.get().everyBecause().isEmpty()
                && selection.get().programmes().isEmpty();
    }

    /** The comparison with the new-since revision, when one was asked for. */
    /**
     * The input for every report of this run (its own findings replaced by {@code shown}, the baseline or gate
     * applied by the caller), with the figures this run kept: packed ones when only a JSON report shows them.
     */
    public ReportInput reportInput(RunReport shown, Duration elapsed) {
        return RunReports.input(shown, rules, request, elapsed).withFigures(figures);
    }

    public Optional<Review> review() {
        return review;
    }

    /** Whether the findings were compared with a baseline or a revision (reports then say baselineState). */
    public boolean baselineInForce() {
        return report.baselineApplied() || review.isPresent();
    }

    /** The configured extra catalogue files that did not load (shown paths): their exercises are unknown. */
    public List<String> failedCatalogues() {
        return report.files().stream().map(f -> f.displayPath()).filter(shown -> request.extraCatalogues().stream()
                .anyMatch(c -> ProgrammeFiles.display(request.root(), c).equals(shown))).toList();
    }

    /** What changed between the repository's recorded rule-set version and this mesolint's, if they differ. */
    public Optional<List<String>> upgradeNotice() {
        return workspace.upgradeNotice();
    }

    /** The run's exercise catalogue (read again: only reports that name exercises need it). */
    public Catalogue catalogue() {
        return new Checker(request, rules).catalogue();
    }
}
