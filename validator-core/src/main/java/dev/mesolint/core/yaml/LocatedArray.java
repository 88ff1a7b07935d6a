package dev.mesolint.core.yaml;

import dev.mesolint.core.source.Location;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.nodes.Node;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;

/** A JSON array that remembers where each element was written; to every reader an ordinary {@link ArrayNode}. */
final class LocatedArray extends ArrayNode {
    private static final long serialVersionUID = 1L;

    private final transient Spans values;

    LocatedArray(int capacity) {
        super(JsonNodeFactory.instance, capacity);
        values = new Spans(capacity);
    }

    void add(JsonNode value, Node valueNode) {
        add(value, valueNode.getStartMark(), valueNode.getEndMark());
    }

    /** As above, with the marks of the element's first and last events. */
    void add(JsonNode value, Mark start, Mark end) {
        values.add(start, end);
        add(value);
    }

    boolean holds(int index) {
        return index >= 0 && index < size();
    }

    Location valueLocation(int index, String pointer) {
        return values.location(index, pointer);
    }
}
