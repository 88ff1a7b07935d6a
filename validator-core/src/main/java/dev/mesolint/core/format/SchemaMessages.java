package dev.mesolint.core.format;

import dev.mesolint.core.source.Location;
import dev.mesolint.core.source.Violation;
import dev.mesolint.core.value.Durations;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.RepTarget;
import dev.mesolint.core.value.RirRange;
import dev.mesolint.core.value.Rpe;
import dev.mesolint.core.value.Tempo;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.Pointers;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apache.commons.text.similarity.LevenshteinDistance;
import tools.jackson.databind.JsonNode;

/** Turns a schema validator error into a located message a coach can act on. */
final class SchemaMessages {
    /** Every key the programme format knows, for "did you mean" on misspelt keys. */
    private static final List<String> KNOWN_KEYS = List.of("format", "programme", "id", "title", "author", "level",
            "goal", "session-minutes", "plate-increment", "units", "athlete", "name", "one-rep-max", "constraints", "region", "max-load",
            "avoid", "reason", "exercises", "kind", "pattern", "stability", "skill", "muscles", "regions", "waive", "rule",
            "weeks", "week", "deload", "repeat", "adjust", "only", "sessions", "day", "work", "exercise", "warm-up",
            "sets", "reps", "rir", "rpe", "load", "rest", "tempo", "technique", "superset", "rounds", "items", "note");

    /** Keys that are one of several alternatives (sessions or repeat; region and max-load, or avoid). */
    private static final List<String> ALTERNATIVES = List.of("sessions", "repeat", "region", "max-load", "avoid");

    private static final Map<String, String> HINTS = Map.ofEntries(
            Map.entry("rest", Durations.HINT),
            Map.entry("reps", RepTarget.HINT),
            Map.entry("rir", RirRange.HINT),
            Map.entry("rpe", Rpe.HINT),
            Map.entry("load", Load.HINT),
            Map.entry("max-load", "write a share of 1RM, e.g. max-load: 70%"),
            Map.entry("tempo", Tempo.HINT),
            Map.entry("day", "days of the week run from 1 to 7"),
            Map.entry("week", "number weeks from 1: week: 1"),
            Map.entry("repeat", "name an earlier week by its number: repeat: 1"),
            Map.entry("deload", "write deload: true or deload: false (yes/no/on/off are not read as booleans)"),
            Map.entry("sets", "write a number of sets from 1 to 20, or a list of sets that differ"),
            Map.entry("rounds", "write how many rounds, from 1 to 20"),
            Map.entry("warm-up", "write the number of warm-up sets, e.g. warm-up: 2"),
            Map.entry("format", "write format: 1"),
            Map.entry("level", "one of: novice, intermediate, advanced"),
            Map.entry("goal", "one of: hypertrophy, strength, general-fitness"),
            Map.entry("units", "one of: kg, lb"),
            Map.entry("technique", "one of: drop-set, rest-pause"),
            Map.entry("id", "use lower-case letters, digits and hyphens, e.g. harbour-upper-lower"),
            Map.entry("exercise", "use a catalogue id: lower-case letters, digits and hyphens"),
            Map.entry("session-minutes", "write the time budget in minutes, e.g. session-minutes: 60"),
            Map.entry("reason", "say who decided and why, e.g. reason: cleared to 70% by the physiotherapist"));

    private SchemaMessages() {
    }

    static Violation describe(com.networknt.schema.Error error, LocatedDocument document) {
        String pointer = FormatSchema.pointerOf(error.getInstanceLocation());
        String keyword = String.valueOf(error.getKeyword());
        String property = error.getProperty();
        switch (keyword) {
            case "required" -> {
                if (ALTERNATIVES.contains(property) && (pointer.matches("/weeks/\\d+") || pointer.contains("/constraints/"))) {
                    Location at = located(document.valueAt(pointer), pointer);
                    return new Violation(at, anyOfMessage(pointer), anyOfHint(pointer));
                }
                Location at = located(document.valueAt(pointer), pointer);
                return new Violation(at, where(pointer) + " is missing '" + property + "'",
                        "add " + property + ":" + hint(property).map(h -> " (" + h + ")").orElse(""));
            }
            case "additionalProperties", "unevaluatedProperties" -> {
                String child = Pointers.child(pointer, property);
                Location at = located(document.keyAt(child), child);
                return new Violation(at, "unknown key '" + property + "' in " + where(pointer),
                        closestKey(property).map(k -> "did you mean '" + k + "'?").orElse(
                                "remove it, or check the format reference in docs/format.md"));
            }
            case "anyOf" -> {
                Location at = located(document.valueAt(pointer), pointer);
                return new Violation(at, anyOfMessage(pointer), anyOfHint(pointer));
            }
            default -> {
                Location at = located(document.valueAt(pointer), pointer);
                String name = Pointers.lastSegment(pointer);
                JsonNode value = error.getInstanceNode();
                String found = value == null ? "" : " (found " + shown(value) + ")";
                String problem = switch (keyword) {
                    case "type" -> "must be " + kinds(error.getSchemaNode()) + ", not " + kind(value);
                    case "pattern" -> "is not written in an accepted form";
                    default -> plain(error.getMessage());
                };
                return new Violation(at, where(pointer) + " " + problem + found,
                        hint(name).orElse("see docs/format.md for the allowed values"));
            }
        }
    }

