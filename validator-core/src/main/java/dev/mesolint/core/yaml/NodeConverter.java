package dev.mesolint.core.yaml;

import dev.mesolint.core.source.Location;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.yaml.snakeyaml.DumperOptions;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;
import org.yaml.snakeyaml.nodes.Tag;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.JsonNodeFactory;

/**
 * Turns SnakeYAML nodes into located Jackson nodes with YAML 1.2 core typing, merge keys resolved and duplicate keys
 * refused, in one pass: each object and array keeps where its children were written, and a node's JSON Pointer is
 * only spelled out for a problem.
 *
 * <p>Why our own typing: under YAML 1.1 {@code rest: 2:30} is the integer 150 and {@code no} is false. Here only
 * {@code true}/{@code false}, {@code null}/{@code ~} and plain decimal numbers get a type; everything else stays
 * the text the author wrote, which the value parsers then read.
 */
final class NodeConverter {
    private static final JsonNodeFactory JSON = JsonNodeFactory.instance;
    private static final Set<Tag> STANDARD = Set.of(Tag.STR, Tag.INT, Tag.FLOAT, Tag.BOOL, Tag.NULL, Tag.TIMESTAMP,
            Tag.MAP, Tag.SEQ, Tag.MERGE, Tag.OMAP, Tag.PAIRS, Tag.SET);
    /** Mappings up to this size look for a repeated key by scanning; larger ones by hashing. */
    static final int SCANNED_KEYS = 16;

    private final YamlLimits limits;
    /** The pointer segments (a key or an index) down to the node being converted, for problems' pointers. */
    private final Object[] path;
    private int nodes;

    NodeConverter(YamlLimits limits) {
        this.limits = limits;
        this.path = new Object[limits.maxDepth() + 2];
    }

    LocatedDocument document(Node root) throws YamlProblem {
        JsonNode tree = convert(root, 0);
        return new LocatedDocument(tree, Spans.of(root, ""));
    }

    private JsonNode convert(Node node, int depth) throws YamlProblem {
        if (++nodes > limits.maxNodes()) {
            throw new YamlProblem("the document expands to more than " + limits.maxNodes()
                    + " nodes through aliases (a possible alias bomb)", "write the repeated parts out, or use a week "
                    + "'repeat' instead of YAML aliases", Spans.of(node, pointer(depth)));
        }
        if (depth > limits.maxDepth()) {
            throw new YamlProblem("the document nests deeper than " + limits.maxDepth() + " levels",
                    "a programme needs no more than about ten levels; check for a recursive alias",
                    Spans.of(node, pointer(depth)));
        }
        Tag tag = node.getTag();
        if (!standard(tag)) {
            throw new YamlProblem("the tag " + tag.getValue() + " is not allowed",
                    "remove the '!' tag; programmes use plain values only", Spans.of(node, pointer(depth)));
        }
        if (node instanceof ScalarNode scalar) {
            return scalar(scalar, tag);
        }
        if (node instanceof SequenceNode sequence) {
            List<Node> items = sequence.getValue();
            LocatedArray array = new LocatedArray(items.size());
            for (int i = 0; i < items.size(); i++) {
                Node item = items.get(i);
                path[depth] = i;
                array.add(convert(item, depth + 1), item);
            }
            return array;
        }
        return mapping((MappingNode) node, depth);
    }

    // The resolver hands out its own and Tag's constants; anything else is compared by value.
    private static boolean standard(Tag tag) {
        return tag == PlainScalarResolver.PLAIN || tag == Tag.STR || tag == Tag.MAP || tag == Tag.SEQ
                || tag == Tag.INT || tag == Tag.FLOAT || tag == Tag.NULL || tag == Tag.BOOL || STANDARD.contains(tag);
    }

    private static boolean merge(Tag tag) {
        // nearly every key is a plain scalar, so its tag is the resolver's own constant
        return tag == Tag.MERGE || (tag != PlainScalarResolver.PLAIN && tag != Tag.STR && tag.equals(Tag.MERGE));
    }

    private LocatedObject mapping(MappingNode node, int depth) throws YamlProblem {
        List<NodeTuple> tuples = node.getValue();
        int size = tuples.size();
        String[] names = new String[size];
        NodeTuple[] explicit = new NodeTuple[size];
        Map<String, Integer> seen = size > SCANNED_KEYS ? new HashMap<>(size * 2) : null;
        int count = 0;
        List<MappingNode> mergeSources = null;
        for (NodeTuple tuple : tuples) {
            Node keyNode = tuple.getKeyNode();
            if (merge(keyNode.getTag())) {
                if (mergeSources == null) {
                    mergeSources = new ArrayList<>();
                }
                collectMergeSources(tuple.getValueNode(), mergeSources, depth);
                continue;
            }
            if (!(keyNode instanceof ScalarNode keyScalar)) {
                throw new YamlProblem("a mapping key must be a plain name, not a list or mapping",
                        "write 'name: value'", Spans.of(keyNode, pointer(depth)));
            }
            String key = KeyNames.canonical(keyScalar.getValue());
            int first = seen != null ? seen.getOrDefault(key, -1) : indexOf(names, count, key);
            if (first >= 0) {
                Location firstAt = Spans.of(explicit[first].getKeyNode(), pointer(depth));
                throw new YamlProblem("the key '" + key + "' appears twice in one mapping (first at line "
                        + firstAt.line() + ")", "remove or rename one of them", Spans.of(keyNode, pointer(depth)));
            }
            if (seen != null) {
                seen.put(key, count);
            }
            names[count] = key;
            explicit[count++] = tuple;
        }
        if (mergeSources != null) {
            return merged(names, explicit, count, mergeSources, depth);
        }
        LocatedObject object = new LocatedObject(count);
        for (int i = 0; i < count; i++) {
            add(object, names[i], explicit[i], depth);
        }
        return object;
    }

