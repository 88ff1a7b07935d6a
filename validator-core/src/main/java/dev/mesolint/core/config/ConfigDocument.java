package dev.mesolint.core.config;

import dev.mesolint.core.source.Location;
import dev.mesolint.core.source.SafeFiles;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.Pointers;
import dev.mesolint.core.yaml.YamlLimits;
import dev.mesolint.core.yaml.YamlProblem;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Collection;
import java.util.Comparator;
import java.util.Optional;
import org.apache.commons.text.similarity.LevenshteinDistance;
import tools.jackson.databind.JsonNode;

/**
 * A configuration file (profile or repository configuration) read through the safe, located YAML reader, with
 * helpers that turn every shape error into a {@link ConfigProblem} at the offending key or value.
 */
public final class ConfigDocument {
    private static final LevenshteinDistance DISTANCE = LevenshteinDistance.getDefaultInstance();

    private final String shown;
    private final LocatedDocument document;

    private ConfigDocument(String shown, LocatedDocument document) {
        this.shown = shown;
        this.document = document;
    }

    /** Reads {@code file}; {@code shown} is how messages name it. */
    public static ConfigDocument read(Path file, String shown) throws ConfigProblem {
        return read(file, shown, YamlLimits.DEFAULTS);
    }

    /** Reads {@code file} within {@code limits} (JSON files, being YAML too, are read the same way). */
    public static ConfigDocument read(Path file, String shown, YamlLimits limits) throws ConfigProblem {
        if (!Files.exists(file)) {
            throw new ConfigProblem(shown, null, "no such file", "check the path; relative paths in a configuration "
                    + "file are read from the folder that holds it");
        }
        String notRegular = SafeFiles.notRegular(file);
        if (notRegular != null) {
            // Checked before opening: a FIFO would block the run forever, a device would never end.
            throw new ConfigProblem(shown, null, "cannot be read: " + notRegular, "name a regular YAML file");
        }
        try {
            return new ConfigDocument(shown, new LocatedYamlReader(limits).read(file));
        } catch (NoSuchFileException e) {
            throw new ConfigProblem(shown, null, "no such file", "check the path");
        } catch (IOException e) {
            throw new ConfigProblem(shown, null, "cannot read the file: " + e.getMessage(),
                    "check that the file exists and is readable");
        } catch (YamlProblem e) {
            throw new ConfigProblem(shown, e.location(), e.getMessage(), e.hint());
        }
    }

    /** Reads YAML text that ships inside mesolint, e.g. a built-in profile. */
    public static ConfigDocument read(byte[] bytes, String shown) throws ConfigProblem {
        try {
            return new ConfigDocument(shown, new LocatedYamlReader(YamlLimits.DEFAULTS).read(bytes));
        } catch (YamlProblem e) {
            throw new ConfigProblem(shown, e.location(), e.getMessage(), e.hint());
        }
    }

    public String shown() {
        return shown;
    }

    public JsonNode root() {
        return document.root();
    }

    /** Where the value at {@code pointer} was written. */
    public Location valueAt(String pointer) {
        Location l = document.valueAt(pointer);
        return l.withPointer(pointer);
    }

    /** Where the key naming {@code pointer} was written. */
    public Location keyAt(String pointer) {
        Location l = document.keyAt(pointer);
        return l.withPointer(pointer);
    }

    public ConfigProblem problemAt(String pointer, String message, String hint) {
        return new ConfigProblem(shown, valueAt(pointer), message, hint);
    }

    public ConfigProblem problemAtKey(String pointer, String message, String hint) {
        return new ConfigProblem(shown, keyAt(pointer), message, hint);
    }

    /** The node at {@code pointer} as a mapping; {@code what} names it in the message. */
    public JsonNode mapping(JsonNode node, String pointer, String what, String example) throws ConfigProblem {
        if (node == null || !node.isObject()) {
            throw problemAt(pointer, what + " must be a mapping of 'key: value' lines", "write e.g. " + example);
        }
        return node;
    }

    /** A plain text (or number) value. */
    public String scalar(JsonNode node, String pointer, String example) throws ConfigProblem {
        if (node == null || node.isNull() || node.isContainer()) {
            throw problemAt(pointer, "'" + Pointers.lastSegment(pointer) + "' needs a single value",
                    "write e.g. " + example);
        }
        return node.asString();
    }

    /** Refuses keys of {@code node} outside {@code known}, suggesting the nearest known key. */
    public void onlyKeys(JsonNode node, String pointer, Collection<String> known, String what) throws ConfigProblem {
        for (String key : node.propertyNames()) {
            if (!known.contains(key)) {
                throw problemAtKey(Pointers.child(pointer, key), "unknown key '" + key + "' in " + what,
                        closest(key, known).map(k -> "did you mean '" + k + "'? ").orElse("")
                                + "known keys: " + String.join(", ", known));
            }
        }
    }

    /**
     * The entry of {@code known} nearest to {@code wanted}, if any is near enough to be a likely typo or starts with
     * the same word ({@code fail-level} suggests {@code fail-on}).
     */
    public static Optional<String> closest(String wanted, Collection<String> known) {
        String firstWord = wanted.split("-")[0];
        return known.stream()
                .filter(k -> DISTANCE.apply(k, wanted) <= Math.max(2, wanted.length() / 3)
                        || firstWord.length() >= 3 && k.split("-")[0].equals(firstWord))
                .min(Comparator.comparingInt((String k) -> DISTANCE.apply(k, wanted)).thenComparing(k -> k));
    }
}
