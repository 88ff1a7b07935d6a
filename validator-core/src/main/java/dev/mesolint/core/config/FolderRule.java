package dev.mesolint.core.config;

import java.nio.file.FileSystems;
import java.nio.file.Path;
import java.nio.file.PathMatcher;

/**
 * "Programmes under this folder (or matching this glob) are checked with that profile". Patterns are matched
 * against a file's path relative to the checked root, with '/' separators.
 */
public final class FolderRule {
    private final String pattern;
    private final ProfileRef profile;
    private final PathMatcher glob;

    /** @throws IllegalArgumentException when {@code pattern} is not a valid glob */
    public FolderRule(String pattern, ProfileRef profile) {
        String p = pattern.trim().replace('\\', '/');
        while (p.startsWith("./")) {
            p = p.substring(2);
        }
        this.pattern = p;
        this.profile = profile;
        this.glob = isGlob(p) ? FileSystems.getDefault().getPathMatcher("glob:" + p) : null;
    }

    static boolean isGlob(String pattern) {
        return pattern.chars().anyMatch(c -> "*?[{".indexOf(c) >= 0);
    }

    public String pattern() {
        return pattern;
    }

    public ProfileRef profile() {
        return profile;
    }

    /** True when {@code displayPath} (relative, '/'-separated) is under the folder or matches the glob. */
    public boolean matches(String displayPath) {
        if (glob != null) {
            return glob.matches(Path.of(displayPath));
        }
        String folder = pattern.endsWith("/") ? pattern.substring(0, pattern.length() - 1) : pattern;
        return displayPath.equals(folder) || displayPath.startsWith(folder + "/");
    }
}
