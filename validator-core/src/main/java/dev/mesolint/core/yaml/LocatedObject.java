package dev.mesolint.core.yaml;

import dev.mesolint.core.source.Location;
import java.util.Arrays;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.nodes.Node;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * A JSON object that remembers, per property in insertion order, where its key and its value were written. To the
 * schema validator and every other reader it is an ordinary {@link ObjectNode}.
 */
final class LocatedObject extends ObjectNode {
    private static final long serialVersionUID = 1L;

    private String[] names;
    private final transient Spans keys;
    private final transient Spans values;

    LocatedObject(int capacity) {
        super(JsonNodeFactory.instance);
        names = new String[Math.max(1, capacity)];
        keys = new Spans(capacity);
        values = new Spans(capacity);
    }

    /** Adds a property the object does not have yet, with the nodes its key and value were read from. */
    void add(String name, JsonNode value, Node keyNode, Node valueNode) {
        add(name, value, keyNode.getStartMark(), keyNode.getEndMark(), valueNode.getStartMark(),
                valueNode.getEndMark());
    }

    /** As above, with the marks of the key's event and of the value's first and last events. */
    void add(String name, JsonNode value, Mark keyStart, Mark keyEnd, Mark valueStart, Mark valueEnd) {
        int index = keys.size();
        if (index == names.length) {
            names = Arrays.copyOf(names, index * 2);
        }
        names[index] = name;
        keys.add(keyStart, keyEnd);
        values.add(valueStart, valueEnd);
        set(name, value);
    }

    /** The property whose JSON Pointer segment is {@code pointer[from, to)} (still escaped), else -1. */
    int indexOf(String pointer, int from, int to) {
        int count = keys.size();
        for (int i = 0; i < count; i++) {
            if (Pointers.segmentNames(pointer, from, to, names[i])) {
                return i;
            }
        }
        return -1;
    }

    /** The property named {@code name}, else -1. */
    int indexOf(String name) {
        int count = keys.size();
        int hash = name.hashCode(); // kept by each string: a quick no before any character is compared
        for (int i = 0; i < count; i++) {
            if (names[i] == name || names[i].hashCode() == hash && names[i].equals(name)) {
                return i;
            }
        }
        return -1;
    }

    String name(int index) {
        return names[index];
    }

    JsonNode child(int index) {
        return get(names[index]);
    }

    Location keyLocation(int index, String pointer) {
        return keys.location(index, pointer);
    }

    Location valueLocation(int index, String pointer) {
        return values.location(index, pointer);
    }
}
