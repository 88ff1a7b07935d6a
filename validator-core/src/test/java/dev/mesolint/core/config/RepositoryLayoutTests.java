package dev.mesolint.core.config;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RepositoryLayoutTests {
    @TempDir
    Path dir;

    private Path folder(String relative) throws IOException {
        return Files.createDirectories(dir.resolve(relative));
    }

    private Path file(String relative, String text) throws IOException {
        Path file = dir.resolve(relative);
        Files.createDirectories(file.getParent());
        return Files.writeString(file, text);
    }

    private static RepositoryLayout discover(Path... inputs) {
        return RepositoryLayout.discover(List.of(inputs), Optional.empty(), Path.of("/nowhere"));
    }

    @Test
    void theRootIsTheNearestFolderHoldingGitAndTheConfigurationIsFoundOnTheWayUp() throws IOException {
        folder("team/.git");
        Path config = file("team/.mesolint.yaml", "fail-on: warning\n");
        Path programme = file("team/programmes/strength/block-1.yaml", "format: 1\n");

        RepositoryLayout fromFile = discover(programme);
        RepositoryLayout fromFolder = discover(programme.getParent());
        RepositoryLayout fromTop = discover(dir.resolve("team/programmes"));

        assertEquals(new RepositoryLayout(dir.resolve("team"), Optional.of(config)), fromFile);
        assertEquals(fromFile, fromFolder);
        assertEquals(fromFile, fromTop);
    }

    @Test
    void aGitFileAsInWorktreesAndSubmodulesMarksTheRootToo() throws IOException {
        file("outer/.mesolint.yaml", "fail-on: info\n");
        file("outer/inner/.git", "gitdir: ../.git/modules/inner\n");
        Path programme = file("outer/inner/programmes/a.yaml", "format: 1\n");

        // The walk stops at the submodule: the outer repository's configuration is not the submodule's.
        assertEquals(new RepositoryLayout(dir.resolve("outer/inner"), Optional.empty()), discover(programme));
    }

    @Test
    void theNearestConfigurationWinsAndTheRootStaysTheRepository() throws IOException {
        folder(".git");
        file(".mesolint.yaml", "fail-on: info\n");
        Path nested = file("rehab/.mesolint.yaml", "profile: general-fitness\n");
        Path programme = file("rehab/knee/a.yaml", "format: 1\n");

        assertEquals(new RepositoryLayout(dir, Optional.of(nested)), discover(programme));
    }

    @Test
    void rootTrueStopsTheWalkBeforeAnEnclosingRepository() throws IOException {
        folder(".git");
        Path config = file("clubs/harbourside/.mesolint.yaml", "root: true\nfail-on: warning\n");
        Path programme = file("clubs/harbourside/programmes/a.yaml", "format: 1\n");

        assertEquals(new RepositoryLayout(dir.resolve("clubs/harbourside"), Optional.of(config)),
                discover(programme));
    }

    @Test
    void withoutRepositoryTheConfigurationFolderIsTheRootElseTheFallback() throws IOException {
        Path config = file("club/.mesolint.yaml", "fail-on: warning\n");
        Path programme = file("club/programmes/a.yaml", "format: 1\n");
        Path loose = file("loose/a.yaml", "format: 1\n");

        assertEquals(new RepositoryLayout(dir.resolve("club"), Optional.of(config)), discover(programme));
        RepositoryLayout none = RepositoryLayout.discover(List.of(loose), Optional.empty(), dir.resolve("loose"));
        assertEquals(new RepositoryLayout(dir.resolve("loose"), Optional.empty()), none);
    }

    @Test
    void anExplicitRootEndsTheWalkThereWhateverItHolds() throws IOException {
        folder(".git");
        file(".mesolint.yaml", "fail-on: info\n");
        Path programme = file("club/programmes/a.yaml", "format: 1\n");

        RepositoryLayout layout = RepositoryLayout.discover(List.of(programme), Optional.of(dir.resolve("club")),
                Path.of("/nowhere"));

        assertEquals(new RepositoryLayout(dir.resolve("club"), Optional.empty()), layout);
    }

    @Test
    void theWalkStartsAtTheFolderThatHoldsEveryInput() throws IOException {
        folder(".git");
        Path nested = file("programmes/strength/.mesolint.yaml", "fail-on: info\n");
        Path a = file("programmes/strength/a.yaml", "format: 1\n");
        Path b = file("programmes/hypertrophy/b.yaml", "format: 1\n");

        assertEquals(Optional.of(dir.resolve("programmes")), RepositoryLayout.commonFolder(List.of(a, b)));
        assertEquals(Optional.of(nested), discover(a).config());
        assertEquals(Optional.empty(), discover(a, b).config());
    }

    @Test
    void rootMustBeTrueOrFalseAndIsReportedAtItsValue() throws IOException {
        Path config = file(".mesolint.yaml", "root: yes please\n");

        ConfigProblem problem = assertThrows(ConfigProblem.class, () -> RepositoryConfigReader.read(config,
                ".mesolint.yaml"));

        assertTrue(problem.describe().startsWith(".mesolint.yaml:1:7: root must be true or false"),
                problem.describe());
    }
}
