package dev.mesolint.core.rule;

import dev.mesolint.core.finding.Anchor;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.Pointers;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.Map;
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
        return of(document == null ? null : new Paths(document.root()), id, file, pointer);
    }

    /** As {@link #of(LocatedDocument, String, String, String)}, with the file's paths resolved so far. */
    static Anchor of(Paths paths, String id, String file, String pointer) {
        String path = paths == null ? pointer : paths.of(pointer);
        return id == null || id.isBlank() ? Anchor.ofFile(file, path) : Anchor.ofProgramme(id, path);
    }

    static String logicalPath(JsonNode root, String pointer) {
        return new Paths(root).of(pointer);
    }

    /**
     * The logical paths of one document's pointers. Findings of a file share most of their pointers' prefixes (the
     * week, the session, the exercise), so each prefix is resolved once. Confined to the thread that checks the file.
     */
    static final class Paths {
        /** A pointer's logical path and the node it points at (null past the end of the document). */
        private record Resolved(String path, JsonNode node) {
        }

        private final Map<String, Resolved> byPointer = new HashMap<>();
        /** Each list's element names, made in one walk of the list the first time one of them is asked for. */
        private final Map<JsonNode, String[]> namesOf = new IdentityHashMap<>();
        private final Resolved root;

        Paths(JsonNode root) {
            this.root = new Resolved("", root);
        }

        String of(String pointer) {
            if (pointer.isEmpty()) {
                return "";
            }
            if (pointer.charAt(0) != '/') {
                // Not a well-formed pointer: read past its first character, segment by segment, without keeping it.
                Resolved at = root;
                for (String raw : pointer.substring(1).split("/", -1)) {
                    at = step(at, raw);
                }
                return at.path();
            }
            return resolve(pointer).path();
        }

        private Resolved resolve(String pointer) {
            if (pointer.isEmpty()) {
                return root;
            }
            Resolved known = byPointer.get(pointer);
            if (known == null) {
                int cut = pointer.lastIndexOf('/');
                Resolved parent = cut <= 0 ? root : resolve(pointer.substring(0, cut));
                known = step(parent, pointer.substring(cut + 1));
                byPointer.put(pointer, known);
            }
            return known;
        }

        /** One segment on from {@code parent}: a list position becomes the element's name where it has one. */
        private Resolved step(Resolved parent, String raw) {
            String segment = raw.replace("~1", "/").replace("~0", "~");
            JsonNode node = parent.node();
            if (node != null && node.isArray() && isIndex(segment)) {
                int index = Integer.parseInt(segment);
                return new Resolved(parent.path() + '/' + (index < node.size()
                        ? namesOf.computeIfAbsent(node, Anchors::names)[index] : segment), node.get(index));
            }
            return new Resolved(Pointers.child(parent.path(), segment), node == null ? null : node.get(segment));
        }

        /** One to nine ASCII digits. */
        private static boolean isIndex(String segment) {
            int n = segment.length();
            if (n < 1 || n > 9) {
                return false;
            }
            for (int i = 0; i < n; i++) {
                char c = segment.charAt(i);
                if (c < '0' || c > '9') {
                    return false;
                }
            }
            return true;
        }
    }

    /**
     * Each element's name, with its occurrence among earlier siblings of the same name from the second on (a written
     * week counts among the siblings named by its number, though it is named by its place among written weeks).
     */
    private static String[] names(JsonNode list) {
        String[] names = new String[list.size()];
        Map<String, Integer> seen = new HashMap<>();
        int written = 0;
        for (int i = 0; i < names.length; i++) {
            JsonNode element = list.get(i);
            String name = ownName(element);
            int occurrence = name == null ? 0 : seen.merge(name, 1, Integer::sum);
            if (writtenWeek(element)) {
                names[i] = "written-week=" + ++written;
            } else if (name == null) {
                names[i] = Integer.toString(i);
            } else {
                String escaped = name.replace("~", "~0").replace("/", "~1");
                names[i] = occurrence == 1 ? escaped : escaped + "#" + occurrence;
            }
        }
        return names;
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
