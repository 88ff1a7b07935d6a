package dev.mesolint.core.report;

import java.io.IOException;
import java.io.Writer;
import java.util.Iterator;
import java.util.Map;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonGenerator;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/** Builds and prints the JSON trees of the JSON and SARIF reports (the mapper is immutable and thread-safe). */
final class JsonText {
    private static final JsonMapper MAPPER = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT).build();
    private static final JsonMapper COMPACT = JsonMapper.builder().build();

    private JsonText() {
    }

    static ObjectNode object() {
        return JsonNodeFactory.instance.objectNode();
    }

    static ArrayNode array() {
        return JsonNodeFactory.instance.arrayNode();
    }

    /** Writes the tree, indented, followed by a newline; does not close {@code out}. */
    static void write(JsonNode tree, Writer out) throws IOException {
        write(tree, null, Map.of(), out);
    }

    /**
     * Writes the tree as {@link #write(JsonNode, Writer)} does, except that the array under {@code field} of
     * {@code holder} (an object inside the tree, holding a placeholder there to keep the field's place) is streamed
     * from {@code items}: each element is made, written and dropped, so a report of 100,000 findings never holds
     * them all, nor the whole text.
     */
    static void write(JsonNode tree, ObjectNode holder, String field, Iterator<? extends JsonNode> items, Writer out)
            throws IOException {
        write(tree, holder, Map.of(field, items), out);
    }

    /** As {@link #write(JsonNode, ObjectNode, String, Iterator, Writer)}, streaming several arrays of {@code holder}. */
    static void write(JsonNode tree, ObjectNode holder, Map<String, ? extends Iterator<? extends JsonNode>> streamed,
            Writer out) throws IOException {
        try (JsonGenerator gen = MAPPER.createGenerator(new NonClosing(out))) {
            node(gen, tree, holder, streamed);
        } catch (JacksonException e) {
            throw new IOException(e.getOriginalMessage(), e);
        }
        out.write('\n');
        out.flush();
    }

    private static void node(JsonGenerator gen, JsonNode node, ObjectNode holder,
            Map<String, ? extends Iterator<? extends JsonNode>> streamed) {
        if (node.isObject()) {
            gen.writeStartObject();
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                gen.writeName(e.getKey());
                Iterator<? extends JsonNode> items = node == holder ? streamed.get(e.getKey()) : null;
                if (items != null) {
                    gen.writeStartArray();
                    while (items.hasNext()) {
                        MAPPER.writeTree(gen, items.next());
                    }
                    gen.writeEndArray();
                } else {
                    node(gen, e.getValue(), holder, streamed);
                }
            }
            gen.writeEndObject();
        } else if (node.isArray()) {
            gen.writeStartArray();
            for (JsonNode element : node) {
                node(gen, element, holder, streamed);
            }
            gen.writeEndArray();
        } else {
            MAPPER.writeTree(gen, node);
        }
    }

    /** The tree as compact UTF-8 JSON, for holding it packed ({@link #parse} reads it back as it was). */
    static byte[] compact(JsonNode tree) {
        return COMPACT.writeValueAsBytes(tree);
    }

    /** A tree written by {@link #compact}. */
    static JsonNode parse(byte[] json) {
        return COMPACT.readTree(json);
    }

    /** The caller's writer, left open when the generator closes (the caller may write more, and closes it). */
    private static final class NonClosing extends java.io.FilterWriter {
        NonClosing(Writer out) {
            super(out);
        }

        @Override
        public void close() throws IOException {
            flush();
        }
    }

    /** Rounds a figure to two decimals for reports: charts and tables never need more. */
    static double round(double value) {
        return Math.round(value * 100) / 100.0;
    }
}
