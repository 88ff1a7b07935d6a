package dev.mesolint.core.review;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.ProgrammeFiles;
import dev.mesolint.core.git.GitRevisions;
import dev.mesolint.core.git.PathChange;
import dev.mesolint.core.git.Revision;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * The programmes a quick check needs ({@code check --changed}): those added, edited or renamed since a git revision,
 * the work tree's uncommitted and untracked files included. A change to what configures the check (the repository
 * configuration, a catalogue, anything under {@code .mesolint/} such as profiles or the baseline) can change any
 * programme's findings, so then every programme is checked, and the selection says why.
 */
public final class ChangedProgrammes {
    private ChangedProgrammes() {
    }

    /**
     * @param programmes    the programmes the check would cover
     * @param everyBecause  set when every programme is selected: which configuring file changed
     * @param comparedWith  the base, as shown to the user ("main (1a2b3c4)")
     * @param changedFiles  how many files differ from the base below the root, of any kind
     */
    public record Selection(List<Path> programmes, Optional<String> everyBecause, String comparedWith,
            int changedFiles) {
        public Selection {
            programmes = List.copyOf(programmes);
        }
    }

    /**
     * Selects from {@code candidates} (the programme files of the run) those changed since {@code revision} (empty:
     * where the checked-out branch left the default branch, else {@code HEAD}).
     *
     * @param configuring the files that configure the run (configuration file, catalogues), absolute
     */
    public static Selection since(Path root, Optional<String> revision, List<Path> candidates,
            Set<Path> configuring) throws ConfigProblem {
        try (GitRevisions git = GitRevisions.open(root)) {
            Revision base = revision.isPresent() ? git.resolve(revision.get())
                    : git.defaultBase(Optional.empty()).orElse(git.resolve("HEAD"));
            List<PathChange> changes = git.changes(base, Optional.empty());
            String shownBase = base.shown() + " (" + base.commit().substring(0, 7) + ")";
            Set<String> configuringShown = configuring.stream().map(p -> ProgrammeFiles.display(root, p))
                    .collect(Collectors.toSet());
            Optional<String> configChange = changes.stream()
                    .flatMap(c -> java.util.stream.Stream.concat(c.before().stream(), c.after().stream()))
                    .filter(p -> configuringShown.contains(p) || p.equals(".mesolint.yaml")
                            || p.startsWith(".mesolint/"))
                    .findFirst();
            if (configChange.isPresent()) {
                return new Selection(candidates, configChange, shownBase, changes.size());
            }
            Set<String> touched = changes.stream().flatMap(c -> c.after().stream()).collect(Collectors.toSet());
            List<Path> selected = candidates.stream().filter(p -> touched.contains(ProgrammeFiles.display(root, p)))
                    .toList();
            return new Selection(selected, Optional.empty(), shownBase, changes.size());
        }
    }
}
