package dev.mesolint.core.git;

import dev.mesolint.core.config.ConfigProblem;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.eclipse.jgit.diff.DiffEntry;
import org.eclipse.jgit.diff.DiffFormatter;
import org.eclipse.jgit.errors.RevisionSyntaxException;
import org.eclipse.jgit.lib.Constants;
import org.eclipse.jgit.lib.FileMode;
import org.eclipse.jgit.lib.ObjectId;
import org.eclipse.jgit.lib.ObjectLoader;
import org.eclipse.jgit.lib.ObjectReader;
import org.eclipse.jgit.lib.Ref;
import org.eclipse.jgit.lib.Repository;
import org.eclipse.jgit.revwalk.RevCommit;
import org.eclipse.jgit.revwalk.RevWalk;
import org.eclipse.jgit.revwalk.filter.RevFilter;
import org.eclipse.jgit.storage.file.FileRepositoryBuilder;
import org.eclipse.jgit.treewalk.AbstractTreeIterator;
import org.eclipse.jgit.treewalk.CanonicalTreeParser;
import org.eclipse.jgit.treewalk.FileTreeIterator;
import org.eclipse.jgit.treewalk.TreeWalk;
import org.eclipse.jgit.treewalk.filter.AndTreeFilter;
import org.eclipse.jgit.treewalk.filter.NotIgnoredFilter;
import org.eclipse.jgit.treewalk.filter.PathFilter;
import org.eclipse.jgit.treewalk.filter.TreeFilter;
import org.eclipse.jgit.util.io.DisabledOutputStream;

/**
 * The one place mesolint reads git: the repository that holds a programme folder, its revisions, the files changed
 * between two of them (renames and moves followed), and a revision's files written out so they can be checked like
 * any folder. Every path in and out is relative to the checked root, which may be a folder inside the repository.
 *
 * <p>Reads the repository with JGit; no {@code git} binary is needed. Not thread-safe; close it when done.
 */
public final class GitRevisions implements AutoCloseable {
    /** Branches tried, in order, when looking for the default branch to compare with. */
    private static final List<String> DEFAULT_BRANCHES = List.of("refs/remotes/origin/HEAD", "refs/heads/main",
            "refs/heads/master", "refs/remotes/origin/main", "refs/remotes/origin/master");
    /** Larger files are not programmes, profiles or catalogues; they are not written out. */
    private static final long MAX_EXPORTED_BYTES = 8L * 1024 * 1024;

    private final Repository repository;
    private final Path workTree;
    /** The checked root relative to the work tree, '/'-separated, "" at the top. */
    private final String prefix;

    private GitRevisions(Repository repository, Path workTree, String prefix) {
        this.repository = repository;
        this.workTree = workTree;
        this.prefix = prefix;
    }

    /** Opens the repository whose work tree holds {@code root} (the folder itself or any folder above it). */
    public static GitRevisions open(Path root) throws ConfigProblem {
        Path abs = root.toAbsolutePath().normalize();
        FileRepositoryBuilder builder = new FileRepositoryBuilder().findGitDir(abs.toFile());
        if (builder.getGitDir() == null) {
            throw new ConfigProblem(abs.toString(), null, "this folder is not inside a git repository",
                    "run it in a clone of the programme repository (with its history: a shallow clone may lack the "
                            + "base revision)");
        }
        try {
            Repository repository = builder.setMustExist(true).build();
            if (repository.isBare()) {
                repository.close();
                throw new ConfigProblem(abs.toString(), null, "the repository has no work tree",
                        "run it in a normal clone, not a bare repository");
            }
            Path workTree = repository.getWorkTree().toPath().toAbsolutePath().normalize();
            Path realRoot = abs.toRealPath();
            Path realTree = workTree.toRealPath();
            String prefix = realTree.relativize(realRoot).toString().replace('\\', '/');
            return new GitRevisions(repository, realTree, prefix);
        } catch (IOException e) {
            throw new ConfigProblem(abs.toString(), null, "cannot open the git repository: " + e.getMessage(),
                    "check that the repository is readable");
        }
    }

    /** A commit named by {@code revision}: a branch, tag, commit id or expression such as {@code HEAD~2}. */
    public Revision resolve(String revision) throws ConfigProblem {
        try {
            ObjectId id = repository.resolve(revision + "^{commit}");
            if (id == null) {
                throw unknown(revision);
            }
            return new Revision(revision, id.name());
        } catch (RevisionSyntaxException | IOException e) {
            throw unknown(revision);
        }
    }

    private static ConfigProblem unknown(String revision) {
        return new ConfigProblem("revision '" + revision + "'", null, "no such commit in this repository",
                "name a branch, tag or commit id; in CI, fetch the history (a shallow clone lacks older commits), "
                        + "e.g. the base branch as origin/main");
    }

    /**
     * Where {@code head} (a revision, or the checked-out commit when empty) left the repository's default branch: the
     * merge base with {@code origin/HEAD}, else {@code main}, {@code master}, {@code origin/main}, {@code origin/master}.
     * Empty when there is no such branch or no common history.
     */
    public Optional<Revision> defaultBase(Optional<Revision> head) throws ConfigProblem {
        try (RevWalk walk = new RevWalk(repository)) {
            ObjectId start = head.isPresent() ? ObjectId.fromString(head.get().commit())
                    : repository.resolve(Constants.HEAD);
            if (start == null) {
                return Optional.empty();
            }
            for (String name : DEFAULT_BRANCHES) {
                Ref ref = repository.exactRef(name);
                if (ref == null || ref.getObjectId() == null) {
                    continue;
                }
                walk.reset();
                walk.setRevFilter(RevFilter.MERGE_BASE);
                walk.markStart(walk.parseCommit(start));
                walk.markStart(walk.parseCommit(ref.getObjectId()));
                RevCommit base = walk.next();
                if (base != null) {
                    String shown = Repository.shortenRefName(ref.getTarget().getName());
                    return Optional.of(new Revision("merge base with " + shown, base.name()));
                }
            }
            return Optional.empty();
        } catch (IOException e) {
            throw new ConfigProblem("the git history", null, "cannot read the history: " + e.getMessage(),
                    "name the base revision explicitly");
        }
    }

