package dev.mesolint.core.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlLimits;
import dev.mesolint.core.yaml.YamlProblem;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import java.util.stream.Stream;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * The schema shortcut may only ever pass what networknt, the general validator, passes: held to networknt's own
 * verdicts on the rule fixtures and on documents made from them by random edits (type changes, boundary numbers,
 * near-miss text, dropped and unknown keys, duplicated and emptied lists). It must also pass every document of the
 * bundled kind that networknt passes, or it would save nothing.
 */
class SchemaShortcutTests {
    private static final LocatedYamlReader READER = new LocatedYamlReader(YamlLimits.DEFAULTS);
    private static final JsonNodeFactory JSON = JsonNodeFactory.instance;
    private static final FormatSchema PROGRAMME = FormatSchema.load(FormatSchema.PROGRAMME);
    private static final FormatSchema CATALOGUE = FormatSchema.load(FormatSchema.CATALOGUE);
    private static final List<JsonNode> FIXTURES = fixtures();
    private static final JsonNode BUILT_IN_CATALOGUE = read(resource("/dev/mesolint/catalogue/exercises.yaml"));

    /** Values chosen to sit on and beside the schema's bounds, patterns and types. */
    private static final List<JsonNode> VALUES = List.of(JSON.stringNode(""), JSON.stringNode("3min"),
            JSON.stringNode("2:30"), JSON.stringNode("2:75"), JSON.stringNode("90s"), JSON.stringNode("8-12"),
            JSON.stringNode("5+"), JSON.stringNode("amrap"), JSON.stringNode("AMRAP"), JSON.stringNode("80%"),
            JSON.stringNode("100kg"), JSON.stringNode("225 lb"), JSON.stringNode("400m"), JSON.stringNode("3min\n"),
            JSON.stringNode("8-12\n"), JSON.stringNode("hypertrophy"), JSON.stringNode("strength"),
            JSON.stringNode("back-squat"), JSON.stringNode("Back Squat"), JSON.stringNode("quads"),
            JSON.stringNode("x".repeat(300)), JSON.stringNode("\uD83C\uDFCB"), JSON.numberNode(0L),
            JSON.numberNode(1L), JSON.numberNode(-1L), JSON.numberNode(3L), JSON.numberNode(5L), JSON.numberNode(10L),
            JSON.numberNode(11L), JSON.numberNode(104L), JSON.numberNode(105L), JSON.numberNode(300L),
            JSON.numberNode(999_999_999L), JSON.numberNode(new BigDecimal("0.5")),
            JSON.numberNode(new BigDecimal("2.0")), JSON.numberNode(new BigDecimal("7.5")),
            JSON.numberNode(new BigDecimal("7.25")), JSON.numberNode(new BigDecimal("10.0")),
            JSON.numberNode(new BigDecimal("1E-400")), JSON.numberNode(new BigDecimal("-0.5")), JSON.booleanNode(true),
            JSON.booleanNode(false), JSON.nullNode());

    @Test
    void bothShippedSchemasCompileToAShortcut() {
        for (String name : List.of(FormatSchema.PROGRAMME, FormatSchema.CATALOGUE)) {
            assertEquals(null, SchemaShortcut.unknownFormIn(read(resource("/dev/mesolint/schema/" + name))), name);
        }
    }

    @Test
    void everyFixtureNetworkntPassesIsPassedByTheShortcutAndNoOther() {
        int valid = 0;
        for (JsonNode fixture : FIXTURES) {
            boolean general = PROGRAMME.validByGeneral(fixture);
            assertEquals(general, PROGRAMME.passedByShortcut(fixture), fixture::toString);
            valid += general ? 1 : 0;
        }
        assertTrue(valid >= 60, "most rule fixtures are valid programmes: " + valid + " of " + FIXTURES.size());
        assertTrue(CATALOGUE.validByGeneral(BUILT_IN_CATALOGUE));
        assertTrue(CATALOGUE.passedByShortcut(BUILT_IN_CATALOGUE));
    }

    @Property(tries = 1500)
    void anEditedProgrammeIsPassedOnlyWhenNetworkntPassesIt(@ForAll long seed) {
        Random random = new Random(seed);
        JsonNode document = edited(FIXTURES.get(random.nextInt(FIXTURES.size())), random);
        if (PROGRAMME.passedByShortcut(document)) {
            assertTrue(PROGRAMME.validByGeneral(document), document::toString);
        }
    }

    @Property(tries = 300)
    void anEditedCatalogueIsPassedOnlyWhenNetworkntPassesIt(@ForAll long seed) {
        Random random = new Random(seed);
        JsonNode document = edited(BUILT_IN_CATALOGUE, random);
        if (CATALOGUE.passedByShortcut(document)) {
            assertTrue(CATALOGUE.validByGeneral(document), document::toString);
        }
    }

