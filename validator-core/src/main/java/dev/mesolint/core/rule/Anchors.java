package dev.mesolint.core.rule;

import dev.mesolint.core.finding.Anchor;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.Pointers;
import tools.jackson.databind.JsonNode;

/**
 * Turns a finding's JSON Pointer into its {@link Anchor}: list positions of named entries become their names, so
 * that inserting a session or an exercise before a finding, or a repeat week before it, does not move it. A week
 * written out is named by its place among the written-out weeks ({@code written-week=2}), so that inserting a repeat
 * or deload week and renumbering the weeks after it keeps it; a repeat week by its number ({@code week=5}); a
 * session by its day ({@code day=1}); an exercise by its id and, from the second on, its occurrence in its list
 * ({@code exercise=goblet-squat#2}); a superset by its first exercise. Sets, rounds and other lists keep their
 * positions, and a week written out before a finding's week still moves it (nothing else tells the weeks apart).
 */
public final class Anchors {
    private Anchors() {
    }

    /** The anchor of {@code pointer} in the programme {@code id} (null when unknown: the file path stands in). */
    public static Anchor of(LocatedDocument document, String id, String file, String pointer) {
        String path = document == null ? pointer : logicalPath(document.root(), pointer);
        return id == null || id.isBlank() ? Anchor.ofFile(file, path) : Anchor.ofProgramme(id, path);
    }

    static String logicalPath(JsonNode root, String pointer) {
        if (pointer.isEmpty()) {
            return "";
        }
        StringBuilder out = new StringBuilder();
        JsonNode node = root;
        for (String raw : pointer.substring(1).split("/", -1)) {
            String segment = raw.replace("~1", "/").replace("~0", "~");
            if (node != null && node.isArray() && segment.matches("\\d{1,9}")) {
                int index = Integer.parseInt(segment);
                out.append('/').append(index < node.size() ? name(node, index) : segment);
                node = node.get(index);
            } else {
                out.append(Pointers.child("", segment));
                node = node == null ? null : node.get(segment);
            }
        }
        return out.toString();
    }

    /** The element's name, with its occurrence among earlier siblings of the same name from the second on. */
    private static String name(JsonNode list, int index) {
        if (writtenWeek(list.get(index))) {
            int written = 1;
            for (int i = 0; i < index; i++) {
                written += writtenWeek(list.get(i)) ? 1 : 0;
            }
            return "written-week=" + written;
        }
        String name = ownName(list.get(index));
        if (name == null) {
            return Integer.toString(index);
        }
        int occurrence = 1;
        for (int i = 0; i < index; i++) {
            if (name.equals(ownName(list.get(i)))) {
                occurrence++;
            }
        }
        String escaped = name.replace("~", "~0").replace("/", "~1");
        return occurrence == 1 ? escaped : escaped + "#" + occurrence;
    }

    private static boolean writtenWeek(JsonNode element) {
        return element != null && element.isObject() && element.has("week") && element.has("sessions");
    }

    private static String ownName(JsonNode element) {
        if (element == null || !element.isObject()) {
            return null;
        }
        for (String key : new String[] {"week", "day", "exercise"}) {
            JsonNode v = element.get(key);
            if (v != null && v.isValueNode()) {
                return key + "=" + v.asString();
            }
        }
        JsonNode superset = element.get("superset");
        if (superset != null && superset.isObject()) {
            String first = ownName(superset.path("items").path(0));
            return first == null ? "superset" : "superset(" + first + ")";
        }
        return null;
    }
}
