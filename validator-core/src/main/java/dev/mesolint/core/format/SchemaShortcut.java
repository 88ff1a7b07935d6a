package dev.mesolint.core.format;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Pattern;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.JsonNodeFactory;

/**
 * A yes-or-don't-know reading of a JSON Schema: it answers "this document certainly satisfies the schema" or "cannot
 * tell", never "invalid". Nearly every document a team checks is valid, and for those the general validator's cost
 * (its compile at start-up, its paths and error collection on every node) buys nothing; any document this reading
 * does not pass goes to the general validator, which alone says what is wrong and where.
 *
 * <p>It is sound by construction, not by agreement: it knows a fixed set of keywords and refuses to compile a schema
 * that uses any other (so a schema change it does not understand turns it off instead of letting documents through),
 * and wherever an implementation could read a keyword two ways (a decimal written for an integer, numbers in an
 * enum, a trailing line break under a pattern, doubles against exact decimals) it says "cannot tell".
 * {@code SchemaShortcutTests} holds it to the general validator's verdicts on generated documents.
 *
 * <p>Immutable after {@link #compile} and thread-safe.
 */
final class SchemaShortcut {
    /** Keywords that never change validity (annotations), and {@code $defs}, compiled when a reference names them. */
    private static final Set<String> NOTES = Set.of("$schema", "$id", "$comment", "$defs", "title", "description",
            "examples", "default", "deprecated", "readOnly", "writeOnly");

    /** One compiled schema: true when the node certainly satisfies it. */
    @FunctionalInterface
    interface Test {
        boolean passes(JsonNode node);
    }

    private static final Test ALWAYS = node -> true;
    private static final Test NEVER = node -> false;

    private final Test root;

    private SchemaShortcut(Test root) {
        this.root = root;
    }

    /** The shortcut for {@code schema}; empty when the schema uses a keyword or form this reading does not know. */
    static Optional<SchemaShortcut> compile(JsonNode schema) {
        try {
            return Optional.of(new SchemaShortcut(new Compiler(schema).compile(schema, true)));
        } catch (UnknownForm e) {
            return Optional.empty();
        }
    }

    /** What keeps {@code schema} from compiling to a shortcut; null when it compiles. */
    static String unknownFormIn(JsonNode schema) {
        try {
            new Compiler(schema).compile(schema, true);
            return null;
        } catch (UnknownForm e) {
            return e.getMessage();
        }
    }

    /** True only when {@code document} certainly satisfies the schema; false means "ask the general validator". */
    boolean certainlyValid(JsonNode document) {
        return root.passes(document);
    }

    /** A keyword or form outside what this reading knows: the whole shortcut is turned off. */
    private static final class UnknownForm extends Exception {
        private static final long serialVersionUID = 1L;

        UnknownForm(String what) {
            super(what, null, false, false);
        }
    }

    /** Compiles one schema document; references are compiled once each and may be recursive. */
    private static final class Compiler {
        private final JsonNode document;
        private final Map<String, Test[]> references = new HashMap<>();

        Compiler(JsonNode document) {
            this.document = document;
        }

        Test compile(JsonNode schema, boolean isRoot) throws UnknownForm {
            if (schema.isBoolean()) {
                return schema.booleanValue() ? ALWAYS : NEVER;
            }
            if (!schema.isObject()) {
                throw new UnknownForm("a schema that is neither an object nor a boolean");
            }
            if (!isRoot && schema.has("$id")) {
                throw new UnknownForm("$id below the root changes where references resolve");
            }
            List<Test> tests = new ArrayList<>();
            Iterator<String> names = schema.propertyNames().iterator();
            while (names.hasNext()) {
                String keyword = names.next();
                if (!NOTES.contains(keyword)) {
                    Test test = keyword(keyword, schema.get(keyword), schema);
                    if (test != null) {
                        tests.add(test);
                    }
                }
            }
            return all(tests);
        }

