package dev.mesolint.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Which files a run checks, and that every entry it cannot read as a programme is reported, never dropped. */
class ProgrammeFilesTests {
    private static final String PROGRAMME = "format: 1\n";

    private static ProgrammeFiles.Discovery find(Path root, Path... inputs) {
        return ProgrammeFiles.find(root, List.of(inputs), Set.of());
    }

    private static String reasonFor(ProgrammeFiles.Discovery d, String name) {
        return d.refused().stream().filter(r -> r.path().getFileName().toString().equals(name)).findFirst()
                .map(ProgrammeFiles.Refused::reason).orElse("(not refused)");
    }

    @Test
    void aStartPathThatIsALinkIsFollowed(@TempDir Path root) throws IOException {
        Files.createDirectories(root.resolve("real"));
        Files.writeString(root.resolve("real/a.yaml"), PROGRAMME);
        Files.createSymbolicLink(root.resolve("link"), Path.of("real"));
        ProgrammeFiles.Discovery d = find(root, root.resolve("link"));
        assertEquals(1, d.programmes().size(), d.toString());
        assertTrue(d.refused().isEmpty());
    }

    @Test
    void aLinkInsideTheRootIsFollowedAndOneLeadingOutIsReported(@TempDir Path dir) throws IOException {
        Path root = Files.createDirectories(dir.resolve("repo"));
        Path outside = Files.createDirectories(dir.resolve("elsewhere"));
        Files.writeString(outside.resolve("b.yaml"), PROGRAMME);
        Files.writeString(outside.resolve("secret.yaml"), "stands in for a file outside the root\n");
        Files.createDirectories(root.resolve("p/shared"));
        Files.writeString(root.resolve("p/shared/c.yaml"), PROGRAMME);
        Files.createSymbolicLink(root.resolve("p/inside.yaml"), Path.of("shared/c.yaml"));
        Files.createSymbolicLink(root.resolve("p/secret.yaml"), outside.resolve("secret.yaml"));
        Files.createSymbolicLink(root.resolve("p/more"), outside);
        ProgrammeFiles.Discovery d = find(root, root.resolve("p"));
        assertEquals(List.of(root.resolve("p/inside.yaml"), root.resolve("p/shared/c.yaml")), d.programmes());
        assertTrue(reasonFor(d, "secret.yaml").contains("outside the repository root"), d.toString());
        assertTrue(reasonFor(d, "more").contains("outside the repository root"), d.toString());
    }

    @Test
    void aDanglingLinkAndAFifoAreReportedWithWhy(@TempDir Path root) throws Exception {
        Files.createDirectories(root.resolve("p"));
        Files.writeString(root.resolve("p/a.yaml"), PROGRAMME);
        Files.createSymbolicLink(root.resolve("p/gone.yaml"), Path.of("missing.yaml"));
        boolean fifo = new ProcessBuilder("mkfifo", root.resolve("p/pipe.yaml").toString()).start().waitFor() == 0;
        ProgrammeFiles.Discovery d = find(root, root.resolve("p"));
        assertEquals(List.of(root.resolve("p/a.yaml")), d.programmes());
        assertTrue(reasonFor(d, "gone.yaml").contains("link to nothing"), d.toString());
        if (fifo) {
            assertTrue(reasonFor(d, "pipe.yaml").contains("named pipe (FIFO)"), d.toString());
        }
    }

    @Test
    void aNamedFileWithoutTheExtensionIsReportedAndANamedHiddenFileIsChecked(@TempDir Path root) throws IOException {
        Files.writeString(root.resolve("a.yaml.txt"), PROGRAMME);
        Files.writeString(root.resolve(".a.yaml"), PROGRAMME);
        ProgrammeFiles.Discovery d = find(root, root.resolve("a.yaml.txt"), root.resolve(".a.yaml"));
        assertEquals(List.of(root.resolve(".a.yaml")), d.programmes());
        assertTrue(reasonFor(d, "a.yaml.txt").contains("ends in .yaml or .yml"), d.toString());
    }

    @Test
    void hiddenFilesInAFolderAreCountedAndOwnFilesPassedOver(@TempDir Path root) throws IOException {
        Files.writeString(root.resolve(".a.yaml"), PROGRAMME);
        Files.writeString(root.resolve(".mesolint.yaml"), "fail-on: warning\n");
        Files.writeString(root.resolve("club-catalogue.yaml"), "format: 1\n");
        Files.writeString(root.resolve("b.yml"), PROGRAMME);
        ProgrammeFiles.Discovery d = ProgrammeFiles.find(root, List.of(root), Set.of(root.resolve("club-catalogue.yaml")));
        assertEquals(List.of(root.resolve("b.yml")), d.programmes());
        assertEquals(List.of(root.resolve(".a.yaml")), d.hidden(), "the configuration file is not counted as hidden");
    }

    @Test
    void anEmptyFolderIsEmptyAndALinkLoopIsReportedWhileTheRestIsFound(@TempDir Path root) throws IOException {
        Files.createDirectories(root.resolve("empty"));
        assertTrue(find(root, root.resolve("empty")).empty());
        Files.createDirectories(root.resolve("p/sub"));
        Files.writeString(root.resolve("p/a.yaml"), PROGRAMME);
        Files.createSymbolicLink(root.resolve("p/sub/up"), Path.of(".."));
        ProgrammeFiles.Discovery d = find(root, root.resolve("p"));
        assertEquals(List.of(root.resolve("p/a.yaml")), d.programmes());
        assertTrue(reasonFor(d, "up").contains("loops back"), d.toString());
    }

    @Test
    void anUnreadableFolderIsOneProblemAndTheRestIsChecked(@TempDir Path root) throws IOException {
        // Root reads every folder whatever its mode, so this case only runs as another user.
        assumeTrue(!"root".equals(System.getProperty("user.name")));
        Files.createDirectories(root.resolve("p/locked"));
        Files.writeString(root.resolve("p/a.yaml"), PROGRAMME);
        root.resolve("p/locked").toFile().setReadable(false);
        try {
            ProgrammeFiles.Discovery d = find(root, root.resolve("p"));
            assertEquals(List.of(root.resolve("p/a.yaml")), d.programmes());
            assertTrue(reasonFor(d, "locked").startsWith("cannot be read"), d.toString());
        } finally {
            root.resolve("p/locked").toFile().setReadable(true);
        }
    }
}
