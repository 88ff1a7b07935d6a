package dev.mesolint.core.config;

import dev.mesolint.core.source.Location;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;

/**
 * A profile as a configuration names it: a profile name ({@code strength}, {@code harbourside-rehab}) or the path of
 * a team profile file ({@code profiles/rehab.yaml}), with where it was written for error messages.
 *
 * @param file     the resolved file when {@code text} is a path
 * @param source   the file (or command-line option) that wrote the reference
 * @param location where in {@code source}; empty for a command-line option
 */
public record ProfileRef(String text, Optional<Path> file, String source, Optional<Location> location) {

    /**
     * Reads a reference: text with a '/' or ending in {@code .yaml}/{@code .yml} is a file path, resolved against
     * {@code baseFolder}; anything else is a profile name.
     */
    public static ProfileRef of(String text, Path baseFolder, String source, Location location) {
        String t = text.trim();
        String lower = t.toLowerCase(Locale.ROOT);
        boolean path = t.contains("/") || t.contains("\\") || lower.endsWith(".yaml") || lower.endsWith(".yml");
        return new ProfileRef(t, path ? Optional.of(baseFolder.resolve(t).toAbsolutePath().normalize())
                : Optional.empty(), source, Optional.ofNullable(location));
    }

    public boolean isFile() {
        return file.isPresent();
    }

    /** A problem located at this reference. */
    public ConfigProblem problem(String message, String hint) {
        return new ConfigProblem(source, location.orElse(null), message, hint);
    }
}