        /** The test of one keyword; null when the keyword is read together with another (then, else, items' kin). */
        private Test keyword(String keyword, JsonNode value, JsonNode schema) throws UnknownForm {
            switch (keyword) {
                case "type":
                    return Types.of(value);
                case "enum":
                    return Constants.oneOf(value);
                case "const":
                    return Constants.oneOf(JsonNodeFactory.instance.arrayNode().add(value));
                case "properties":
                    return properties(value, schema.get("additionalProperties"));
                case "additionalProperties":
                    return schema.has("properties") ? null : properties(JsonNodeFactory.instance.objectNode(), value);
                case "required":
                    return required(value);
                case "propertyNames":
                    return propertyNames(compile(value, false));
                case "minProperties":
                    return count(value, true, true);
                case "maxProperties":
                    return count(value, true, false);
                case "items":
                    return items(value);
                case "minItems":
                    return count(value, false, true);
                case "maxItems":
                    return count(value, false, false);
                case "uniqueItems":
                    return Constants.uniqueItems(value);
                case "minimum", "maximum", "exclusiveMinimum", "exclusiveMaximum":
                    return Numbers.bound(keyword, value);
                case "multipleOf":
                    return Numbers.multipleOf(value);
                case "minLength":
                    return Texts.length(value, true);
                case "maxLength":
                    return Texts.length(value, false);
                case "pattern":
                    return Texts.pattern(value);
                case "if":
                    return condition(value, schema.get("then"), schema.get("else"));
                case "then", "else":
                    return schema.has("if") ? null : ALWAYS; // without "if" they are ignored
                case "anyOf":
                    return anyOf(value);
                case "allOf":
                    return allOf(value);
                case "not":
                    // "certainly not valid" is a claim this reading never makes, so it cannot say "not" holds
                    throw new UnknownForm("not");
                case "$ref":
                    return reference(value);
                default:
                    throw new UnknownForm("the keyword " + keyword);
            }
        }

        private Test properties(JsonNode properties, JsonNode additional) throws UnknownForm {
            if (!properties.isObject()) {
                throw new UnknownForm("properties that are not an object");
            }
            Map<String, Test> named = new HashMap<>();
            Iterator<String> names = properties.propertyNames().iterator();
            while (names.hasNext()) {
                String name = names.next();
                // the JVM's instance, the one a document's keys are read as (KeyNames): found by reference
                named.put(name.intern(), compile(properties.get(name), false));
            }
            Test others = additional == null ? ALWAYS : compile(additional, false);
            return node -> {
                if (!node.isObject()) {
                    return true;
                }
                Iterator<Map.Entry<String, JsonNode>> fields = node.properties().iterator();
                while (fields.hasNext()) {
                    Map.Entry<String, JsonNode> field = fields.next();
                    Test test = named.get(field.getKey());
                    if (!(test == null ? others : test).passes(field.getValue())) {
                        return false;
                    }
                }
                return true;
            };
        }

        private static Test required(JsonNode names) throws UnknownForm {
            List<String> required = texts(names, "required").stream().map(String::intern).toList();
            return node -> {
                if (!node.isObject()) {
                    return true;
                }
                for (String name : required) {
                    if (!node.has(name)) {
                        return false;
                    }
                }
                return true;
            };
        }

        /** The texts of {@code values}, a list of text only; {@code what} names the keyword for the refusal. */
        static List<String> texts(JsonNode values, String what) throws UnknownForm {
            if (!values.isArray()) {
                throw new UnknownForm(what + " that is not a list");
            }
            List<String> texts = new ArrayList<>();
            for (JsonNode value : values) {
                if (!value.isString()) {
                    throw new UnknownForm(what + " with an entry that is not text");
                }
                texts.add(value.stringValue());
            }
            return texts;
        }

        private static Test propertyNames(Test names) {
            return node -> {
                if (!node.isObject()) {
                    return true;
                }
                Iterator<String> keys = node.propertyNames().iterator();
                while (keys.hasNext()) {
                    if (!names.passes(JsonNodeFactory.instance.stringNode(keys.next()))) {
                        return false;
                    }
                }
                return true;
            };
        }

