package dev.mesolint.core.cache;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;
import tools.jackson.databind.json.JsonMapper;

/**
 * The checksum of one cache entry: SHA-256 over the run's configuration key, the entry's name and the entry as
 * {@link FindingCodec} writes it. Checked over the entry as decoded and written again, so what the cache hands back
 * is exactly what was summed: a damaged byte, a hand-removed finding or an entry moved to another file fails it.
 * It guards against damage and careless edits, not against someone who recomputes it on purpose.
 */
final class EntryChecksum {
    private static final ObjectMapper COMPACT = JsonMapper.builder().build();

    private EntryChecksum() {
    }

    static String of(String configurationKey, String name, JsonNode entry) {
        return ContentHash.of(configurationKey + "\n" + name + "\n" + COMPACT.writeValueAsString(entry));
    }
}
