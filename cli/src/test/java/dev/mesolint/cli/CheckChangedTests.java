package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.eclipse.jgit.api.Git;
import org.eclipse.jgit.lib.PersonIdent;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code check --changed}: only what changed since a revision, on a real git repository written with JGit. */
class CheckChangedTests {
    private static final PersonIdent COACH = new PersonIdent("Harbourside coach", "coach@harbourside.invalid");

    @TempDir
    Path root;

    private Git git;

    private record Run(int exit, String out, String err) {
    }

    @BeforeEach
    void repository() throws Exception {
        git = Git.init().setDirectory(root.toFile()).setInitialBranch("main").call();
        write("programmes/short-rest.yaml", SquatDay.resting("harbour-short", "60s")); // one warning
        write("programmes/long-rest.yaml", SquatDay.resting("harbour-long", "3min")); // clean
        commit("two programmes");
    }

    @AfterEach
    void close() {
        git.close();
    }

    private void write(String path, String text) throws IOException {
        Path file = root.resolve(path);
        Files.createDirectories(file.getParent());
        Files.writeString(file, text);
    }

    private void commit(String message) throws Exception {
        git.add().addFilepattern(".").call();
        git.commit().setMessage(message).setAuthor(COACH).setCommitter(COACH).setSign(false).call();
    }

    private Run check(String... extra) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        String[] args = Stream.concat(Stream.of("check", root.resolve("programmes").toString(), "--color", "never",
                "--fail-on", "warning"), Stream.of(extra)).toArray(String[]::new);
        int exit = MesolintCommand.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(exit, out.toString(), err.toString());
    }

    @Test
    void nothingChangedSaysWhatItComparedAndPasses() {
        Run run = check("--changed");
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.err().contains("no programme changed since merge base with main ("), run.err());
        assertTrue(run.err().contains("); 0 changed files compared: nothing to check"), run.err());
        assertFalse(run.err().contains(") ("), "one pair of parentheses: " + run.err());
        assertEquals(1, check().exit(), "the full check still fails on the unchanged warning");
    }

    @Test
    void onlyTheEditedAndTheUntrackedProgrammesAreChecked() throws IOException {
        write("programmes/long-rest.yaml", SquatDay.resting("harbour-long", "150s")); // edited, still clean
        Run edited = check("--changed");
        assertEquals(0, edited.exit(), edited.out() + edited.err());
        assertTrue(edited.err().contains("1 of 2 programmes changed since merge base with main"), edited.err());
        assertTrue(edited.out().contains("1 file checked"), edited.out());

        write("programmes/new-block.yaml", SquatDay.resting("harbour-new", "45s")); // untracked, one warning
        Run untracked = check("--changed");
        assertEquals(1, untracked.exit(), untracked.out());
        assertTrue(untracked.out().contains("programmes/new-block.yaml"), untracked.out());
        assertFalse(untracked.out().contains("short-rest.yaml"), "the unchanged programme is not checked");
    }

    @Test
    void aChangedEntryThatCannotBeReadIsReportedNotSkipped() throws IOException {
        // A link to a file that does not exist, new in the work tree: it matches *.yaml but is no programme.
        Files.createSymbolicLink(root.resolve("programmes/alias.yaml"), Path.of("gone.yaml"));
        Run run = check("--changed");
        assertEquals(1, run.exit(), run.out() + run.err());
        assertTrue(run.out().contains("programmes/alias.yaml"), run.out());
        assertTrue(run.err().contains("1 of 3 programmes changed"), run.err());
        assertFalse(run.out().contains("short-rest.yaml"), "the unchanged programme is not checked");
    }

    @Test
    void aRevisionCanBeNamedAndAConfigurationChangeChecksEverything() throws Exception {
        String base = git.log().call().iterator().next().getName();
        write(".mesolint.yaml", "root: true\n");
        commit("configuration");
        Run run = check("--changed=" + base.substring(0, 10));
        assertTrue(run.err().contains(".mesolint.yaml changed since"), run.err());
        assertTrue(run.err().contains("every programme is checked"), run.err());
        assertEquals(1, run.exit(), "the unchanged programme's warning counts again");
    }

    @Test
    void aChangedTeamProfileKeptOutsideDotMesolintChecksEverything() throws Exception {
        write("coaching/club.yaml", "profile: harbourside-club\nextends: hypertrophy\n"
                + "description: The club's defaults.\nrules:\n  short-rest-compound: warning\n");
        write(".mesolint.yaml", "profile: coaching/club.yaml\n");
        commit("team profile");
        write("coaching/club.yaml", "profile: harbourside-club\nextends: hypertrophy\n"
                + "description: The club's defaults.\nrules:\n  short-rest-compound: error\n");
        Run run = check("--changed");
        assertTrue(run.err().contains("coaching/club.yaml changed since"), run.err());
        assertTrue(run.err().contains("every programme is checked"), run.err());
        assertTrue(run.out().contains("2 files checked"), run.out());
    }

    @Test
    void anUnknownRevisionIsAClearUsageError() {
        Run run = check("--changed=no-such-branch");
        assertEquals(2, run.exit());
        assertTrue(run.err().contains("no-such-branch"), run.err());
    }
}