        private static Test count(JsonNode bound, boolean ofObjects, boolean atLeast) throws UnknownForm {
            if (!bound.isIntegralNumber() || !bound.canConvertToInt() || bound.intValue() < 0) {
                throw new UnknownForm("a count that is not a whole number");
            }
            int limit = bound.intValue();
            return node -> {
                if (ofObjects ? !node.isObject() : !node.isArray()) {
                    return true;
                }
                return atLeast ? node.size() >= limit : node.size() <= limit;
            };
        }

        private Test items(JsonNode value) throws UnknownForm {
            Test each = compile(value, false);
            return node -> {
                if (!node.isArray()) {
                    return true;
                }
                for (int i = 0; i < node.size(); i++) {
                    if (!each.passes(node.get(i))) {
                        return false;
                    }
                }
                return true;
            };
        }

        private Test condition(JsonNode ifSchema, JsonNode thenSchema, JsonNode elseSchema) throws UnknownForm {
            // "if" decides which branch applies, so its answer must be certain both ways: only a test that never
            // says "cannot tell" may stand there.
            Test test = Conditions.decisive(ifSchema);
            Test then = thenSchema == null ? ALWAYS : compile(thenSchema, false);
            Test otherwise = elseSchema == null ? ALWAYS : compile(elseSchema, false);
            return node -> test.passes(node) ? then.passes(node) : otherwise.passes(node);
        }

        private Test anyOf(JsonNode schemas) throws UnknownForm {
            return any(list(schemas));
        }

        private Test allOf(JsonNode schemas) throws UnknownForm {
            return all(list(schemas));
        }

        private List<Test> list(JsonNode schemas) throws UnknownForm {
            if (!schemas.isArray() || schemas.isEmpty()) {
                throw new UnknownForm("a list of schemas that is empty or not a list");
            }
            List<Test> tests = new ArrayList<>();
            for (JsonNode schema : schemas) {
                tests.add(compile(schema, false));
            }
            return tests;
        }

        private Test reference(JsonNode value) throws UnknownForm {
            if (!value.isString() || !value.stringValue().startsWith("#/")) {
                throw new UnknownForm("a reference outside this schema document");
            }
            String pointer = value.stringValue().substring(1);
            Test[] slot = references.get(pointer);
            if (slot == null) {
                slot = new Test[1];
                references.put(pointer, slot); // before compiling, so a recursive reference finds it
                JsonNode target = document.at(pointer);
                if (target.isMissingNode()) {
                    throw new UnknownForm("a reference to nothing: " + pointer);
                }
                slot[0] = compile(target, false);
            }
            Test[] resolved = slot;
            return node -> resolved[0].passes(node);
        }

        private static Test any(List<Test> options) {
            Test[] array = options.toArray(Test[]::new);
            return node -> {
                for (Test option : array) {
                    if (option.passes(node)) {
                        return true;
                    }
                }
                return false;
            };
        }

        private static Test all(List<Test> tests) {
            if (tests.isEmpty()) {
                return ALWAYS;
            }
            if (tests.size() == 1) {
                return tests.get(0);
            }
            Test[] array = tests.toArray(Test[]::new);
            return node -> {
                for (Test test : array) {
                    if (!test.passes(node)) {
                        return false;
                    }
                }
                return true;
            };
        }
    }

    /** The "type" keyword. */
    private static final class Types {
        private Types() {
        }

        static Test of(JsonNode value) throws UnknownForm {
            if (value.isString()) {
                return one(value.stringValue());
            }
            if (!value.isArray()) {
                throw new UnknownForm("a type that is neither a name nor a list");
            }
            List<Test> options = new ArrayList<>();
            for (JsonNode name : value) {
                if (!name.isString()) {
                    throw new UnknownForm("a type name that is not text");
                }
                options.add(one(name.stringValue()));
            }
            return Compiler.any(options);
        }

        private static Test one(String name) throws UnknownForm {
            switch (name) {
                case "object":
                    return JsonNode::isObject;
                case "array":
                    return JsonNode::isArray;
                case "string":
                    return JsonNode::isString;
                case "boolean":
                    return JsonNode::isBoolean;
                case "null":
                    return JsonNode::isNull;
                case "number":
                    return JsonNode::isNumber;
                case "integer":
                    // 2.0 is an integer to some validators and not to others: only a written whole number is certain
                    return JsonNode::isIntegralNumber;
                default:
                    throw new UnknownForm("the type " + name);
            }
        }
    }

