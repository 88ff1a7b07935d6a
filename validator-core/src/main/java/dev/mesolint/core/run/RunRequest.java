package dev.mesolint.core.run;

import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.engine.RunProgress;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * What a front end asks of one run. Build it with {@link #of} and the {@code with...} steps; every step returns a
 * new request.
 *
 * @param options       the repository and the front end's settings (named in its words)
 * @param inputs        programme files and folders, as the user gave them
 * @param piped         one programme read elsewhere (standard input), checked as the file it stands for
 * @param cacheFile     reuse the findings of unchanged programmes stored there, and store this run's
 * @param applyBaseline compare with the baseline file of the options, else of the configuration
 * @param changedSince  check only the programmes changed since a git revision
 * @param newSince      count only the findings new since a git revision (the safety policy still applies)
 * @param progress      told after each programme file
 * @param figures       which reports show the training figures, and so what each file keeps of its model
 *                      (findings are the same either way)
 */
public record RunRequest(RunOptions options, List<Path> inputs, Optional<Piped> piped, Optional<Path> cacheFile,
        boolean applyBaseline, Optional<ChangedSince> changedSince, Optional<String> newSince, RunProgress progress,
        FigureUse figures) {

    /** A programme read by the front end, and the path it stands for. */
    public record Piped(Path path, byte[] content) {
    }

    /** The revision to compare with; empty: where the branch left the default branch, else {@code HEAD}. */
    public record ChangedSince(Optional<String> revision) {
    }

    public RunRequest {
        inputs = List.copyOf(inputs);
    }

    /**
     * Checks {@code inputs} with the baseline applied and the figures kept; no cache, no selection, nobody told of
     * progress.
     */
    public static RunRequest of(RunOptions options, List<Path> inputs) {
        return new RunRequest(options, inputs, Optional.empty(), Optional.empty(), true, Optional.empty(),
                Optional.empty(), RunProgress.NONE, FigureUse.ALL);
    }

    /** Whether each file's report keeps its training figures, in any form. */
    public boolean keepFigures() {
        return figures != FigureUse.NONE;
    }

    /** The same run, its file reports keeping the whole model when {@code keep}, nothing of it otherwise. */
    public RunRequest withFigures(boolean keep) {
        return withFigures(keep ? FigureUse.ALL : FigureUse.NONE);
    }

    /** The same run, its file reports keeping what {@code use} needs of the training figures. */
    public RunRequest withFigures(FigureUse use) {
        return new RunRequest(options, inputs, piped, cacheFile, applyBaseline, changedSince, newSince, progress,
                use);
    }

    public RunRequest withPiped(Piped document) {
        return new RunRequest(options, List.of(), Optional.of(document), cacheFile, applyBaseline, changedSince,
                newSince, progress, figures);
    }

    public RunRequest withCache(Path file) {
        return new RunRequest(options, inputs, piped, Optional.of(file), applyBaseline, changedSince, newSince,
                progress, figures);
    }

    /** Every finding counts, the configuration's baseline too is left alone (and findings are recorded as found). */
    public RunRequest withoutBaseline() {
        return new RunRequest(options, inputs, piped, cacheFile, false, changedSince, newSince, progress, figures);
    }

    public RunRequest withChangedSince(ChangedSince since) {
        return new RunRequest(options, inputs, piped, cacheFile, applyBaseline, Optional.of(since), newSince,
                progress, figures);
    }

    public RunRequest withNewSince(String revision) {
        return new RunRequest(options, inputs, piped, cacheFile, applyBaseline, changedSince, Optional.of(revision),
                progress, figures);
    }

    public RunRequest withProgress(RunProgress listener) {
        return new RunRequest(options, inputs, piped, cacheFile, applyBaseline, changedSince, newSince, listener,
                figures);
    }
}
