package dev.mesolint.core.yaml;

/**
 * Bounds that keep hostile or accidental input (alias bombs, deep nesting, huge files) from exhausting the checker.
 *
 * @param maxFileBytes files larger than this are refused before parsing (long scalars parse in worse than linear time)
 * @param maxAliases   aliases to collections per file
 * @param maxDepth     nesting depth of collections
 * @param maxNodes     nodes after expanding aliases and merge keys
 */
public record YamlLimits(long maxFileBytes, int maxAliases, int maxDepth, int maxNodes) {

    /** A large 52-week programme is about 150 KB; these limits leave ample room. */
    public static final YamlLimits DEFAULTS = new YamlLimits(2L * 1024 * 1024, 50, 40, 250_000);

    public YamlLimits {
        if (maxFileBytes < 1 || maxAliases < 0 || maxDepth < 4 || maxNodes < 16) {
            throw new IllegalArgumentException("limits too small: " + maxFileBytes + ", " + maxAliases + ", " + maxDepth
                    + ", " + maxNodes);
        }
    }
}