    @Test
    void editsThatKeepAProgrammeValidAreStillMostlyPassed() {
        // Usefulness, over a fixed sample: of the edited documents networknt accepts, the shortcut passes most.
        Random random = new Random(20261204L);
        int valid = 0;
        int passed = 0;
        for (int i = 0; i < 3000; i++) {
            JsonNode document = edited(FIXTURES.get(random.nextInt(FIXTURES.size())), random);
            if (PROGRAMME.validByGeneral(document)) {
                valid++;
                passed += PROGRAMME.passedByShortcut(document) ? 1 : 0;
            }
        }
        assertTrue(valid > 150, "valid edits: " + valid);
        assertTrue(passed >= valid * 9 / 10, passed + " of " + valid + " valid edits passed");
    }

    @Test
    void valuesValidatorsReadTwoWaysAreNeverPassed() {
        // 2.0 for an integer, a line break after a pattern's '$', and 1 beside 1.0 in a unique list are valid to
        // some validators and not to others (JSON Schema 2020-12, sections 6.1 and 6.4.3; ECMA 262 on '$').
        SchemaShortcut integer = shortcut("{\"type\": \"integer\"}");
        assertTrue(integer.certainlyValid(JSON.numberNode(2L)));
        assertFalse(integer.certainlyValid(JSON.numberNode(new BigDecimal("2.0"))));
        SchemaShortcut pattern = shortcut("{\"type\": \"string\", \"pattern\": \"^\\\\d+s$\"}");
        assertTrue(pattern.certainlyValid(JSON.stringNode("90s")));
        assertFalse(pattern.certainlyValid(JSON.stringNode("90s\n")));
        SchemaShortcut unique = shortcut("{\"uniqueItems\": true}");
        assertTrue(unique.certainlyValid(JSON.arrayNode().add("a").add("b")));
        assertFalse(unique.certainlyValid(JSON.arrayNode().add("a").add("a")));
        assertFalse(unique.certainlyValid(JSON.arrayNode().add(1L).add(JSON.numberNode(new BigDecimal("1.0")))));
        SchemaShortcut one = shortcut("{\"const\": 1}");
        assertTrue(one.certainlyValid(JSON.numberNode(1L)));
        assertFalse(one.certainlyValid(JSON.numberNode(new BigDecimal("1.0"))));
        SchemaShortcut positive = shortcut("{\"exclusiveMinimum\": 0}");
        assertFalse(positive.certainlyValid(JSON.numberNode(new BigDecimal("1E-400"))), "rounds to 0 as a double");
    }

    /** Bounds and divisors as a schema may write them: whole, halves, tenths, thirds, huge and tiny. */
    private static final List<String> LIMITS = List.of("0", "-19", "3", "10", "0.5", "2.5", "0.1", "0.3333",
            "7", "1E+20", "9007199254740993", "1E-400", "0.25", "12.5");

    @Property(tries = 3000)
    void aWholeNumberIsReadByItsFastPathAsTheDecimalReadingReadsIt(@ForAll long seed) throws Exception {
        // The reference is the exact reading and the double reading, both required (the class comment): the fast
        // path for whole numbers within 2^53 must give the same verdict for every bound and divisor.
        Random random = new Random(seed);
        long magnitude = switch (random.nextInt(4)) {
            case 0 -> random.nextInt(41) - 20;
            case 1 -> random.nextInt(2_001) - 1_000;
            case 2 -> (1L << 53) - random.nextInt(5);
            default -> random.nextLong() >> random.nextInt(64);
        };
        JsonNode number = random.nextBoolean() && magnitude == (int) magnitude ? JSON.numberNode((int) magnitude)
                : JSON.numberNode(magnitude);
        BigDecimal exactValue = BigDecimal.valueOf(magnitude);
        double doubleValue = number.doubleValue();
        String limitText = LIMITS.get(random.nextInt(LIMITS.size()));
        JsonNode limit = JSON.numberNode(new BigDecimal(limitText));
        BigDecimal exact = limit.decimalValue();
        double approximate = limit.doubleValue();
        int order = exactValue.compareTo(exact);
        assertEquals(order >= 0 && doubleValue >= approximate,
                SchemaShortcut.Numbers.bound("minimum", limit).passes(number), magnitude + " minimum " + limitText);
        assertEquals(order <= 0 && doubleValue <= approximate,
                SchemaShortcut.Numbers.bound("maximum", limit).passes(number), magnitude + " maximum " + limitText);
        assertEquals(order > 0 && doubleValue > approximate,
                SchemaShortcut.Numbers.bound("exclusiveMinimum", limit).passes(number), magnitude + " > " + limitText);
        assertEquals(order < 0 && doubleValue < approximate,
                SchemaShortcut.Numbers.bound("exclusiveMaximum", limit).passes(number), magnitude + " < " + limitText);
        if (exact.signum() > 0) {
            double quotient = doubleValue / approximate;
            boolean multiple = exactValue.remainder(exact).signum() == 0 && !Double.isInfinite(quotient)
                    && quotient == Math.rint(quotient);
            assertEquals(multiple, SchemaShortcut.Numbers.multipleOf(limit).passes(number),
                    magnitude + " multipleOf " + limitText);
        }
    }