    /**
     * The files below the checked root that differ between {@code base} and {@code head} (the work tree when empty:
     * uncommitted and untracked files count, ignored ones do not), with renames and moves detected by content.
     */
    public List<PathChange> changes(Revision base, Optional<Revision> head) throws ConfigProblem {
        try (DiffFormatter diff = new DiffFormatter(DisabledOutputStream.INSTANCE);
                ObjectReader reader = repository.newObjectReader()) {
            diff.setRepository(repository);
            diff.setDetectRenames(true);
            TreeFilter filter = prefix.isEmpty() ? TreeFilter.ALL : PathFilter.create(prefix);
            AbstractTreeIterator after;
            if (head.isPresent()) {
                after = tree(reader, head.get());
            } else {
                after = new FileTreeIterator(repository);
                filter = filter == TreeFilter.ALL ? new NotIgnoredFilter(1)
                        : AndTreeFilter.create(filter, new NotIgnoredFilter(1));
            }
            diff.setPathFilter(filter);
            List<PathChange> changes = new ArrayList<>();
            for (DiffEntry entry : diff.scan(tree(reader, base), after)) {
                changes.add(change(entry));
            }
            return changes;
        } catch (IOException e) {
            throw new ConfigProblem("the git history", null, "cannot compare the revisions: " + e.getMessage(),
                    "check that both revisions are in this clone");
        }
    }

    private PathChange change(DiffEntry entry) {
        Optional<String> before = Optional.of(entry.getOldPath()).filter(p -> !p.equals(DiffEntry.DEV_NULL))
                .map(this::belowRoot);
        Optional<String> after = Optional.of(entry.getNewPath()).filter(p -> !p.equals(DiffEntry.DEV_NULL))
                .map(this::belowRoot);
        PathChange.Kind kind = switch (entry.getChangeType()) {
            case ADD -> PathChange.Kind.ADDED;
            case DELETE -> PathChange.Kind.DELETED;
            case RENAME -> PathChange.Kind.RENAMED;
            // A copy leaves the original where it was: for the review, the copy is a new file.
            case COPY -> PathChange.Kind.ADDED;
            case MODIFY -> PathChange.Kind.MODIFIED;
        };
        return new PathChange(kind, kind == PathChange.Kind.ADDED ? Optional.empty() : before, after);
    }

    private String belowRoot(String repositoryPath) {
        return prefix.isEmpty() ? repositoryPath : repositoryPath.substring(prefix.length() + 1);
    }

    private AbstractTreeIterator tree(ObjectReader reader, Revision revision) throws IOException {
        try (RevWalk walk = new RevWalk(reader)) {
            CanonicalTreeParser parser = new CanonicalTreeParser();
            parser.reset(reader, walk.parseCommit(ObjectId.fromString(revision.commit())).getTree());
            return parser;
        }
    }

    /**
     * Writes the files below the checked root at {@code revision} into {@code target} (an empty folder), keeping their
     * relative paths: the programme, configuration, profile and catalogue files ({@code .yaml}, {@code .yml},
     * {@code .json}). Links, submodules and very large files are left out.
     */
    public void export(Revision revision, Path target) throws ConfigProblem {
        Path base = target.toAbsolutePath().normalize();
        try (ObjectReader reader = repository.newObjectReader(); TreeWalk walk = new TreeWalk(reader)) {
            walk.addTree(tree(reader, revision));
            walk.setRecursive(true);
            if (!prefix.isEmpty()) {
                walk.setFilter(PathFilter.create(prefix));
            }
            while (walk.next()) {
                if (walk.getFileMode(0) != FileMode.REGULAR_FILE && walk.getFileMode(0) != FileMode.EXECUTABLE_FILE) {
                    continue;
                }
                String path = belowRoot(walk.getPathString());
                if (!exported(path)) {
                    continue;
                }
                ObjectLoader blob = reader.open(walk.getObjectId(0));
                if (blob.getSize() > MAX_EXPORTED_BYTES) {
                    continue;
                }
                Path file = base.resolve(path).normalize();
                if (!file.startsWith(base)) {
                    continue;
                }
                Files.createDirectories(file.getParent());
                try (InputStream in = blob.openStream()) {
                    Files.copy(in, file);
                }
            }
        } catch (IOException | UncheckedIOException e) {
            throw new ConfigProblem("revision " + revision.shown(), null, "cannot read the files of this revision: "
                    + e.getMessage(), "check that the clone is complete (not a partial or shallow clone)");
        }
    }

    private static boolean exported(String path) {
        String name = path.toLowerCase(Locale.ROOT);
        return name.endsWith(".yaml") || name.endsWith(".yml") || name.endsWith(".json");
    }

    /** The checked root inside the work tree. */
    public Path root() {
        return prefix.isEmpty() ? workTree : workTree.resolve(prefix);
    }

    @Override
    public void close() {
        repository.close();
    }
}
