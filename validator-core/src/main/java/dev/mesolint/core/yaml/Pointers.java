package dev.mesolint.core.yaml;

/** JSON Pointer (RFC 6901) building and display. */
public final class Pointers {
    private Pointers() {
    }

    // Built at their exact length: pointers are made for every written field, and a builder of the default size
    // would grow, copying, for most of them.
    public static String child(String parent, String key) {
        String segment = escape(key);
        return new StringBuilder(parent.length() + 1 + segment.length()).append(parent).append('/').append(segment)
                .toString();
    }

    public static String child(String parent, int index) {
        return new StringBuilder(parent.length() + 11).append(parent).append('/').append(index).toString();
    }

    private static String escape(String key) {
        return key.indexOf('~') < 0 && key.indexOf('/') < 0 ? key : key.replace("~", "~0").replace("/", "~1");
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

    /** Whether the segment {@code pointer[from, to)} is {@code name} as {@link #child(String, String)} escapes it. */
    static boolean segmentNames(String pointer, int from, int to, String name) {
        int at = from;
        for (int i = 0; i < name.length(); i++) {
            char c = name.charAt(i);
            if (c == '~' || c == '/') {
                if (at + 2 > to || pointer.charAt(at) != '~' || pointer.charAt(at + 1) != (c == '~' ? '0' : '1')) {
                    return false;
                }
                at += 2;
            } else {
                if (at >= to || pointer.charAt(at) != c) {
                    return false;
                }
                at++;
            }
        }
        return at == to;
    }

    /** The list index written as {@code pointer[from, to)} the way {@link #child(String, int)} writes it, else -1. */
    static int index(String pointer, int from, int to) {
        int digits = to - from;
        if (digits < 1 || digits > 9 || (digits > 1 && pointer.charAt(from) == '0')) {
            return -1;
        }
        int value = 0;
        for (int i = from; i < to; i++) {
            char c = pointer.charAt(i);
            if (c < '0' || c > '9') {
                return -1;
            }
            value = value * 10 + (c - '0');
        }
        return value;
    }
}
