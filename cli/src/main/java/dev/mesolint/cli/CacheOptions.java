package dev.mesolint.cli;

import dev.mesolint.core.cache.CacheLocation;
import dev.mesolint.core.report.ReportFormat;
import dev.mesolint.core.report.ReportTarget;
import dev.mesolint.core.report.RunReports;
import java.nio.file.Path;
import dev.mesolint.core.run.FigureUse;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import picocli.CommandLine.Option;

/**
 * {@code --cache}: reuse the findings of programmes whose text, configuration and mesolint build are unchanged. Off
 * by default (a first run in a new place then never depends on what an earlier one left behind).
 */
final class CacheOptions {
    /** Reports that carry the training figures, which the cache does not keep: such runs check every file afresh. */
    private static final List<ReportFormat> NEED_FIGURES = List.of(ReportFormat.JSON, ReportFormat.HTML,
            ReportFormat.HTML_SHEET);

    @Option(names = "--cache", negatable = true, defaultValue = "false", fallbackValue = "true",
            description = "Reuse the findings of unchanged programmes from an earlier run (same text, configuration "
                    + "and mesolint build). Kept in the user's cache folder ($XDG_CACHE_HOME/mesolint, else "
                    + "~/.cache/mesolint), never in the repository unless --cache-location says so. Runs that write a "
                    + "JSON or HTML report check every file afresh (those reports need the training figures). "
                    + "Default: off.")
    boolean enabled;

    @Option(names = "--cache-location", paramLabel = "FILE",
            description = "The cache file to use with --cache (default: one per repository in the user's cache "
                    + "folder).")
    Path location;

    /** What the run's reports (files and standard output) need of the training figures. */
    static FigureUse figureUse(List<ReportTarget> reports, ReportFormat stdout) {
        return FigureUse.of(Stream.concat(reports.stream().map(ReportTarget::format), Stream.of(stdout)).toList());
    }

    /** Why the cache is not used for a run writing {@code reports} and {@code stdout}; empty when it is used. */
    Optional<String> notUsed(List<ReportTarget> reports, ReportFormat stdout) {
        if (!enabled) {
            return Optional.of("off");
        }
        return Stream.concat(reports.stream().map(ReportTarget::format), Stream.of(stdout))
                .filter(NEED_FIGURES::contains).findFirst()
                .map(f -> "a " + f.id() + " report needs the training figures, which the cache does not keep");
    }

    /** The cache file for the repository at {@code root}. */
    Path file(Path root) {
        return location != null ? location : CacheLocation.forRepository(root);
    }
}
