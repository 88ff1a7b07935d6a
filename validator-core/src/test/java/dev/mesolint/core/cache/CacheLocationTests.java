package dev.mesolint.core.cache;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The XDG base directory specification (freedesktop.org): $XDG_CACHE_HOME, absolute, else $HOME/.cache. */
class CacheLocationTests {
    private final Path home = Path.of("/home/coach");
    private final Path repo = Path.of("/work/harbourside-programmes");

    @Test
    void xdgCacheHomeWinsWhenAbsolute() {
        Path file = CacheLocation.forRepository(repo, Map.of("XDG_CACHE_HOME", "/var/cache/u"), home);
        assertEquals(Path.of("/var/cache/u/mesolint"), file.getParent());
    }

    @Test
    void aMissingOrRelativeXdgCacheHomeFallsBackToDotCacheInHome() {
        assertEquals(home.resolve(".cache/mesolint"), CacheLocation.forRepository(repo, Map.of(), home).getParent());
        assertEquals(home.resolve(".cache/mesolint"),
                CacheLocation.forRepository(repo, Map.of("XDG_CACHE_HOME", "rel/cache"), home).getParent());
    }

    @Test
    void eachRepositoryHasItsOwnFile() {
        assertNotEquals(CacheLocation.forRepository(repo, Map.of(), home),
                CacheLocation.forRepository(Path.of("/work/other"), Map.of(), home));
        assertEquals(CacheLocation.forRepository(repo, Map.of(), home),
                CacheLocation.forRepository(repo.resolve("x/.."), Map.of(), home), "the same root, written otherwise");
    }
}