    /** "enum", "const" and "uniqueItems": equality, where implementations differ on numbers. */
    private static final class Constants {
        private Constants() {
        }

        static Test oneOf(JsonNode values) throws UnknownForm {
            if (!values.isArray()) {
                throw new UnknownForm("an enum that is not a list");
            }
            Set<String> texts = new HashSet<>();
            List<JsonNode> numbers = new ArrayList<>();
            List<JsonNode> others = new ArrayList<>();
            for (JsonNode value : values) {
                if (value.isString()) {
                    texts.add(value.stringValue());
                } else if (value.isNumber()) {
                    numbers.add(value);
                } else if (value.isBoolean() || value.isNull()) {
                    others.add(value);
                } else {
                    throw new UnknownForm("an enum of lists or objects");
                }
            }
            return node -> {
                if (node.isString()) {
                    return texts.contains(node.stringValue());
                }
                if (node.isNumber()) {
                    for (JsonNode number : numbers) {
                        if (sameNumber(node, number)) {
                            return true;
                        }
                    }
                    return false;
                }
                return others.contains(node);
            };
        }

        /**
         * Equal values written the same way: 0.5 and 0.50, or 1 and 1. A whole number against a decimal (1 and 1.0)
         * is equal by the standard but not to every validator, so it is not certain.
         */
        private static boolean sameNumber(JsonNode a, JsonNode b) {
            return a.isIntegralNumber() == b.isIntegralNumber() && a.decimalValue().compareTo(b.decimalValue()) == 0
                    && a.doubleValue() == b.doubleValue();
        }

        static Test uniqueItems(JsonNode value) throws UnknownForm {
            if (!value.isBoolean()) {
                throw new UnknownForm("uniqueItems that is not true or false");
            }
            if (!value.booleanValue()) {
                return ALWAYS;
            }
            return node -> {
                if (!node.isArray()) {
                    return true;
                }
                Set<String> seen = new HashSet<>();
                for (JsonNode item : node) {
                    // numbers (1 and 1.0), lists and objects compare differently from one validator to the next
                    if (!item.isString() || !seen.add(item.stringValue())) {
                        return false;
                    }
                }
                return true;
            };
        }
    }

    /**
     * Number bounds, held both exactly and as doubles: certain only where both readings agree. A whole number within
     * 2^53 (nearly every number a programme holds: sets, reps, RIR) is a double exactly, so against a bound that is
     * a double exactly both readings are one double comparison, and its multiple of a divisor p/q (in lowest terms)
     * is exact when p divides it; the decimal arithmetic is kept for the other numbers.
     */
    static final class Numbers {
        /** The largest magnitude up to which every whole number is a double exactly. */
        private static final long EXACT_IN_DOUBLE = 1L << 53;

        private Numbers() {
        }

        /** A whole number held as an int or a long, of at most 2^53 either way. */
        static boolean smallWhole(JsonNode node) {
            return (node.isInt() || node.isLong()) && Math.abs(node.longValue()) <= EXACT_IN_DOUBLE;
        }

        static Test bound(String keyword, JsonNode value) throws UnknownForm {
            if (!value.isNumber()) {
                throw new UnknownForm(keyword + " that is not a number");
            }
            BigDecimal exact = value.decimalValue();
            double approximate = value.doubleValue();
            boolean boundIsDouble = Double.isFinite(approximate) && exact.compareTo(new BigDecimal(approximate)) == 0;
            Side side = switch (keyword) {
                case "minimum" -> Side.AT_LEAST;
                case "maximum" -> Side.AT_MOST;
                case "exclusiveMinimum" -> Side.ABOVE;
                default -> Side.BELOW;
            };
            return node -> !node.isNumber() || (boundIsDouble && smallWhole(node)
                    ? side.holds(node.longValue(), approximate)
                    : side.holds(node.decimalValue().compareTo(exact)) && side.holds(node.doubleValue(), approximate));
        }

