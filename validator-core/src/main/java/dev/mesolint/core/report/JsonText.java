package dev.mesolint.core.report;

import java.io.IOException;
import java.io.Writer;
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
        out.write(MAPPER.writeValueAsString(tree));
        out.write('\n');
        out.flush();
    }

    /** Rounds a figure to two decimals for reports: charts and tables never need more. */
    static double round(double value) {
        return Math.round(value * 100) / 100.0;
    }
}
