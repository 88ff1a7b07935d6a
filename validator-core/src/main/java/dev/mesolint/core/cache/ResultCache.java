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
 * <p>A cache written under another key (another version, changed configuration), or one that cannot be read, is
 * treated as empty: the cache can only save work, never change a result. Saving replaces the file atomically and
 * keeps only the files of the last run, so deleted programmes do not linger.
 */
public final class ResultCache {
    static final int FORMAT = 2;
    private static final ObjectMapper MAPPER = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT).build();

    private final Path file;
    private final String key;
    private final Map<String, Entry> previous;
    private final Optional<List<FileReport>> previousCatalogues;
    private final Map<String, Entry> current = new TreeMap<>();
    private List<FileReport> currentCatalogues = List.of();
    private final String discarded;

    private record Entry(String contentHash, FileReport report) {
    }

    private ResultCache(Path file, String key, Map<String, Entry> previous,
            Optional<List<FileReport>> previousCatalogues, String discarded) {
        this.file = file;
        this.key = key;
        this.previous = previous;
        this.previousCatalogues = previousCatalogues;
        this.discarded = discarded;
    }

    /** Opens the cache at {@code file} for runs under {@code key}; never fails. */
    public static ResultCache open(Path file, ConfigurationKey key) {
        String value = key.value();
        if (!Files.isRegularFile(file)) {
            return empty(file, value, "no cache yet");
        }
        try {
            JsonNode root = MAPPER.readTree(Files.readString(file, StandardCharsets.UTF_8));
            if (root == null || root.path("format").asInt() != FORMAT) {
                return empty(file, value, "cache written in another format");
            }
            if (!value.equals(root.path("configuration").asString())) {
                return empty(file, value, "the configuration or mesolint version changed");
            }
            Map<String, Entry> entries = new TreeMap<>();
            for (Map.Entry<String, JsonNode> e : root.path("files").properties()) {
                entries.put(e.getKey(), new Entry(e.getValue().path("content").asString(),
                        FindingCodec.report(e.getValue())));
            }
            List<FileReport> catalogues = new ArrayList<>();
            for (JsonNode c : root.path("catalogues")) {
                catalogues.add(FindingCodec.report(c));
            }
            return new ResultCache(file, value, entries, Optional.of(List.copyOf(catalogues)), null);
        } catch (IOException | JacksonException | IllegalArgumentException e) {
            return empty(file, value, "unreadable cache (" + e.getClass().getSimpleName() + ")");
        }
    }

    private static ResultCache empty(Path file, String key, String why) {
        return new ResultCache(file, key, Map.of(), Optional.empty(), why);
    }

    /** Why the stored results were not usable, when they were not. */
    public Optional<String> discarded() {
        return Optional.ofNullable(discarded);
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
        root.put("configuration", key);
        ArrayNode catalogues = root.putArray("catalogues");
        currentCatalogues.forEach(r -> catalogues.add(FindingCodec.report(r)));
        ObjectNode files = root.putObject("files");
        current.forEach((path, e) -> files.set(path, FindingCodec.report(e.report()).put("content", e.contentHash())));
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