        /** Which side of its bound a number must be on. */
        private enum Side {
            AT_LEAST, AT_MOST, ABOVE, BELOW;

            /** For {@code order}, the sign of comparing the number with the bound. */
            boolean holds(int order) {
                return switch (this) {
                    case AT_LEAST -> order >= 0;
                    case AT_MOST -> order <= 0;
                    case ABOVE -> order > 0;
                    case BELOW -> order < 0;
                };
            }

            /** As doubles: the operators, so that -0.0 and 0.0 are one number, as the reading has always had it. */
            boolean holds(double value, double bound) {
                return switch (this) {
                    case AT_LEAST -> value >= bound;
                    case AT_MOST -> value <= bound;
                    case ABOVE -> value > bound;
                    case BELOW -> value < bound;
                };
            }
        }

        static Test multipleOf(JsonNode value) throws UnknownForm {
            if (!value.isNumber() || value.decimalValue().signum() <= 0) {
                throw new UnknownForm("multipleOf that is not a positive number");
            }
            BigDecimal exact = value.decimalValue();
            double approximate = value.doubleValue();
            long numerator = numeratorInLowestTerms(exact);
            return node -> {
                if (!node.isNumber()) {
                    return true;
                }
                boolean exactlyAMultiple = numerator > 0 && smallWhole(node) ? node.longValue() % numerator == 0
                        : node.decimalValue().remainder(exact).signum() == 0;
                if (!exactlyAMultiple) {
                    return false;
                }
                double quotient = node.doubleValue() / approximate;
                return !Double.isInfinite(quotient) && quotient == Math.rint(quotient);
            };
        }

        /** p of {@code positive} = p/q in lowest terms; 0 when p or q does not fit a long. */
        static long numeratorInLowestTerms(BigDecimal positive) {
            BigDecimal d = positive.stripTrailingZeros();
            if (d.scale() <= 0) {
                BigDecimal whole = d.setScale(0);
                return whole.unscaledValue().bitLength() < 64 ? whole.longValueExact() : 0;
            }
            if (d.scale() > 18 || d.unscaledValue().bitLength() >= 64) {
                return 0;
            }
            long unscaled = d.unscaledValue().longValueExact();
            long denominator = BigDecimal.TEN.pow(d.scale()).longValueExact();
            return unscaled / gcd(unscaled, denominator);
        }

        private static long gcd(long a, long b) {
            while (b != 0) {
                long t = a % b;
                a = b;
                b = t;
            }
            return a;
        }
    }

    /** String lengths and patterns. */
    private static final class Texts {
        /**
         * Texts a pattern is known to match, per pattern: programmes repeat the same few rests, loads and rep ranges
         * on every set, and a set lookup costs a fraction of a regular-expression match. Bounded, so odd input cannot
         * grow it.
         */
        private static final int REMEMBERED_MATCHES = 512;

        private Texts() {
        }

        static Test length(JsonNode value, boolean atLeast) throws UnknownForm {
            if (!value.isIntegralNumber() || !value.canConvertToInt() || value.intValue() < 0) {
                throw new UnknownForm("a length that is not a whole number");
            }
            int limit = value.intValue();
            return node -> {
                if (!node.isString()) {
                    return true;
                }
                String text = node.stringValue();
                // the standard counts code points; some validators count chars: certain when both agree
                int chars = text.length();
                int points = text.codePointCount(0, chars);
                return atLeast ? points >= limit && chars >= limit : points <= limit && chars <= limit;
            };
        }

        static Test pattern(JsonNode value) throws UnknownForm {
            if (!value.isString()) {
                throw new UnknownForm("a pattern that is not text");
            }
            Pattern pattern;
            try {
                pattern = Pattern.compile(value.stringValue());
            } catch (RuntimeException e) {
                throw new UnknownForm("a pattern Java does not read");
            }
            Set<String> matched = ConcurrentHashMap.newKeySet();
            return node -> {
                if (!node.isString()) {
                    return true;
                }
                String text = node.stringValue();
                if (matched.contains(text)) {
                    return true;
                }
                // Java's '$' also matches before a final line break and ECMA 262's does not: such text is not certain
                if (endsWithLineBreak(text) || !pattern.matcher(text).find()) {
                    return false;
                }
                if (matched.size() < REMEMBERED_MATCHES) {
                    matched.add(text);
                }
                return true;
            };
        }

