package dev.mesolint.core.format;

import dev.mesolint.core.source.Location;
import dev.mesolint.core.source.Violation;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.Pointers;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tools.jackson.databind.JsonNode;

/**
 * Refuses numbers far outside anything a programme, catalogue or profile means: no field of the formats accepts a
 * magnitude of a billion or more (the largest bound is 104 weeks, 300 minutes or a load in kilograms), and numbers
 * that large do not fit the {@code int} and {@code long} the validator and binder read them into. Each is a located
 * "out of range" error, so 1.0e19 or a twenty-digit week number can never become an internal error.
 */
final class NumberRange {
    /** Exclusive: larger magnitudes are out of range for every field. */
    static final BigDecimal LIMIT = BigDecimal.valueOf(1_000_000_000L);

    private NumberRange() {
    }

    static List<Violation> check(LocatedDocument document) {
        // Nearly every document has no such number: look first, and spell out pointers only when there is one.
        if (!anyTooLarge(document.root())) {
            return List.of();
        }
        List<Violation> out = new ArrayList<>();
        walk(document.root(), "", document, out);
        return out;
    }

    private static void walk(JsonNode node, String pointer, LocatedDocument document, List<Violation> out) {
        if (node == null) {
            return;
        }
        if (node.isNumber()) {
            if (tooLarge(node)) {
                Location at = document.valueAt(pointer);
                out.add(new Violation(new Location(at.line(), at.column(), pointer),
                        "'" + Pointers.readable(pointer) + "' is out of range (found " + shown(node)
                                + "): no value in the format is that large",
                        "write a number within the field's range (see docs/format.md), e.g. week: 1 to 104, sets: 1 "
                                + "to 20"));
            }
        } else if (node.isObject()) {
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                walk(e.getValue(), Pointers.child(pointer, e.getKey()), document, out);
            }
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                walk(node.get(i), Pointers.child(pointer, i), document, out);
            }
        }
    }

    private static boolean anyTooLarge(JsonNode node) {
        if (node.isNumber()) {
            return tooLarge(node);
        }
        if (node.isContainer()) {
            for (JsonNode child : node.values()) {
                if (anyTooLarge(child)) {
                    return true;
                }
            }
        }
        return false;
    }

    private static boolean tooLarge(JsonNode node) {
        if (node.isInt() || node.isLong()) {
            long value = node.longValue();
            return value >= LIMIT.longValue() || value <= -LIMIT.longValue();
        }
        if (node.isDouble() || node.isFloat()) {
            double d = node.doubleValue();
            return !Double.isFinite(d) || Math.abs(d) >= LIMIT.doubleValue();
        }
        return node.decimalValue().abs().compareTo(LIMIT) >= 0;
    }

    private static String shown(JsonNode node) {
        String text = node.isBigDecimal() ? node.decimalValue().toString() : node.toString();
        return text.length() > 24 ? text.substring(0, 12) + "..." + " (" + text.length() + " digits)" : text;
    }
}
