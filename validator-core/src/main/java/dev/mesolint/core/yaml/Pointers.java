package dev.mesolint.core.yaml;

/** JSON Pointer (RFC 6901) building and display. */
public final class Pointers {
    private Pointers() {
    }

    public static String child(String parent, String key) {
        return parent + "/" + key.replace("~", "~0").replace("/", "~1");
    }

    public static String child(String parent, int index) {
        return parent + "/" + index;
    }

    /** A readable path for messages: {@code /weeks/0/sessions/1} becomes {@code weeks[0].sessions[1]}. */
    public static String readable(String pointer) {
        if (pointer.isEmpty()) {
            return "the document";
        }
        StringBuilder out = new StringBuilder();
        for (String part : pointer.substring(1).split("/", -1)) {
            String name = part.replace("~1", "/").replace("~0", "~");
            if (name.matches("\\d+")) {
                out.append('[').append(name).append(']');
            } else {
                if (out.length() > 0) {
                    out.append('.');
                }
                out.append(name);
            }
        }
        return out.toString();
    }

    /** The last segment of a pointer: the property name or index. */
    public static String lastSegment(String pointer) {
        return pointer.substring(pointer.lastIndexOf('/') + 1).replace("~1", "/").replace("~0", "~");
    }
}
