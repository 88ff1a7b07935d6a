package dev.mesolint.core.config;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Goal;
import dev.mesolint.core.ruleset.RuleSetVersion;
import dev.mesolint.core.value.Load;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The repository configuration file ({@value #FILE_NAME}) as read: every path already resolved against the folder
 * that holds the file.
 *
 * @param file       the configuration file, empty when the repository has none
 * @param profile    the profile for every programme that no folder rule or goal entry covers
 * @param goals      a profile per programme goal, used instead of the built-in profile named after the goal
 * @param folders    folder or glob rules, the first match wins
 * @param catalogues extra catalogue files
 * @param failOn     the level at which a run fails
 * @param baseline   the baseline file that {@code check} compares with
 * @param plateIncrement the loading step for programmes that set none ({@code plate-increment: 2.5kg})
 * @param rulesVersion   the rule-set version the repository was last checked with ({@code rules-version: 2026.12.1})
 */
public record RepositoryConfig(Optional<Path> file, Optional<ProfileRef> profile, Map<Goal, ProfileRef> goals,
        List<FolderRule> folders, List<Path> catalogues, Optional<Severity> failOn, Optional<Path> baseline,
        Optional<Load.Absolute> plateIncrement, Optional<RuleSetVersion> rulesVersion) {

    /** The name mesolint looks for in the root folder. Hidden, so folder discovery never takes it for a programme. */
    public static final String FILE_NAME = ".mesolint.yaml";

    /** No configuration file: every default applies. */
    public static final RepositoryConfig NONE = new RepositoryConfig(Optional.empty(), Optional.empty(), Map.of(),
            List.of(), List.of(), Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty());

    /** A configuration without a plate increment or a recorded rule-set version. */
    public RepositoryConfig(Optional<Path> file, Optional<ProfileRef> profile, Map<Goal, ProfileRef> goals,
            List<FolderRule> folders, List<Path> catalogues, Optional<Severity> failOn, Optional<Path> baseline) {
        this(file, profile, goals, folders, catalogues, failOn, baseline, Optional.empty(), Optional.empty());
    }

    public RepositoryConfig {
        goals = Map.copyOf(goals);
        folders = List.copyOf(folders);
        catalogues = List.copyOf(catalogues);
    }
}
