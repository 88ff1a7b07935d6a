package dev.mesolint.core.engine;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.yaml.YamlLimits;
import java.nio.file.Path;
import java.util.List;
import java.util.function.UnaryOperator;

/**
 * One run's inputs, shared by the CLI and the Maven plugin.
 *
 * @param root            paths in findings are shown relative to this folder
 * @param extraCatalogues repository catalogue files added to the built-in catalogue
 * @param keepFigures     whether each file's report keeps its training-model figures after its rules ran; only the
 *                        reports that show them (HTML, JSON) need them, and on a large run they are most of the heap
 * @param keep            what the run holds of each checked file's report until the reports are written: the report
 *                        as checked, or a smaller form a report chose (the JSON report packs its figures)
 */
public record CheckRequest(List<Path> inputs, Path root, Severity failOn, List<Path> extraCatalogues,
        RuleConfiguration configuration, YamlLimits limits, boolean keepFigures, UnaryOperator<FileReport> keep) {

    public CheckRequest {
        inputs = List.copyOf(inputs);
        extraCatalogues = List.copyOf(extraCatalogues);
        java.util.Objects.requireNonNull(keep, "keep");
        if (failOn == Severity.OFF) {
            throw new IllegalArgumentException("fail level must be error, warning or info");
        }
    }

    /** A request whose reports keep their figures. */
    public CheckRequest(List<Path> inputs, Path root, Severity failOn, List<Path> extraCatalogues,
            RuleConfiguration configuration, YamlLimits limits) {
        this(inputs, root, failOn, extraCatalogues, configuration, limits, true, UnaryOperator.identity());
    }

    /**
     * This request, with figures kept or dropped once each file's rules ran (findings are the same either way: rules
     * read the figures while the file is checked).
     */
    public CheckRequest keepingFigures(boolean keep) {
        return new CheckRequest(inputs, root, failOn, extraCatalogues, configuration, limits, keep, this.keep);
    }

    /** This request, each checked file's report turned by {@code kept} into what the run holds of it. */
    public CheckRequest keeping(UnaryOperator<FileReport> kept) {
        return new CheckRequest(inputs, root, failOn, extraCatalogues, configuration, limits, keepFigures, kept);
    }

    /**
     * mesolint's own files in effect in this run (catalogues, team profile files): read as what they are, so a folder
     * walk passes over them.
     */
    public java.util.Set<Path> ownFiles() {
        java.util.Set<Path> own = new java.util.HashSet<>(extraCatalogues);
        if (configuration instanceof ProfileConfiguration profiles) {
            own.addAll(profiles.profiles().files());
        }
        return own;
    }

    public static CheckRequest of(List<Path> inputs, Path root) {
        return new CheckRequest(inputs, root, Severity.ERROR, List.of(), RuleConfiguration.DEFAULTS, YamlLimits.DEFAULTS);
    }
}
