package dev.mesolint.core.format;

import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.ObjectReadContext;
import tools.jackson.core.json.JsonFactory;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * Reads a schema shipped in the core jar (JSON we wrote) into a JSON tree with Jackson's streaming parser, with the
 * number nodes the programme reader makes (whole numbers as long, others as exact decimals). A JSON parser reads
 * it several times faster than reading it as YAML, and a schema needs no source positions.
 */
final class SchemaTree {
    private static final JsonFactory JSON = JsonFactory.builder().build();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private SchemaTree() {
    }

    static JsonNode read(byte[] json) {
        try (JsonParser parser = JSON.createParser(ObjectReadContext.empty(), json)) {
            JsonNode root = value(parser, parser.nextToken());
            if (parser.nextToken() != null) {
                throw new IllegalStateException("more than one JSON value");
            }
            return root;
        }
    }

    private static JsonNode value(JsonParser parser, JsonToken token) {
        switch (token) {
            case START_OBJECT:
                ObjectNode object = NODES.objectNode();
                for (JsonToken t = parser.nextToken(); t != JsonToken.END_OBJECT; t = parser.nextToken()) {
                    String name = parser.currentName();
                    object.set(name, value(parser, parser.nextToken()));
                }
                return object;
            case START_ARRAY:
                ArrayNode array = NODES.arrayNode();
                for (JsonToken t = parser.nextToken(); t != JsonToken.END_ARRAY; t = parser.nextToken()) {
                    array.add(value(parser, t));
                }
                return array;
            case VALUE_STRING:
                return NODES.stringNode(parser.getString());
            case VALUE_NUMBER_INT:
                return NODES.numberNode(parser.getLongValue());
            case VALUE_NUMBER_FLOAT:
                return NODES.numberNode(parser.getDecimalValue());
            case VALUE_TRUE:
                return NODES.booleanNode(true);
            case VALUE_FALSE:
                return NODES.booleanNode(false);
            case VALUE_NULL:
                return NODES.nullNode();
            default:
                throw new IllegalStateException("unexpected JSON token " + token);
        }
    }
}
