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
 */
public record CheckRequest(List<Path> inputs, Path root, Severity failOn, List<Path> extraCatalogues,
        RuleConfiguration configuration, YamlLimits limits) {

    public CheckRequest {
        inputs = List.copyOf(inputs);
        extraCatalogues = List.copyOf(extraCatalogues);
        if (failOn == Severity.OFF) {
            throw new IllegalArgumentException("fail level must be error, warning or info");
        }
    }

    public static CheckRequest of(List<Path> inputs, Path root) {
        return new CheckRequest(inputs, root, Severity.ERROR, List.of(), RuleConfiguration.DEFAULTS, YamlLimits.DEFAULTS);
    }
}