    /** The JSON Schema type(s) a key accepts, in words an author knows from YAML. */
    private static String kinds(JsonNode type) {
        if (type == null) {
            return "another kind of value";
        }
        if (type.isArray()) {
            java.util.List<String> words = new java.util.ArrayList<>();
            type.forEach(t -> words.add(word(t.asString())));
            return String.join(" or ", words);
        }
        return word(type.asString());
    }

    private static String kind(JsonNode value) {
        if (value == null || value.isNull()) {
            return "empty";
        }
        if (value.isIntegralNumber()) {
            return "a whole number";
        }
        return value.isNumber() ? "a number" : value.isBoolean() ? "true/false" : value.isArray() ? "a list"
                : value.isObject() ? "a mapping" : "text";
    }

    private static String word(String jsonType) {
        return switch (jsonType) {
            case "string" -> "text";
            case "integer" -> "a whole number";
            case "number" -> "a number";
            case "boolean" -> "true or false";
            case "array" -> "a list";
            case "object" -> "a mapping (key: value lines)";
            default -> jsonType;
        };
    }

    private static String anyOfMessage(String pointer) {
        if (pointer.contains("/constraints/")) {
            return where(pointer) + " needs either region and max-load, or avoid";
        }
        if (pointer.matches("/weeks/\\d+")) {
            return where(pointer) + " needs sessions, or repeat of an earlier week";
        }
        return where(pointer) + " does not match any allowed form";
    }

    private static String anyOfHint(String pointer) {
        if (pointer.contains("/constraints/")) {
            return "write region: shoulder with max-load: 70%, or avoid: [exercise-id]";
        }
        return "add sessions: [...], or repeat: 1 to start from week 1";
    }

    private static Location located(Location at, String pointer) {
        return new Location(at.line(), at.column(), pointer);
    }

    private static String where(String pointer) {
        return pointer.isEmpty() ? "the document" : "'" + Pointers.readable(pointer) + "'";
    }

    private static Optional<String> hint(String property) {
        return Optional.ofNullable(HINTS.get(property));
    }

    /** Drops the validator's own location prefix ("$.a.b: " or "/a/b: "), since we show file:line:column. */
    private static String plain(String message) {
        if (message == null) {
            return "is not valid";
        }
        int colon = message.indexOf(": ");
        return (message.startsWith("$") || message.startsWith("/")) && colon > 0 ? message.substring(colon + 2) : message;
    }

    private static String shown(JsonNode value) {
        String text = value.isString() ? "'" + value.asString() + "'" : value.toString();
        return text.length() > 40 ? text.substring(0, 37) + "..." : text;
    }

    static Optional<String> closestKey(String key) {
        return KNOWN_KEYS.stream()
                .filter(k -> typoDistance(k, key) <= Math.max(1, key.length() / 3))
                .min(Comparator.comparingDouble(k -> typoDistance(k, key)));
    }

    /** Edit distance, with swapped letters ({@code sest} for {@code sets}) counted as the closest typo. */
    private static double typoDistance(String known, String written) {
        if (sortedLetters(known).equals(sortedLetters(written))) {
            return 0.5;
        }
        return LevenshteinDistance.getDefaultInstance().apply(known, written);
    }

    private static String sortedLetters(String s) {
        char[] c = s.toCharArray();
        java.util.Arrays.sort(c);
        return new String(c);
    }
}
