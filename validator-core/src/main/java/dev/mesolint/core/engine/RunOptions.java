package dev.mesolint.core.engine;

import dev.mesolint.core.finding.Severity;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * What a front end (command line, Maven plugin) was told, before the repository configuration is read. Each value
 * that is present overrides the configuration file; the catalogues are added after the file's own.
 *
 * @param root     paths in findings are shown relative to this folder; the configuration file is looked for here
 * @param config   an explicit configuration file; without it, {@code root/.mesolint.yaml} is used when it exists
 * @param profile  a profile name or team profile file for every programme, overriding all profile selection
 * @param baseline a baseline file to compare with, overriding the configuration's
 * @param allowOutsideRoot accept configured paths that resolve outside {@code root} (refused by default)
 */
public record RunOptions(Path root, Optional<Path> config, Optional<String> profile, Optional<Severity> failOn,
        List<Path> catalogues, Optional<Path> baseline, boolean allowOutsideRoot) {

    /** Options with configured paths confined to the root. */
    public RunOptions(Path root, Optional<Path> config, Optional<String> profile, Optional<Severity> failOn,
            List<Path> catalogues, Optional<Path> baseline) {
        this(root, config, profile, failOn, catalogues, baseline, false);
    }

    /** The same options, with configured paths outside the root accepted or not. */
    public RunOptions allowingOutsideRoot(boolean allow) {
        return new RunOptions(root, config, profile, failOn, catalogues, baseline, allow);
    }

    public RunOptions {
        root = root.toAbsolutePath().normalize();
        catalogues = List.copyOf(catalogues);
    }

    /** Nothing but the root. */
    public static RunOptions at(Path root) {
        return new RunOptions(root, Optional.empty(), Optional.empty(), Optional.empty(), List.of(), Optional.empty());
    }
}