    private static int indexOf(String[] names, int count, String key) {
        int hash = key.hashCode(); // computed once per key and kept by the string: most keys differ by it
        for (int i = 0; i < count; i++) {
            if (names[i].hashCode() == hash && names[i].equals(key)) {
                return i;
            }
        }
        return -1;
    }

    /** Merged entries first, explicit keys override them (YAML merge-key semantics; earlier sources win). */
    private LocatedObject merged(String[] names, NodeTuple[] explicit, int count, List<MappingNode> sources, int depth)
            throws YamlProblem {
        Map<String, NodeTuple> merged = new LinkedHashMap<>();
        for (MappingNode source : sources) {
            for (NodeTuple tuple : source.getValue()) {
                if (tuple.getKeyNode() instanceof ScalarNode k && !merge(tuple.getKeyNode().getTag())) {
                    merged.putIfAbsent(k.getValue(), tuple);
                }
            }
        }
        for (int i = 0; i < count; i++) {
            merged.put(names[i], explicit[i]);
        }
        LocatedObject object = new LocatedObject(merged.size());
        for (Map.Entry<String, NodeTuple> entry : merged.entrySet()) {
            add(object, entry.getKey(), entry.getValue(), depth);
        }
        return object;
    }

    private void add(LocatedObject object, String name, NodeTuple tuple, int depth) throws YamlProblem {
        path[depth] = name;
        Node valueNode = tuple.getValueNode();
        object.add(name, convert(valueNode, depth + 1), tuple.getKeyNode(), valueNode);
    }

    private void collectMergeSources(Node value, List<MappingNode> into, int depth) throws YamlProblem {
        if (value instanceof MappingNode m) {
            into.add(m);
        } else if (value instanceof SequenceNode s) {
            for (Node item : s.getValue()) {
                if (!(item instanceof MappingNode m)) {
                    throw mergeProblem(item, depth);
                }
                into.add(m);
            }
        } else {
            throw mergeProblem(value, depth);
        }
    }

    private YamlProblem mergeProblem(Node node, int depth) {
        return new YamlProblem("a '<<' merge key must name a mapping (or a list of mappings)",
                "write '<<: *anchor' where the anchor is on a mapping", Spans.of(node, pointer(depth)));
    }

    /** The JSON Pointer of the node at {@code depth} on the current path. */
    private String pointer(int depth) {
        String pointer = "";
        for (int i = 0; i < depth; i++) {
            pointer = path[i] instanceof Integer index ? Pointers.child(pointer, index)
                    : Pointers.child(pointer, (String) path[i]);
        }
        return pointer;
    }

    private static JsonNode scalar(ScalarNode scalar, Tag tag) {
        return scalar(scalar.getValue(), scalar.getScalarStyle(), tag);
    }

    /** A scalar's JSON value: quoted or tagged as text stays text; a plain one is typed as the class comment says. */
    static JsonNode scalar(String text, DumperOptions.ScalarStyle style, Tag tag) {
        if (style != DumperOptions.ScalarStyle.PLAIN || tag == Tag.STR
                || (tag != PlainScalarResolver.PLAIN && tag.equals(Tag.STR))) {
            return JSON.stringNode(text);
        }
        if (mayBeNullOrBoolean(text)) {
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
        }
        switch (PlainNumbers.kind(text)) {
            case INTEGER:
                return integer(text);
            case DECIMAL:
                return JSON.numberNode(new BigDecimal(text));
            default:
                return JSON.stringNode(text);
        }
    }

    /**
     * False for text that cannot be one of the null and boolean words: nearly every scalar (ids, numbers, "90s"),
     * told apart by length and first letter before a string switch would hash it.
     */
    private static boolean mayBeNullOrBoolean(String text) {
        if (text.length() > 5) {
            return false;
        }
        if (text.isEmpty()) {
            return true;
        }
        char first = text.charAt(0);
        return first == '~' || first == 'n' || first == 'N' || first == 't' || first == 'T' || first == 'f'
                || first == 'F';
    }

    /**
     * Any length is a number (YAML 1.2 core schema); one too large for a long stays exact, for a located "out of
     * range" rather than being taken for text.
     */
    private static JsonNode integer(String text) {
        int digits = text.length() - (text.charAt(0) == '-' || text.charAt(0) == '+' ? 1 : 0);
        if (digits <= 18) {
            return JSON.numberNode(Long.parseLong(text));
        }
        BigInteger value = new BigInteger(text.startsWith("+") ? text.substring(1) : text);
        return value.bitLength() < 64 ? JSON.numberNode(value.longValue()) : JSON.numberNode(value);
    }
}
