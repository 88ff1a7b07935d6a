package dev.mesolint.cli;

import dev.mesolint.core.config.RepositoryConfig;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.finding.Severity;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import picocli.CommandLine.Option;

/** The options every command that reads a programme repository shares: where it is and how it is configured. */
final class ConfigOptions {
    static final String PRECEDENCE = "Settings come from, first match wins: command-line options, then the "
            + "repository configuration (" + RepositoryConfig.FILE_NAME + " in --root, or --config FILE), then the "
            + "built-in defaults. --catalogue files are added after the configuration's catalogues.";

    @Option(names = "--root", paramLabel = "DIR",
            description = "The repository folder: paths are shown relative to it, and " + RepositoryConfig.FILE_NAME
                    + " is read from it (default: the current folder).")
    Path root;

    @Option(names = "--config", paramLabel = "FILE",
            description = "Read this configuration file instead of " + RepositoryConfig.FILE_NAME + " in the root.")
    Path config;

    @Option(names = "--profile", paramLabel = "PROFILE",
            description = "Check every programme with this profile: a built-in name (hypertrophy, strength, "
                    + "general-fitness) or a team profile file. Overrides the goal and the configuration.")
    String profile;

    @Option(names = "--allow-outside-root",
            description = "Accept paths in the configuration (catalogues, profiles, baseline) that lead outside the "
                    + "root once links are resolved (refused by default).")
    boolean allowOutsideRoot;

    RunOptions toRunOptions(List<Path> catalogues, Optional<Severity> failOn, Optional<Path> baseline) {
        return new RunOptions(root != null ? root : Path.of(""), Optional.ofNullable(config),
                Optional.ofNullable(profile), failOn, catalogues, baseline, allowOutsideRoot);
    }

    /** {@code --catalogue}, for the commands that check programmes. */
    static final class Catalogues {
        @Option(names = "--catalogue", paramLabel = "FILE",
                description = "An extra catalogue file of exercises (repeatable); entries replace built-in ones by "
                        + "id.")
        List<Path> files = new ArrayList<>();
    }
}
