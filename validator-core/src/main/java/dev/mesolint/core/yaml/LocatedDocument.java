package dev.mesolint.core.yaml;

import dev.mesolint.core.source.Location;
import java.util.Map;
import tools.jackson.databind.JsonNode;

/**
 * A YAML document as a JSON tree (what the schema validator reads), with the source position of every node.
 *
 * @param values positions of values, by JSON Pointer
 * @param keys   positions of mapping keys, by the JSON Pointer of the value they name
 */
public record LocatedDocument(JsonNode root, Map<String, Location> values, Map<String, Location> keys) {

    /** Where the value at {@code pointer} was written; the nearest written ancestor when it was not. */
    public Location valueAt(String pointer) {
        String p = pointer;
        while (true) {
            Location l = values.get(p);
            if (l != null) {
                return l;
            }
            if (p.isEmpty()) {
                return Location.START;
            }
            p = p.substring(0, p.lastIndexOf('/'));
        }
    }

    /** Where the key naming {@code pointer} was written, else where its value was. */
    public Location keyAt(String pointer) {
        Location l = keys.get(pointer);
        return l != null ? l : valueAt(pointer);
    }
}
