package dev.mesolint.core.review;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.git.GitRevisions;
import dev.mesolint.core.git.Revision;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;

/** A revision's files written to a temporary folder, checked there like any folder, deleted on close. */
final class Snapshot implements AutoCloseable {
    private final Path folder;

    private Snapshot(Path folder) {
        this.folder = folder;
    }

    static Snapshot of(GitRevisions git, Revision revision) throws ConfigProblem {
        Path folder;
        try {
            folder = Files.createTempDirectory("mesolint-revision-");
        } catch (IOException e) {
            throw new ConfigProblem("revision " + revision.shown(), null, "cannot make a temporary folder: "
                    + e.getMessage(), "check that the temporary folder (java.io.tmpdir) is writable");
        }
        Snapshot snapshot = new Snapshot(folder);
        try {
            git.export(revision, folder);
        } catch (ConfigProblem e) {
            snapshot.close();
            throw e;
        }
        return snapshot;
    }

    /** The checked root as it was at the revision. */
    Path root() {
        return folder;
    }

    @Override
    public void close() {
        try (Stream<Path> walk = Files.walk(folder)) {
            walk.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // A temporary folder left behind is harmless; the review's result stands.
        }
    }
}
