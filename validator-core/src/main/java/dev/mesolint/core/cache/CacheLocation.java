package dev.mesolint.core.cache;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;

/**
 * Where a command-line run keeps its results cache: in the user's cache folder (the XDG base directory
 * specification: {@code $XDG_CACHE_HOME}, else {@code ~/.cache}), one file per repository root, so that nothing is
 * written inside the checked repository unless the user names a place there.
 */
public final class CacheLocation {
    private CacheLocation() {
    }

    /**
     * The cache file for the repository at {@code root}.
     *
     * @param env  the environment ({@code XDG_CACHE_HOME} is read; a relative value is ignored, as the specification
     *             says)
     * @param home the user's home folder
     */
    public static Path forRepository(Path root, Map<String, String> env, Path home) {
        String xdg = env.get("XDG_CACHE_HOME");
        Path base = xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute() ? Path.of(xdg) : home.resolve(".cache");
        return base.resolve("mesolint").resolve(digest(root.toAbsolutePath().normalize().toString()) + ".json");
    }

    /** The cache file for {@code root} for this process's user and environment. */
    public static Path forRepository(Path root) {
        return forRepository(root, System.getenv(), Path.of(System.getProperty("user.home")));
    }

    private static String digest(String text) {
        try {
            byte[] hash = MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(hash, 0, 12);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }
}
