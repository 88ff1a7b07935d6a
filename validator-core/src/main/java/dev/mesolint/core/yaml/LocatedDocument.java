package dev.mesolint.core.yaml;

import dev.mesolint.core.source.Location;
import tools.jackson.databind.JsonNode;

/**
 * A YAML document as a JSON tree (what the schema validator reads), with the source position of every node.
 *
 * <p>The positions live in the tree itself (each object and array keeps where its keys and values were written), so
 * a position is found by walking a JSON Pointer from the root, and a {@link Location} is only made when asked for.
 */
public final class LocatedDocument {
    private final JsonNode root;
    private final Location rootLocation;

    LocatedDocument(JsonNode root, Location rootLocation) {
        this.root = root;
        this.rootLocation = rootLocation;
    }

    public JsonNode root() {
        return root;
    }

    /** Where the value at {@code pointer} was written; the nearest written ancestor when it was not. */
    public Location valueAt(String pointer) {
        return find(pointer, false, false);
    }

    /** Where the key naming {@code pointer} was written, else where its value was. */
    public Location keyAt(String pointer) {
        return find(pointer, true, false);
    }

    /** Where the value at {@code pointer} was written; null when no value was written there. */
    public Location writtenAt(String pointer) {
        return find(pointer, false, true);
    }

    /**
     * Where {@code object}, a node of this document, holds the value of {@code key}: the location carries
     * {@code pointer}, the value's own pointer, which the caller knows; null when the object holds no such key.
     * What a reader that walks the tree asks instead of walking the pointer again from the root.
     */
    public Location childAt(JsonNode object, String key, String pointer) {
        if (object instanceof LocatedObject located) {
            int index = located.indexOf(key);
            return index < 0 ? null : located.valueLocation(index, pointer);
        }
        return null;
    }

    /** Where {@code list}, a node of this document, holds its element {@code index}; as above. */
    public Location childAt(JsonNode list, int index, String pointer) {
        if (list instanceof LocatedArray located && located.holds(index)) {
            return located.valueLocation(index, pointer);
        }
        return null;
    }

    /**
     * Walks {@code pointer} from the root, segment by segment, without cutting it up. The location returned carries
     * the pointer of the node it is about (an ancestor's, when the walk stops short).
     */
    private Location find(String pointer, boolean key, boolean exact) {
        if (pointer.isEmpty()) {
            return rootLocation;
        }
        JsonNode node = root;
        JsonNode lastContainer = null;
        int lastIndex = -1;
        int lastEnd = 0;
        int start = 0;
        int length = pointer.length();
        while (start < length && pointer.charAt(start) == '/') {
            int end = pointer.indexOf('/', start + 1);
            if (end < 0) {
                end = length;
            }
            int index;
            JsonNode child;
            if (node instanceof LocatedObject object) {
                index = object.indexOf(pointer, start + 1, end);
                child = index < 0 ? null : object.child(index);
            } else if (node instanceof LocatedArray array) {
                index = Pointers.index(pointer, start + 1, end);
                child = index < 0 || index >= array.size() ? null : array.get(index);
            } else {
                child = null;
                index = -1;
            }
            if (child == null) {
                break;
            }
            if (end == length) {
                return key && node instanceof LocatedObject object ? object.keyLocation(index, pointer)
                        : located(node, index, pointer);
            }
            lastContainer = node;
            lastIndex = index;
            lastEnd = end;
            node = child;
            start = end;
        }
        if (exact) {
            return null;
        }
        return lastContainer == null ? rootLocation
                : located(lastContainer, lastIndex, pointer.substring(0, lastEnd));
    }

    private static Location located(JsonNode container, int index, String pointer) {
        return container instanceof LocatedObject object ? object.valueLocation(index, pointer)
                : ((LocatedArray) container).valueLocation(index, pointer);
    }
}
