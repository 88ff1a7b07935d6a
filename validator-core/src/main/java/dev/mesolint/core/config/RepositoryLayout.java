package dev.mesolint.core.config;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * Where a run's repository is, found the way git and EditorConfig find theirs: by walking up from the checked paths.
 *
 * <p>The walk starts at the folder that holds every checked path and goes up. The nearest {@value
 * RepositoryConfig#FILE_NAME} on the way is the configuration. The walk stops at the repository root: the first folder
 * holding {@code .git} (a folder, or a file as in worktrees and submodules), or a configuration file that says
 * {@code root: true}. Without either, the root is the configuration file's folder, else the front end's fallback (the
 * current folder for the command line, the project folder for the Maven plugin). Paths in
 * findings and reports are shown relative to the root, so a run gives the same verdict from any folder.
 *
 * @param root   the folder that paths are shown relative to
 * @param config the nearest configuration file between the start and the root, if any
 */
public record RepositoryLayout(Path root, Optional<Path> config) {
    static final String ROOT_KEY = "root";

    public RepositoryLayout {
        root = root.toAbsolutePath().normalize();
        config = config.map(c -> c.toAbsolutePath().normalize());
    }

    /**
     * Walks up from the folder that holds all of {@code inputs} ({@code fallback} when there are none).
     *
     * @param stopAt   a root given explicitly: the walk ends there and it is the root, whatever it holds
     * @param fallback the root when the walk finds neither a repository nor a configuration file
     */
    public static RepositoryLayout discover(List<Path> inputs, Optional<Path> stopAt, Path fallback) {
        Path here = fallback.toAbsolutePath().normalize();
        Path start = commonFolder(inputs).orElse(here);
        Optional<Path> limit = stopAt.map(p -> p.toAbsolutePath().normalize());
        if (limit.isPresent() && !start.startsWith(limit.get())) {
            // Inputs outside the given root: only the root's own configuration applies.
            start = limit.get();
        }
        Optional<Path> nearest = Optional.empty();
        for (Path dir = start; dir != null; dir = dir.getParent()) {
            Path file = dir.resolve(RepositoryConfig.FILE_NAME);
            boolean hasConfig = Files.isRegularFile(file);
            if (hasConfig && nearest.isEmpty()) {
                nearest = Optional.of(file);
            }
            if (limit.isPresent()) {
                if (dir.equals(limit.get())) {
                    return new RepositoryLayout(dir, nearest);
                }
                continue;
            }
            if (Files.exists(dir.resolve(".git")) || hasConfig && RepositoryConfigReader.declaresRoot(file)) {
                return new RepositoryLayout(dir, nearest);
            }
        }
        return new RepositoryLayout(limit.orElse(nearest.map(Path::getParent).orElse(here)), nearest);
    }

    /** The deepest folder that holds every input; a file counts by its folder. Empty without inputs. */
    static Optional<Path> commonFolder(List<Path> inputs) {
        Path common = null;
        for (Path input : inputs) {
            Path abs = input.toAbsolutePath().normalize();
            Path folder = Files.isDirectory(abs) ? abs : abs.getParent();
            if (folder == null) {
                continue;
            }
            if (common == null) {
                common = folder;
            } else {
                while (!folder.startsWith(common)) {
                    common = common.getParent();
                }
            }
        }
        return Optional.ofNullable(common);
    }
}
