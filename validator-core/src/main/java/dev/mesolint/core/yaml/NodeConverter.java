package dev.mesolint.core.yaml;

import dev.mesolint.core.source.Location;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import org.yaml.snakeyaml.DumperOptions;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;
import org.yaml.snakeyaml.nodes.Tag;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * Turns SnakeYAML nodes into Jackson nodes with YAML 1.2 core typing, merge keys resolved and duplicate keys refused.
 *
 * <p>Why our own typing: under YAML 1.1 {@code rest: 2:30} is the integer 150 and {@code no} is false. Here only
 * {@code true}/{@code false}, {@code null}/{@code ~} and plain decimal numbers get a type; everything else stays
 * the text the author wrote, which the value parsers then read.
 */
final class NodeConverter {
    private static final JsonNodeFactory JSON = JsonNodeFactory.instance;
    private static final Pattern INTEGER = Pattern.compile("[-+]?(0|[1-9][0-9]*)");
    private static final Pattern DECIMAL = Pattern.compile("[-+]?([0-9]+\\.[0-9]*|\\.[0-9]+)([eE][-+]?[0-9]+)?");
    private static final Set<Tag> STANDARD = Set.of(Tag.STR, Tag.INT, Tag.FLOAT, Tag.BOOL, Tag.NULL, Tag.TIMESTAMP,
            Tag.MAP, Tag.SEQ, Tag.MERGE, Tag.OMAP, Tag.PAIRS, Tag.SET);

    private final YamlLimits limits;
    private final Map<String, Location> values;
    private final Map<String, Location> keys;
    private int nodes;

    NodeConverter(YamlLimits limits, Map<String, Location> values, Map<String, Location> keys) {
        this.limits = limits;
        this.values = values;
        this.keys = keys;
    }

    JsonNode convert(Node node, String pointer, int depth) throws YamlProblem {
        Location here = locate(node, pointer);
        if (++nodes > limits.maxNodes()) {
            throw new YamlProblem("the document expands to more than " + limits.maxNodes()
                    + " nodes through aliases (a possible alias bomb)", "write the repeated parts out, or use a week "
                    + "'repeat' instead of YAML aliases", here);
        }
        if (depth > limits.maxDepth()) {
            throw new YamlProblem("the document nests deeper than " + limits.maxDepth() + " levels",
                    "a programme needs no more than about ten levels; check for a recursive alias", here);
        }
        if (!STANDARD.contains(node.getTag())) {
            throw new YamlProblem("the tag " + node.getTag().getValue() + " is not allowed",
                    "remove the '!' tag; programmes use plain values only", here);
        }
        values.putIfAbsent(pointer, here);
        if (node instanceof ScalarNode scalar) {
            return scalar(scalar);
        }
        if (node instanceof SequenceNode sequence) {
            ArrayNode array = JSON.arrayNode();
            List<Node> items = sequence.getValue();
            for (int i = 0; i < items.size(); i++) {
                array.add(convert(items.get(i), Pointers.child(pointer, i), depth + 1));
            }
            return array;
        }
        return mapping((MappingNode) node, pointer, depth);
    }

    private ObjectNode mapping(MappingNode node, String pointer, int depth) throws YamlProblem {
        Map<String, NodeTuple> explicit = new LinkedHashMap<>();
        List<MappingNode> mergeSources = new ArrayList<>();
        for (NodeTuple tuple : node.getValue()) {
            Node keyNode = tuple.getKeyNode();
            if (keyNode.getTag().equals(Tag.MERGE)) {
                collectMergeSources(tuple.getValueNode(), mergeSources, pointer);
                continue;
            }
            if (!(keyNode instanceof ScalarNode keyScalar)) {
                throw new YamlProblem("a mapping key must be a plain name, not a list or mapping",
                        "write 'name: value'", locate(keyNode, pointer));
            }
            String key = keyScalar.getValue();
            if (explicit.containsKey(key)) {
                Location first = locate(explicit.get(key).getKeyNode(), pointer);
                throw new YamlProblem("the key '" + key + "' appears twice in one mapping (first at line "
                        + first.line() + ")", "remove or rename one of them", locate(keyNode, pointer));
            }
            explicit.put(key, tuple);
        }
        ObjectNode object = JSON.objectNode();
        // Merged entries first, explicit keys override them (YAML merge-key semantics; earlier sources win).
        Map<String, NodeTuple> merged = new LinkedHashMap<>();
        for (MappingNode source : mergeSources) {
            for (NodeTuple tuple : source.getValue()) {
                if (tuple.getKeyNode() instanceof ScalarNode k && !tuple.getKeyNode().getTag().equals(Tag.MERGE)) {
                    merged.putIfAbsent(k.getValue(), tuple);
                }
            }
        }
        merged.putAll(explicit);
        for (Map.Entry<String, NodeTuple> entry : merged.entrySet()) {
            String child = Pointers.child(pointer, entry.getKey());
            keys.putIfAbsent(child, locate(entry.getValue().getKeyNode(), child));
            object.set(entry.getKey(), convert(entry.getValue().getValueNode(), child, depth + 1));
        }
        return object;
    }

    private void collectMergeSources(Node value, List<MappingNode> into, String pointer) throws YamlProblem {
        if (value instanceof MappingNode m) {
            into.add(m);
        } else if (value instanceof SequenceNode s) {
            for (Node item : s.getValue()) {
                if (!(item instanceof MappingNode m)) {
                    throw mergeProblem(item, pointer);
                }
                into.add(m);
            }
        } else {
            throw mergeProblem(value, pointer);
        }
    }

    private YamlProblem mergeProblem(Node node, String pointer) {
        return new YamlProblem("a '<<' merge key must name a mapping (or a list of mappings)",
                "write '<<: *anchor' where the anchor is on a mapping", locate(node, pointer));
    }

    private static JsonNode scalar(ScalarNode scalar) {
        String text = scalar.getValue();
        if (scalar.getScalarStyle() != DumperOptions.ScalarStyle.PLAIN || scalar.getTag().equals(Tag.STR)) {
            return JSON.stringNode(text);
        }
        switch (text) {
            case "", "~", "null", "Null", "NULL":
                return JSON.nullNode();
            case "true", "True", "TRUE":
                return JSON.booleanNode(true);
            case "false", "False", "FALSE":
                return JSON.booleanNode(false);
            default:
                break;
        }
        if (INTEGER.matcher(text).matches()) {
            // Any length is a number (YAML 1.2 core schema); one too large for a long stays exact, for a located
            // "out of range" rather than being taken for text.
            java.math.BigInteger value = new java.math.BigInteger(text.startsWith("+") ? text.substring(1) : text);
            return value.bitLength() < 64 ? JSON.numberNode(value.longValue()) : JSON.numberNode(value);
        }
        if (DECIMAL.matcher(text).matches()) {
            return JSON.numberNode(new java.math.BigDecimal(text));
        }
        return JSON.stringNode(text);
    }

    private static Location locate(Node node, String pointer) {
        Location start = LocatedYamlReader.at(node.getStartMark());
        Location end = LocatedYamlReader.at(node.getEndMark());
        return new Location(start.line(), start.column(), end.line(), end.column(), pointer);
    }
}
