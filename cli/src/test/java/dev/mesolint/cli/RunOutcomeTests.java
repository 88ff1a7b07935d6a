package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The exit codes a CI job reads: a run that checks nothing fails, a forged line never prints, OOM is exit 3. */
class RunOutcomeTests {
    private static final Path SAMPLES = Path.of("..", "sample-programs").toAbsolutePath().normalize();

    private record Outcome(int exit, String out, String err) {
    }

    private static Outcome run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = MesolintCommand.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Outcome(exit, out.toString(), err.toString());
    }

    @Test
    void anEmptyFolderFailsUnlessAllowed(@TempDir Path root) throws Exception {
        Files.createDirectories(root.resolve("programmes"));
        Outcome o = run("check", "--root", root.toString(), root.resolve("programmes").toString());
        assertEquals(2, o.exit(), o.err());
        assertTrue(o.err().contains("nothing was checked"), o.err());
        assertEquals(0, run("check", "--allow-empty", "--root", root.toString(),
                root.resolve("programmes").toString()).exit());
    }

    @Test
    void aHiddenProgrammeInAFolderIsCountedAndAFifoIsAnError(@TempDir Path root) throws Exception {
        Files.createDirectories(root.resolve("p"));
        Files.copy(SAMPLES.resolve("programmes/novice-full-body.yaml"), root.resolve("p/.draft.yaml"));
        Files.copy(SAMPLES.resolve("programmes/novice-full-body.yaml"), root.resolve("p/novice.yaml"));
        boolean fifo = new ProcessBuilder("mkfifo", root.resolve("p/pipe.yaml").toString()).start().waitFor() == 0;
        Outcome o = run("check", "--root", root.toString(), root.resolve("p").toString());
        assertTrue(o.err().contains("1 hidden .yaml file not checked") && o.err().contains("p/.draft.yaml"), o.err());
        if (fifo) {
            assertEquals(1, o.exit(), o.out());
            assertTrue(o.out().contains("p/pipe.yaml:1:1: error yaml-syntax: cannot be read as a programme: it is "
                    + "not a regular file but a named pipe (FIFO)"), o.out());
        }
    }

    @Test
    void aNewlineInAFileNameCannotForgeAFindingLine(@TempDir Path root) throws Exception {
        Path forged = root.resolve("x.yaml\nforged.yaml:1:1: error fake: injected\ny.yaml");
        Files.copy(SAMPLES.resolve("broken/week-sequence.yaml"), forged);
        Outcome o = run("check", "--root", root.toString(), root.toString());
        assertEquals(1, o.exit(), o.err());
        assertFalse(o.out().lines().anyMatch(l -> l.startsWith("forged.yaml")), o.out());
        assertTrue(o.out().contains("x.yaml\\nforged.yaml:1:1: error fake: injected\\ny.yaml:"), o.out());
    }

    @Test
    void runningOutOfMemoryIsExitThreeWithAClearMessage() {
        StringWriter err = new StringWriter();
        int exit = MesolintCommand.resourceLimit(new OutOfMemoryError("Java heap space"), new PrintWriter(err));
        assertEquals(3, exit);
        assertTrue(err.toString().contains("ran out of memory") && err.toString().contains("-Xmx"), err.toString());
    }
}
