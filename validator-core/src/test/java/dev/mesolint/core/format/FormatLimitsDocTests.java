package dev.mesolint.core.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * Every numeric limit in the published programme schema appears in the Limits section of docs/format.md, on a row
 * naming its key: the schema once capped supersets at 6 items without a word in the docs.
 */
class FormatLimitsDocTests {
    private static final Path DOCS = Path.of("../docs").toAbsolutePath().normalize();
    private static final Set<String> KEYWORDS = Set.of("minimum", "maximum", "exclusiveMinimum", "exclusiveMaximum",
            "minItems", "maxItems", "minLength", "maxLength", "minProperties", "maxProperties", "multipleOf");

    /** One limit: the YAML key it applies to, the keyword and its number, and where it is in the schema. */
    record Limit(String key, String keyword, String value, String path) {
    }

    @Test
    void everySchemaLimitIsStatedInFormatMd() throws IOException {
        JsonNode schema = new ObjectMapper().readTree(Files.readString(DOCS.resolve("schema/programme.schema.json")));
        List<Limit> limits = new ArrayList<>();
        collect(schema, "", null, limits);
        assertTrue(limits.size() >= 25, "the walk finds the schema's limits: " + limits);
        List<String> rows = limitRows(Files.readString(DOCS.resolve("format.md")));
        List<String> missing = limits.stream()
                .filter(l -> rows.stream().noneMatch(row -> row.contains(l.key() + "`") && row.contains(l.value())))
                .map(l -> l.path() + " " + l.keyword() + " " + l.value() + " (key `" + l.key() + "`)")
                .toList();
        assertEquals(List.of(), missing, "limits in the schema that docs/format.md's Limits table does not state");
    }

    @Test
    void theCircuitLimitIsTwelveInSchemaAndDocs() throws IOException {
        JsonNode schema = new ObjectMapper().readTree(Files.readString(DOCS.resolve("schema/programme.schema.json")));
        assertEquals(12, schema.at("/$defs/superset/properties/items/maxItems").asInt());
        assertTrue(limitRows(Files.readString(DOCS.resolve("format.md"))).stream()
                .anyMatch(r -> r.startsWith("| `items`") && r.contains("2 to 12")));
    }

    private static List<String> limitRows(String markdown) {
        int start = markdown.indexOf("\n## Limits");
        assertTrue(start >= 0, "docs/format.md has a Limits section");
        int end = markdown.indexOf("\n## ", start + 1);
        String section = markdown.substring(start, end < 0 ? markdown.length() : end);
        return section.lines().filter(l -> l.startsWith("| `")).toList();
    }

    /**
     * Walks the schema; a limit belongs to the nearest property name above it, or to the {@code $defs} entry it sits
     * in (written the YAML way: {@code oneRepMax} is {@code one-rep-max}).
     */
    private static void collect(JsonNode node, String path, String key, List<Limit> out) {
        if (!node.isObject()) {
            return;
        }
        for (Map.Entry<String, JsonNode> e : node.properties()) {
            String name = e.getKey();
            JsonNode value = e.getValue();
            if (KEYWORDS.contains(name) && value.isNumber()) {
                out.add(new Limit(key, name, new BigDecimal(value.asString()).stripTrailingZeros().toPlainString(),
                        path));
            } else if (name.equals("properties") || name.equals("$defs")) {
                for (Map.Entry<String, JsonNode> child : value.properties()) {
                    collect(child.getValue(), path + "/" + name + "/" + child.getKey(), yamlName(child.getKey()), out);
                }
            } else if (value.isObject()) {
                collect(value, path + "/" + name, key, out);
            } else if (value.isArray()) {
                for (int i = 0; i < value.size(); i++) {
                    collect(value.get(i), path + "/" + name + "/" + i, key, out);
                }
            }
        }
    }

    private static String yamlName(String schemaName) {
        return schemaName.replaceAll("([a-z])([A-Z])", "$1-$2").toLowerCase(java.util.Locale.ROOT);
    }
}
