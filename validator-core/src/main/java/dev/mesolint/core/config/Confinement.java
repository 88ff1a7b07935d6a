package dev.mesolint.core.config;

import dev.mesolint.core.source.FileRefusedException;
import dev.mesolint.core.source.SafeFiles;
import dev.mesolint.core.yaml.Pointers;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Checks that every path a repository configuration names lies inside the repository root; located at its value. */
final class Confinement {
    private final ConfigDocument doc;
    private final Path root;
    private final Optional<String> allowSetting;

    /** @param allowSetting the caller's setting that accepts such paths, named in the hint when it has one */
    Confinement(ConfigDocument doc, Path root, Optional<String> allowSetting) {
        this.doc = doc;
        this.root = root;
        this.allowSetting = allowSetting;
    }

    void check(RepositoryConfig config) throws ConfigProblem {
        if (config.profile().isPresent()) {
            profile(config.profile().get(), "/profile");
        }
        for (Map.Entry<dev.mesolint.core.programme.Goal, ProfileRef> e : config.goals().entrySet()) {
            profile(e.getValue(), Pointers.child("/goals", e.getKey().yamlName()));
        }
        List<FolderRule> folders = config.folders();
        for (int i = 0; i < folders.size(); i++) {
            profile(folders.get(i).profile(), Pointers.child(Pointers.child("/folders", i), "profile"));
        }
        List<Path> catalogues = config.catalogues();
        for (int i = 0; i < catalogues.size(); i++) {
            path(catalogues.get(i), Pointers.child("/catalogues", i));
        }
        Optional<Path> baseline = config.baseline();
        if (baseline.isPresent()) {
            path(baseline.get(), "/baseline");
        }
    }

    private void profile(ProfileRef ref, String pointer) throws ConfigProblem {
        if (ref.file().isPresent()) {
            path(ref.file().get(), pointer);
        }
    }

    private void path(Path file, String pointer) throws ConfigProblem {
        try {
            SafeFiles.insideRoot(root, file);
        } catch (FileRefusedException e) {
            // The message names the key, never the file's content (it is not read at all).
            throw doc.problemAt(pointer, "this path is refused: " + e.getMessage(), e.hint()
                    + allowSetting.map(a -> ", or pass " + a + " when that is intended").orElse(""));
        } catch (IOException e) {
            // A missing file is reported where it is read, with its own message.
        }
    }
}
