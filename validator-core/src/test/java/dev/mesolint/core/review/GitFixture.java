package dev.mesolint.core.review;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.eclipse.jgit.api.Git;
import org.eclipse.jgit.api.errors.GitAPIException;
import org.eclipse.jgit.lib.PersonIdent;

/** A real git repository in a temporary folder, written and committed with JGit, for review tests. */
final class GitFixture implements AutoCloseable {
    private static final PersonIdent COACH = new PersonIdent("Harbourside coach", "coach@harbourside.invalid");
    private final Path root;
    private final Git git;

    private GitFixture(Path root, Git git) {
        this.root = root;
        this.git = git;
    }

    static GitFixture init(Path folder) throws GitAPIException {
        return new GitFixture(folder, Git.init().setDirectory(folder.toFile()).setInitialBranch("main").call());
    }

    Path root() {
        return root;
    }

    GitFixture write(String path, String text) throws IOException {
        Path file = root.resolve(path);
        Files.createDirectories(file.getParent());
        Files.writeString(file, text, StandardCharsets.UTF_8);
        return this;
    }

    GitFixture delete(String path) throws IOException {
        Files.delete(root.resolve(path));
        return this;
    }

    GitFixture move(String from, String to) throws IOException {
        Path target = root.resolve(to);
        Files.createDirectories(target.getParent());
        Files.move(root.resolve(from), target);
        return this;
    }

    /** Stages every change (deletions too) and commits; returns the commit id. */
    String commit(String message) throws GitAPIException {
        git.add().addFilepattern(".").call();
        git.add().addFilepattern(".").setUpdate(true).call();
        return git.commit().setMessage(message).setAuthor(COACH).setCommitter(COACH).setSign(false).call().name();
    }

    void branch(String name) throws GitAPIException {
        git.checkout().setCreateBranch(true).setName(name).call();
    }

    @Override
    public void close() {
        git.close();
    }
}
