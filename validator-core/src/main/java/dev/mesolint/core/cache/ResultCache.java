package dev.mesolint.core.cache;

import dev.mesolint.core.engine.FileReport;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;
import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The findings of earlier runs, stored as JSON in one file: per programme file its content hash and findings, plus
 * the reports on the repository's catalogue files, all valid for one {@link ConfigurationKey}.
 *
 * <p>A cache written under another key (changed configuration), by another mesolint or rule-set version (both kept
 * in the file), or one that cannot be read, is treated as empty; an entry that fails its {@link EntryChecksum} is
 * dropped and its file checked again: the cache can only save work, never change a result. Saving replaces the file atomically and
 * keeps only the files of the last run, so deleted programmes do not linger.
 */
public final class ResultCache {
    // 3: versions in plain text, a checksum per entry.
    static final int FORMAT = 3;
    private static final ObjectMapper MAPPER = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT).build();

    private final Path file;
    private final String key;
    private final ToolVersions versions;
    private final int rejected;
    private final Map<String, Entry> previous;
    private final Optional<List<FileReport>> previousCatalogues;
    private final Map<String, Entry> current = new TreeMap<>();
    private List<FileReport> currentCatalogues = List.of();
    private final String discarded;

    private record Entry(String contentHash, FileReport report) {
    }

    private ResultCache(Path file, String key, ToolVersions versions, Map<String, Entry> previous,
            Optional<List<FileReport>> previousCatalogues, int rejected, String discarded) {
        this.file = file;
        this.key = key;
        this.versions = versions;
        this.previous = previous;
        this.previousCatalogues = previousCatalogues;
        this.rejected = rejected;
        this.discarded = discarded;
    }

    /** Opens the cache at {@code file} for runs under {@code key}; never fails. */
    public static ResultCache open(Path file, ConfigurationKey key) {
        return open(file, key, ToolVersions.current());
    }

    /** As {@link #open(Path, ConfigurationKey)}, for a run of the given versions (tests of version changes). */
    static ResultCache open(Path file, ConfigurationKey key, ToolVersions versions) {
        String value = key.value();
        if (!Files.isRegularFile(file)) {
            return empty(file, value, versions, "no cache yet");
        }
        try {
            JsonNode root = MAPPER.readTree(Files.readString(file, StandardCharsets.UTF_8));
            if (root == null || root.path("format").asInt() != FORMAT) {
                return empty(file, value, versions, "cache written in another format");
            }
            ToolVersions stored = new ToolVersions(root.path("mesolint").asString(), root.path("ruleSet").asString());
            if (!stored.equals(versions)) {
                return empty(file, value, versions, "cache written by " + stored + ", this is " + versions);
            }
            if (!value.equals(root.path("configuration").asString())) {
                return empty(file, value, versions, "the configuration or mesolint version changed");
            }
            Map<String, Entry> entries = new TreeMap<>();
            int rejected = 0;
            for (Map.Entry<String, JsonNode> e : root.path("files").properties()) {
                Optional<Entry> entry = verifiedEntry(value, e.getKey(), e.getValue());
                entry.ifPresent(ok -> entries.put(e.getKey(), ok));
                rejected += entry.isPresent() ? 0 : 1;
            }
            Optional<List<FileReport>> catalogues = verifiedCatalogues(value, root.path("catalogues"));
            rejected += catalogues.isPresent() ? 0 : 1;
            return new ResultCache(file, value, versions, entries, catalogues, rejected, null);
        } catch (IOException | JacksonException | IllegalArgumentException e) {
            return empty(file, value, versions, "unreadable cache (" + e.getClass().getSimpleName() + ")");
        }
    }

    /** A file's entry when it decodes and its checksum holds; empty (so the file is checked again) otherwise. */
    private static Optional<Entry> verifiedEntry(String key, String path, JsonNode node) {
        try {
            FileReport report = FindingCodec.report(node);
            JsonNode content = node.get("content");
            if (content == null || !content.isString()) {
                return Optional.empty();
            }
            ObjectNode written = FindingCodec.report(report).put("content", content.asString());
            return EntryChecksum.of(key, "file " + path, written).equals(node.path("checksum").asString())
                    ? Optional.of(new Entry(content.asString(), report)) : Optional.empty();
        } catch (RuntimeException e) {
            // Whatever a damaged entry makes the decoder throw, the answer is the same: do not trust it.
            return Optional.empty();
        }
    }

    /** The catalogue reports when all of them decode and their one checksum holds (a removed one fails it too). */
    private static Optional<List<FileReport>> verifiedCatalogues(String key, JsonNode node) {
        try {
            List<FileReport> reports = new ArrayList<>();
            for (JsonNode c : node.path("reports")) {
                reports.add(FindingCodec.report(c));
            }
            return EntryChecksum.of(key, "catalogues", catalogues(reports)).equals(node.path("checksum").asString())
                    ? Optional.of(List.copyOf(reports)) : Optional.empty();
        } catch (RuntimeException e) {
            return Optional.empty();
        }
    }

    private static ArrayNode catalogues(List<FileReport> reports) {
        ArrayNode array = MAPPER.createArrayNode();
        reports.forEach(r -> array.add(FindingCodec.report(r)));
        return array;
    }

    private static ResultCache empty(Path file, String key, ToolVersions versions, String why) {
        return new ResultCache(file, key, versions, Map.of(), Optional.empty(), 0, why);
    }

    /** Why the stored results were not usable, when they were not. */
    public Optional<String> discarded() {
        return Optional.ofNullable(discarded);
    }

    /**
     * How many stored entries (a programme's, or the catalogue reports) failed their checksum or did not decode; each
     * is checked afresh instead.
     */
    public int rejectedEntries() {
        return rejected;
    }

    public Path file() {
        return file;
    }

    /** The stored report of {@code displayPath} when its content is still {@code contentHash}. */
    public Optional<FileReport> lookup(String displayPath, String contentHash) {
        Entry e = previous.get(displayPath);
        return e != null && e.contentHash().equals(contentHash) ? Optional.of(e.report()) : Optional.empty();
    }

    /** The stored reports on the catalogue files, when the last run under this key stored them. */
    public Optional<List<FileReport>> catalogueReports() {
        return previousCatalogues;
    }

    /** Records a file's result for the next run. */
    public synchronized void put(String displayPath, String contentHash, FileReport report) {
        current.put(displayPath, new Entry(contentHash, report));
    }

    public synchronized void putCatalogueReports(List<FileReport> reports) {
        currentCatalogues = List.copyOf(reports);
    }

    /** Writes what this run recorded, replacing the file. */
    public synchronized void save() throws IOException {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.put("mesolint", versions.mesolint());
        root.put("ruleSet", versions.ruleSet());
        root.put("configuration", key);
        ObjectNode catalogues = root.putObject("catalogues");
        ArrayNode reports = catalogues(currentCatalogues);
        catalogues.set("reports", reports);
        catalogues.put("checksum", EntryChecksum.of(key, "catalogues", reports));
        ObjectNode files = root.putObject("files");
        current.forEach((path, e) -> {
            ObjectNode entry = FindingCodec.report(e.report()).put("content", e.contentHash());
            String checksum = EntryChecksum.of(key, "file " + path, entry);
            files.set(path, entry.put("checksum", checksum));
        });
        Path parent = file.toAbsolutePath().getParent();
        Files.createDirectories(parent);
        Path temp = Files.createTempFile(parent, "cache", ".tmp");
        try {
            Files.writeString(temp, MAPPER.writeValueAsString(root), StandardCharsets.UTF_8);
            try {
                Files.move(temp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, file, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temp);
        }
    }
}
