package dev.mesolint.core.config;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Paths in a repository configuration stay inside the repository root once links are resolved. A temporary file
 * beside the repository stands in for "a file elsewhere on the machine"; its content must never be quoted.
 */
class ConfinementTests {
    private static final String SECRET = "stand-in-secret-7f3a";

    private static Path repo(Path dir, String config) throws Exception {
        Path root = Files.createDirectories(dir.resolve("repo"));
        Files.writeString(dir.resolve("outside.yaml"), SECRET + ": 1\n");
        Files.writeString(root.resolve(RepositoryConfig.FILE_NAME), config);
        return root;
    }

    @Test
    void aCatalogueOutsideTheRootIsRefusedAtItsValueWithoutReadingIt(@TempDir Path dir) throws Exception {
        Path root = repo(dir, "catalogues: [../outside.yaml]\n");
        ConfigProblem p = assertThrows(ConfigProblem.class, () -> RepositoryConfigReader.read(
                root.resolve(RepositoryConfig.FILE_NAME), ".mesolint.yaml", root, false));
        assertTrue(p.describe().contains("outside the repository root"), p.describe());
        assertTrue(p.describe().contains(":1:14"), "located at the list entry: " + p.describe());
        assertFalse(p.describe().contains(SECRET));
        assertFalse(p.describe().contains("--"), "no command-line option in the core's own words: " + p.describe());
    }

    @Test
    void theHintNamesTheCallersSettingThatAcceptsThePathWhenItHasOne(@TempDir Path dir) throws Exception {
        Path root = repo(dir, "catalogues: [../outside.yaml]\n");
        SettingNames cli = SettingNames.of(java.util.Map.of(SettingNames.ALLOW_OUTSIDE_ROOT, "--allow-outside-root"));
        ConfigProblem p = assertThrows(ConfigProblem.class, () -> RepositoryConfigReader.read(
                root.resolve(RepositoryConfig.FILE_NAME), ".mesolint.yaml", root, false, cli));
        assertTrue(p.hint().endsWith("keep the file inside the repository, or pass --allow-outside-root when that is "
                + "intended"), p.hint());
        ConfigProblem none = assertThrows(ConfigProblem.class, () -> RepositoryConfigReader.read(
                root.resolve(RepositoryConfig.FILE_NAME), ".mesolint.yaml", root, false,
                SettingNames.of(java.util.Map.of())));
        assertEquals("keep the file inside the repository", none.hint(), "a caller without the setting is not "
                + "told to pass it");
    }

    @Test
    void aLinkInsideTheRootThatLeadsOutIsRefusedToo(@TempDir Path dir) throws Exception {
        Path root = repo(dir, "profile: profiles/club.yaml\nbaseline: base.json\n");
        Files.createDirectories(root.resolve("profiles"));
        Files.createSymbolicLink(root.resolve("profiles/club.yaml"), dir.resolve("outside.yaml"));
        ConfigProblem p = assertThrows(ConfigProblem.class, () -> RepositoryConfigReader.read(
                root.resolve(RepositoryConfig.FILE_NAME), ".mesolint.yaml", root, false));
        assertTrue(p.describe().contains("once its links are resolved"), p.describe());
    }

    @Test
    void allowOutsideRootAcceptsThePath(@TempDir Path dir) throws Exception {
        Path root = repo(dir, "catalogues: [../outside.yaml]\n");
        RepositoryConfig config = RepositoryConfigReader.read(root.resolve(RepositoryConfig.FILE_NAME),
                ".mesolint.yaml", root, true);
        assertEquals(dir.resolve("outside.yaml").toAbsolutePath().normalize(), config.catalogues().get(0));
    }
}
