package dev.mesolint.core.engine;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.yaml.YamlLimits;
import java.nio.file.Path;
import java.util.List;

/**
 * One run's inputs, shared by the CLI and the Maven plugin.
 *
 * @param root            paths in findings are shown relative to this folder
 * @param extraCatalogues repository catalogue files added to the built-in catalogue
 * @param keepFigures     whether each file's report keeps its training-model figures after its rules ran; only the
 *                        reports that show them (HTML, JSON) need them, and on a large run they are most of the heap
 */
public record CheckRequest(List<Path> inputs, Path root, Severity failOn, List<Path> extraCatalogues,
        RuleConfiguration configuration, YamlLimits limits, boolean keepFigures) {

    public CheckRequest {
        inputs = List.copyOf(inputs);
        extraCatalogues = List.copyOf(extraCatalogues);
        if (failOn == Severity.OFF) {
            throw new IllegalArgumentException("fail level must be error, warning or info");
        }
    }

    /** A request whose reports keep their figures. */
    public CheckRequest(List<Path> inputs, Path root, Severity failOn, List<Path> extraCatalogues,
            RuleConfiguration configuration, YamlLimits limits) {
        this(inputs, root, failOn, extraCatalogues, configuration, limits, true);
    }

    /**
     * This request, with figures kept or dropped once each file's rules ran (findings are the same either way: rules
     * read the figures while the file is checked).
     */
    public CheckRequest keepingFigures(boolean keep) {
        return new CheckRequest(inputs, root, failOn, extraCatalogues, configuration, limits, keep);
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
