package dev.mesolint.core.report;

import java.io.IOException;
import java.io.Writer;
import java.util.Collections;
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
        write(tree, null, null, Collections.emptyIterator(), out);
    }

    /**
     * Writes the tree as {@link #write(JsonNode, Writer)} does, except that the array under {@code field} of
     * {@code holder} (an object inside the tree, holding a placeholder there to keep the field's place) is streamed
     * from {@code items}: each element is made, written and dropped, so a report of 100,000 findings never holds
     * them all, nor the whole text.
     */
    static void write(JsonNode tree, ObjectNode holder, String field, Iterator<? extends JsonNode> items, Writer out)
            throws IOException {
        try (JsonGenerator gen = MAPPER.createGenerator(new NonClosing(out))) {
            node(gen, tree, holder, field, items);
        } catch (JacksonException e) {
            throw new IOException(e.getOriginalMessage(), e);
        }
        out.write('\n');
        out.flush();
    }

    private static void node(JsonGenerator gen, JsonNode node, ObjectNode holder, String field,
            Iterator<? extends JsonNode> items) {
        if (node.isObject()) {
            gen.writeStartObject();
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                gen.writeName(e.getKey());
                if (node == holder && e.getKey().equals(field)) {
                    gen.writeStartArray();
                    while (items.hasNext()) {
                        MAPPER.writeTree(gen, items.next());
                    }
                    gen.writeEndArray();
                } else {
                    node(gen, e.getValue(), holder, field, items);
                }
            }
            gen.writeEndObject();
        } else if (node.isArray()) {
            gen.writeStartArray();
            for (JsonNode element : node) {
                node(gen, element, holder, field, items);
            }
            gen.writeEndArray();
        } else {
            MAPPER.writeTree(gen, node);
        }
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
