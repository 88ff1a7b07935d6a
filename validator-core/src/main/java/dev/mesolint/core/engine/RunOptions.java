package dev.mesolint.core.engine;

import dev.mesolint.core.config.RepositoryConfig;
import dev.mesolint.core.config.RepositoryLayout;
import dev.mesolint.core.config.SettingNames;
import dev.mesolint.core.finding.Severity;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * What a front end (command line, Maven plugin) was told, before the repository configuration is read. Each value
 * that is present overrides the configuration file; the catalogues are added after the file's own.
 *
 * @param root        the repository root: paths in findings are shown relative to it
 * @param config      an explicit configuration file, which wins over {@code foundConfig}
 * @param profile     a profile name or team profile file for every programme, overriding all profile selection
 * @param baseline    a baseline file to compare with, overriding the configuration's
 * @param foundConfig the configuration file found by walking up from the checked paths ({@link RepositoryLayout})
 * @param allowOutsideRoot accept configured paths that resolve outside {@code root} (refused by default)
 * @param names       how the front end names these settings, for problems and hints in its words
 */
public record RunOptions(Path root, Optional<Path> config, Optional<String> profile, Optional<Severity> failOn,
        List<Path> catalogues, Optional<Path> baseline, Optional<Path> foundConfig, boolean allowOutsideRoot,
        SettingNames names) {

    public RunOptions {
        root = root.toAbsolutePath().normalize();
        catalogues = List.copyOf(catalogues);
    }

    /** Options for a known root: the configuration is {@code root/.mesolint.yaml} when it exists. */
    public RunOptions(Path root, Optional<Path> config, Optional<String> profile, Optional<Severity> failOn,
            List<Path> catalogues, Optional<Path> baseline) {
        this(root, config, profile, failOn, catalogues, baseline, atRoot(root), false, SettingNames.NEUTRAL);
    }

    /** Options whose root and configuration come from walking up ({@link RepositoryLayout#discover}). */
    public RunOptions(RepositoryLayout layout, Optional<Path> config, Optional<String> profile,
            Optional<Severity> failOn, List<Path> catalogues, Optional<Path> baseline) {
        this(layout.root(), config, profile, failOn, catalogues, baseline, layout.config(), false,
                SettingNames.NEUTRAL);
    }

    /** The same options, with configured paths that lead outside the root accepted or refused. */
    public RunOptions allowingOutsideRoot(boolean allow) {
        return new RunOptions(root, config, profile, failOn, catalogues, baseline, foundConfig, allow, names);
    }

    /** The same options, named in the front end's words in problems and hints. */
    public RunOptions namedAs(SettingNames callerNames) {
        return new RunOptions(root, config, profile, failOn, catalogues, baseline, foundConfig, allowOutsideRoot,
                callerNames);
    }

    /** Nothing but the root. */
    public static RunOptions at(Path root) {
        return new RunOptions(root, Optional.empty(), Optional.empty(), Optional.empty(), List.of(), Optional.empty());
    }

    private static Optional<Path> atRoot(Path root) {
        Path file = root.toAbsolutePath().normalize().resolve(RepositoryConfig.FILE_NAME);
        return Files.isRegularFile(file) ? Optional.of(file) : Optional.empty();
    }
}