        private static boolean endsWithLineBreak(String text) {
            if (text.isEmpty()) {
                return false;
            }
            char last = text.charAt(text.length() - 1);
            return last == '\n' || last == '\r' || last == '\u0085' || last == '\u2028' || last == '\u2029';
        }
    }

    /**
     * The schemas that may stand under "if": those whose every test is decisive (true means valid and false means
     * invalid), that is a "properties" of "const"/"enum" of text, "required", and "type". Anything else turns the
     * shortcut off.
     */
    private static final class Conditions {
        private Conditions() {
        }

        static Test decisive(JsonNode schema) throws UnknownForm {
            if (!schema.isObject()) {
                throw new UnknownForm("an if that is not an object");
            }
            List<Test> tests = new ArrayList<>();
            Iterator<String> names = schema.propertyNames().iterator();
            while (names.hasNext()) {
                String keyword = names.next();
                JsonNode value = schema.get(keyword);
                switch (keyword) {
                    case "title", "description", "$comment":
                        break;
                    case "required":
                        tests.add(Compiler.required(value));
                        break;
                    case "type":
                        tests.add(decisiveType(value));
                        break;
                    case "properties":
                        tests.add(decisiveProperties(value));
                        break;
                    default:
                        throw new UnknownForm("the keyword " + keyword + " under if");
                }
            }
            return Compiler.all(tests);
        }

        private static Test decisiveType(JsonNode value) throws UnknownForm {
            if (!value.isString() || value.stringValue().equals("integer") || value.stringValue().equals("number")) {
                throw new UnknownForm("a number type under if"); // 2.0 is read two ways
            }
            return Types.one(value.stringValue());
        }

        private static Test decisiveProperties(JsonNode properties) throws UnknownForm {
            if (!properties.isObject()) {
                throw new UnknownForm("properties that are not an object");
            }
            Map<String, Test> named = new HashMap<>();
            Iterator<String> names = properties.propertyNames().iterator();
            while (names.hasNext()) {
                String name = names.next();
                named.put(name.intern(), decisiveValue(properties.get(name)));
            }
            return node -> {
                if (!node.isObject()) {
                    return true;
                }
                for (Map.Entry<String, Test> entry : named.entrySet()) {
                    JsonNode value = node.get(entry.getKey());
                    if (value != null && !entry.getValue().passes(value)) {
                        return false;
                    }
                }
                return true;
            };
        }

        /** A property's schema under "if": "const" or "enum" of text, with any "type" of text. */
        private static Test decisiveValue(JsonNode schema) throws UnknownForm {
            if (!schema.isObject()) {
                throw new UnknownForm("a property schema under if that is not an object");
            }
            Set<String> allowed = null;
            Iterator<String> names = schema.propertyNames().iterator();
            while (names.hasNext()) {
                String keyword = names.next();
                JsonNode value = schema.get(keyword);
                switch (keyword) {
                    case "description", "title":
                        break;
                    case "type":
                        if (!value.isString() || !value.stringValue().equals("string")) {
                            throw new UnknownForm("a non-text type under if");
                        }
                        break;
                    case "const":
                        allowed = texts(JsonNodeFactory.instance.arrayNode().add(value));
                        break;
                    case "enum":
                        allowed = texts(value);
                        break;
                    default:
                        throw new UnknownForm("the keyword " + keyword + " in a property under if");
                }
            }
            if (allowed == null) {
                throw new UnknownForm("a property under if with no const or enum");
            }
            Set<String> values = allowed;
            return node -> node.isString() && values.contains(node.stringValue());
        }

        private static Set<String> texts(JsonNode values) throws UnknownForm {
            return new HashSet<>(Compiler.texts(values, "an enum under if"));
        }
    }
}
