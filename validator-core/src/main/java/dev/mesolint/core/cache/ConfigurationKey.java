package dev.mesolint.core.cache;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import java.util.stream.Collectors;

/**
 * Everything besides a programme's own text that can change its findings: the tool version, the rules, the option
 * values and the contents of the configuration files (repository configuration, profiles, catalogues, baseline).
 * Two runs with equal keys give equal findings for equal file contents.
 */
public final class ConfigurationKey {
    private final List<String> parts = new ArrayList<>();

    private ConfigurationKey(String toolVersion) {
        parts.add("mesolint " + toolVersion);
    }

    /**
     * A key for this build of mesolint: the version, the rule-set version, and the size and time of the jar it runs
     * from, so that a rebuilt snapshot does not reuse what an older build of the same version found.
     */
    public static ConfigurationKey forThisVersion() {
        return new ConfigurationKey(Mesolint.version() + " rules " + Mesolint.RULE_SET_VERSION + " "
                + codeStamp(Mesolint.class));
    }

    /** Size and time of the jar a class was loaded from ("classes" for a folder), so rebuilt jars change keys. */
    private static String codeStamp(Class<?> type) {
        try {
            Path code = Path.of(type.getProtectionDomain().getCodeSource().getLocation().toURI());
            return Files.isRegularFile(code) ? Files.size(code) + "@" + Files.getLastModifiedTime(code).toMillis()
                    : "classes";
        } catch (IOException | URISyntaxException | RuntimeException e) {
            return "unknown";
        }
    }

    /**
     * The key of a run in {@code workspace}: this build of mesolint, the rules, the fail level, the root, the forced
     * profile, the contents of the configuration and catalogue files, and every profile as resolved (so an edited
     * team profile file, or one it extends, changes the key).
     */
    public static ConfigurationKey of(Workspace workspace, CheckRequest request, List<RuleDefinition> rules)
            throws IOException {
        ConfigurationKey key = forThisVersion()
                .option("rules", rules.stream().map(RuleDefinition::id).collect(Collectors.joining(",")))
                // Team rule packs are jars of their own: a rebuilt pack must not reuse the old pack's findings.
                .option("rule code", rules.stream().map(r -> codeStamp(r.getClass())).distinct().sorted()
                        .collect(Collectors.joining(",")))
                .option("root", request.root())
                .option("failOn", request.failOn().label())
                .option("profile", workspace.options().profile().orElse(null))
                .option("limits", request.limits())
                .file("config", workspace.config().file().orElse(null));
        for (Path catalogue : request.extraCatalogues()) {
            key.file("catalogue", catalogue);
        }
        for (String name : workspace.profiles().names()) {
            key.option("profile " + name, resolved(workspace, name, rules));
        }
        return key;
    }

    /** A profile's effective settings in a stable order (the maps' own order changes from one JVM to the next). */
    private static String resolved(Workspace workspace, String profile, List<RuleDefinition> rules) {
        StringBuilder out = new StringBuilder(workspace.configuration().modelParameters(profile).toString());
        for (RuleDefinition rule : rules) {
            RuleSettings s = workspace.configuration().settingsFor(profile, rule);
            out.append(' ').append(rule.id()).append('=').append(s.severity().label())
                    .append(new TreeMap<>(s.values()));
        }
        return out.toString();
    }

    /** A key as another version would make it (for tests of version changes). */
    static ConfigurationKey forVersion(String version) {
        return new ConfigurationKey(version);
    }

    /** An option value; {@code null} and absent are the same. */
    public ConfigurationKey option(String name, Object value) {
        parts.add("option " + name + "=" + (value == null ? "" : value));
        return this;
    }

    /**
     * A configuration file by content: editing it, creating it or deleting it changes the key. A file that exists but
     * cannot be read is an error for the caller, who would fail reading it anyway.
     */
    public ConfigurationKey file(String role, Path file) throws IOException {
        if (file == null || !Files.exists(file)) {
            parts.add("file " + role + " absent");
        } else {
            parts.add("file " + role + " " + ContentHash.ofFile(file));
        }
        return this;
    }

    public String value() {
        return ContentHash.of(String.join("\n", parts));
    }

    @Override
    public String toString() {
        return String.join("; ", parts);
    }
}
