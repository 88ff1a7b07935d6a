package dev.mesolint.core.format;

import dev.mesolint.core.source.Location;
import dev.mesolint.core.source.Violation;
import dev.mesolint.core.value.InvalidValueException;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.Pointers;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import tools.jackson.databind.JsonNode;

/**
 * Per-file state while binding a schema-valid tree to records: locations and the value errors found so far.
 */
final class BindContext {
    private final LocatedDocument document;
    private final List<Violation> violations = new ArrayList<>();

    BindContext(LocatedDocument document) {
        this.document = document;
    }

    Location at(String pointer) {
        Location l = document.valueAt(pointer);
        return l.withPointer(pointer);
    }

    /** Where {@code parent} holds {@code key} (whose pointer is {@code pointer}); else as {@link #at(String)}. */
    Location at(JsonNode parent, String key, String pointer) {
        Location l = document.childAt(parent, key, pointer);
        return l != null ? l : at(pointer);
    }

    /** Where {@code list} holds element {@code index} (whose pointer is {@code pointer}); else as {@link #at(String)}. */
    Location at(JsonNode list, int index, String pointer) {
        Location l = document.childAt(list, index, pointer);
        return l != null ? l : at(pointer);
    }

    List<Violation> violations() {
        return List.copyOf(violations);
    }

    void reject(String pointer, InvalidValueException e) {
        violations.add(new Violation(at(pointer), Pointers.lastSegment(pointer) + ": " + e.getMessage(), e.hint()));
    }

    void reject(String pointer, String message, String hint) {
        violations.add(new Violation(at(pointer), message, hint));
    }

    /** Reads an optional value with {@code parser}; a bad value is recorded and read as absent. */
    <T> Optional<T> value(JsonNode parent, String pointer, String key, ValueParser<T> parser) {
        JsonNode node = parent.get(key);
        if (node == null || node.isNull()) {
            return Optional.empty();
        }
        String text = node.asString();
        Map<String, Object> known = ParsedValues.of(parser);
        Object value = known == null ? null : known.get(text);
        if (value == null) {
            try {
                value = parser.parse(text);
            } catch (InvalidValueException e) {
                reject(Pointers.child(pointer, key), e);
                return Optional.empty();
            }
            ParsedValues.remember(known, text, value);
        }
        @SuppressWarnings("unchecked") // remembered by this parser, which returned a T
        T typed = (T) value;
        return Optional.of(typed);
    }

    static String text(JsonNode parent, String key) {
        JsonNode node = parent.get(key);
        return node == null || node.isNull() ? null : node.asString();
    }

    /**
     * What each value parser made of a text, so that the few rests, loads and rep ranges a library repeats on every
     * set are parsed (by regular expression) once per run. The parsers are pure functions of the text and their
     * values immutable; only values are kept, never refusals. Bounded in parsers and in texts per parser. The parsers
     * (one method reference per call site) are found by reference in a short array, not hashed: a lambda's hash is
     * its identity hash, which the JIT the check runs with asks the VM for, on every value of every set.
     */
    private static final class ParsedValues {
        private static final int MAX_PARSERS = 64;
        private static final int MAX_TEXTS = 1024;

        private record Known(ValueParser<?> parser, Map<String, Object> values) {
        }

        /** Replaced whole when a parser is added, so that readers need no lock. */
        private static volatile Known[] known = new Known[0];

        private ParsedValues() {
        }

        /** The parser's remembered values; null when no more parsers are remembered (a parser made per call). */
        static Map<String, Object> of(ValueParser<?> parser) {
            for (Known k : known) {
                if (k.parser == parser) {
                    return k.values;
                }
            }
            return add(parser);
        }

        private static synchronized Map<String, Object> add(ValueParser<?> parser) {
            Known[] now = known;
            for (Known k : now) {
                if (k.parser == parser) {
                    return k.values;
                }
            }
            if (now.length >= MAX_PARSERS) {
                return null;
            }
            Map<String, Object> values = new ConcurrentHashMap<>();
            Known[] more = Arrays.copyOf(now, now.length + 1);
            more[now.length] = new Known(parser, values);
            known = more;
            return values;
        }

        static void remember(Map<String, Object> known, String text, Object value) {
            if (known != null && known.size() < MAX_TEXTS) {
                known.putIfAbsent(text, value);
            }
        }
    }

    /** A value parser that may refuse its input. */
    @FunctionalInterface
    interface ValueParser<T> {
        T parse(String text) throws InvalidValueException;
    }
}
