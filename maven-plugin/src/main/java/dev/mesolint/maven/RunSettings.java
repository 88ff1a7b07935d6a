package dev.mesolint.maven;

import dev.mesolint.core.cache.ConfigurationKey;
import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.RuleConfiguration;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Goal;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.apache.maven.plugin.MojoExecutionException;

/**
 * The Mojo parameters that decide what is checked and how, turned into the core's request and cache key. Values
 * that are {@code null} were not set: the repository configuration or the built-in default applies.
 */
record RunSettings(Path root, File programmes, File config, String profile, String failOn, List<File> catalogues) {

    /** The request, the cache key and, for the debug log, where each value came from. */
    record Prepared(CheckRequest request, ConfigurationKey key, List<String> sources) {
    }

    Prepared prepare() throws MojoExecutionException {
        List<String> sources = new ArrayList<>();
        if (!programmes.exists()) {
            throw new MojoExecutionException("mesolint: programmes (mesolint.programmes): no such folder or file: "
                    + programmes + "; set it to the folder that holds the programme files");
        }
        Optional<Path> configFile = configFile(sources);
        Severity level = failLevel(sources);
        RuleConfiguration configuration = profileConfiguration(sources);
        List<Path> extra = new ArrayList<>();
        for (File c : catalogues) {
            if (!c.isFile()) {
                throw new MojoExecutionException("mesolint: catalogues (mesolint.catalogues): no such file: " + c);
            }
            extra.add(c.toPath());
        }
        sources.add("catalogues = " + extra + (extra.isEmpty() ? " (built-in default: none)"
                : " (plugin parameter catalogues)"));
        CheckRequest request = new CheckRequest(List.of(programmes.toPath()), root, level, extra, configuration,
                YamlLimits.DEFAULTS);
        try {
            ConfigurationKey key = ConfigurationKey.forThisVersion().option("root", root).option("failOn", level)
                    .option("profile", profile).file("config", configFile.orElse(null));
            for (Path c : extra) {
                key.file("catalogue", c);
            }
            return new Prepared(request, key, sources);
        } catch (IOException e) {
            throw new MojoExecutionException("mesolint: cannot read a configuration file: " + e.getMessage(), e);
        }
    }

    private Optional<Path> configFile(List<String> sources) throws MojoExecutionException {
        if (config != null) {
            if (!config.isFile()) {
                throw new MojoExecutionException("mesolint: config (mesolint.config): no configuration file at "
                        + config + "; check the path, or leave the parameter out to use .mesolint.yaml in "
                        + root);
            }
            sources.add("config = " + config + " (plugin parameter config)");
            return Optional.of(config.toPath());
        }
        Path standard = root.resolve(".mesolint.yaml");
        sources.add("config = " + (Files.isRegularFile(standard) ? standard + " (built-in default)"
                : "none (no .mesolint.yaml in " + root + ")"));
        return Files.isRegularFile(standard) ? Optional.of(standard) : Optional.empty();
    }

    private Severity failLevel(List<String> sources) throws MojoExecutionException {
        if (failOn == null) {
            sources.add("failOn = error (built-in default)");
            return Severity.ERROR;
        }
        Severity level = Severity.parseFailLevel(failOn).orElseThrow(() -> new MojoExecutionException(
                "mesolint: failOn (mesolint.failOn) must be error, warning or info, not '" + failOn + "'"));
        sources.add("failOn = " + level.label() + " (plugin parameter failOn)");
        return level;
    }

    private RuleConfiguration profileConfiguration(List<String> sources) throws MojoExecutionException {
        if (profile == null) {
            sources.add("profile = chosen by each programme's goal (built-in default)");
            return RuleConfiguration.DEFAULTS;
        }
        List<String> names = Arrays.stream(Goal.values()).map(Goal::yamlName).toList();
        if (!names.contains(profile)) {
            throw new MojoExecutionException("mesolint: profile (mesolint.profile): unknown profile '" + profile
                    + "'; profiles: " + String.join(", ", names));
        }
        sources.add("profile = " + profile + " (plugin parameter profile)");
        return new RuleConfiguration() {
            @Override
            public String profileFor(String displayPath, Programme programme) {
                return profile;
            }

            @Override
            public RuleSettings settingsFor(String name, RuleDefinition rule) {
                return RuleConfiguration.DEFAULTS.settingsFor(name, rule);
            }
        };
    }
}
