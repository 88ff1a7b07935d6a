package dev.mesolint.cli;

import dev.mesolint.core.config.RepositoryConfig;
import dev.mesolint.core.config.RepositoryLayout;
import dev.mesolint.core.config.SettingNames;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.finding.Severity;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import picocli.CommandLine.Option;

/** The options every command that reads a programme repository shares: where it is and how it is configured. */
final class ConfigOptions {
    static final String PRECEDENCE = "Settings come from, first match wins: command-line options, then the "
            + "repository configuration (--config FILE, else the nearest " + RepositoryConfig.FILE_NAME
            + " above the checked paths, up to the repository root), then the built-in defaults. --catalogue files "
            + "are added after the configuration's catalogues. The repository root is the nearest folder above the "
            + "checked paths that holds .git, or a " + RepositoryConfig.FILE_NAME + " saying 'root: true'; paths are "
            + "shown relative to it, so the verdict is the same from any folder.";

    @Option(names = "--root", paramLabel = "DIR",
            description = "The repository root: paths are shown relative to it, and the search for "
                    + RepositoryConfig.FILE_NAME + " stops there (default: found by walking up from the checked paths "
                    + "to the folder holding .git).")
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

    /** The options for checking {@code inputs}: the root and configuration found by walking up from them. */
    RunOptions toRunOptions(List<Path> inputs, List<Path> catalogues, Optional<Severity> failOn,
            Optional<Path> baseline) {
        return new RunOptions(RepositoryLayout.discover(inputs, Optional.ofNullable(root), Path.of("")), Optional.ofNullable(config),
                Optional.ofNullable(profile), failOn, catalogues, baseline).allowingOutsideRoot(allowOutsideRoot)
                .namedAs(NAMES);
    }

    /** The options' names, for the core's problems and hints. */
    static final SettingNames NAMES = SettingNames.of(Map.of(SettingNames.CONFIG, "--config", SettingNames.PROFILE,
            "--profile", SettingNames.BASELINE, "--baseline", SettingNames.ALLOW_OUTSIDE_ROOT, "--allow-outside-root"));

    /** {@code --catalogue}, for the commands that check programmes. */
    static final class Catalogues {
        @Option(names = "--catalogue", paramLabel = "FILE",
                description = "An extra catalogue file of exercises (repeatable); entries replace built-in ones by "
                        + "id.")
        List<Path> files = new ArrayList<>();
    }
}