    @Test
    void aDivisorsNumeratorInLowestTermsIsExact() {
        // 0.5 = 1/2, 2.5 = 5/2, 0.25 = 1/4, 12.5 = 25/2, 0.3333 = 3333/10000, 3 = 3/1; arithmetic (common practice)
        assertEquals(1, SchemaShortcut.Numbers.numeratorInLowestTerms(new BigDecimal("0.5")));
        assertEquals(5, SchemaShortcut.Numbers.numeratorInLowestTerms(new BigDecimal("2.5")));
        assertEquals(1, SchemaShortcut.Numbers.numeratorInLowestTerms(new BigDecimal("0.25")));
        assertEquals(25, SchemaShortcut.Numbers.numeratorInLowestTerms(new BigDecimal("12.50")));
        assertEquals(3333, SchemaShortcut.Numbers.numeratorInLowestTerms(new BigDecimal("0.3333")));
        assertEquals(3, SchemaShortcut.Numbers.numeratorInLowestTerms(new BigDecimal("3")));
        assertEquals(300, SchemaShortcut.Numbers.numeratorInLowestTerms(new BigDecimal("3E+2")));
        assertEquals(0, SchemaShortcut.Numbers.numeratorInLowestTerms(new BigDecimal("1E+30")), "too large: no path");
        assertEquals(0, SchemaShortcut.Numbers.numeratorInLowestTerms(new BigDecimal("1E-30")), "too fine: no path");
    }

    @Test
    void aSchemaWithAFormItDoesNotKnowTurnsTheShortcutOff() {
        assertEquals(Optional.empty(),
                SchemaShortcut.compile(read("{\"type\": \"object\", \"dependentRequired\": {}}")));
        assertEquals(Optional.empty(), SchemaShortcut.compile(read("{\"not\": {\"type\": \"string\"}}")));
        assertEquals(Optional.empty(), SchemaShortcut.compile(read("{\"$ref\": \"other.json#/x\"}")));
        assertEquals(Optional.empty(), SchemaShortcut.compile(read("{\"enum\": [[1], 2]}")));
        assertEquals(Optional.empty(),
                SchemaShortcut.compile(read("{\"if\": {\"minimum\": 3}, \"then\": {\"type\": \"integer\"}}")));
    }

    private static SchemaShortcut shortcut(String schema) {
        return SchemaShortcut.compile(read(schema)).orElseThrow();
    }

    /** A copy of {@code base} with one to three random edits. */
    private static JsonNode edited(JsonNode base, Random random) {
        JsonNode copy = base.deepCopy();
        int edits = 1 + random.nextInt(3);
        for (int i = 0; i < edits; i++) {
            edit(copy, random);
        }
        return copy;
    }

    private static void edit(JsonNode root, Random random) {
        List<JsonNode> containers = new ArrayList<>();
        collect(root, containers);
        JsonNode target = containers.get(random.nextInt(containers.size()));
        if (target instanceof ObjectNode object && !object.isEmpty()) {
            List<String> names = new ArrayList<>(object.propertyNames());
            String name = names.get(random.nextInt(names.size()));
            switch (random.nextInt(6)) {
                case 0 -> object.remove(name);
                case 1 -> object.set("surprise-key", value(random));
                case 2 -> object.set(name, JSON.arrayNode().add(value(random)));
                default -> object.set(name, value(random));
            }
        } else if (target instanceof ArrayNode array && !array.isEmpty()) {
            int index = random.nextInt(array.size());
            switch (random.nextInt(5)) {
                case 0 -> array.remove(index);
                case 1 -> array.add(array.get(index).deepCopy());
                case 2 -> array.removeAll();
                default -> array.set(index, value(random));
            }
        }
    }

    private static JsonNode value(Random random) {
        return VALUES.get(random.nextInt(VALUES.size()));
    }

    private static void collect(JsonNode node, List<JsonNode> into) {
        if (node.isContainer()) {
            into.add(node);
            for (JsonNode child : node) {
                collect(child, into);
            }
        }
    }

    private static List<JsonNode> fixtures() {
        try {
            Path root = Path.of(SchemaShortcutTests.class.getResource("/fixtures").toURI());
            try (Stream<Path> files = Files.walk(root)) {
                List<JsonNode> out = new ArrayList<>();
                for (Path file : files.filter(f -> f.toString().endsWith(".yaml")).sorted().toList()) {
                    try {
                        out.add(READER.read(file).root());
                    } catch (YamlProblem notYaml) {
                        // the YAML-syntax fixtures are not documents at all
                    }
                }
                return out;
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    private static String resource(String name) {
        try (InputStream in = SchemaShortcutTests.class.getResourceAsStream(name)) {
            return new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static JsonNode read(String text) {
        try {
            return READER.read(text).root();
        } catch (YamlProblem e) {
            throw new IllegalStateException(e.getMessage(), e);
        }
    }
}
