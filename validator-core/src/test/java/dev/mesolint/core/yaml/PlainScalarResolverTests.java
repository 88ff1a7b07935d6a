package dev.mesolint.core.yaml;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.ShrinkingMode;
import org.junit.jupiter.api.Test;
import org.yaml.snakeyaml.nodes.NodeId;
import org.yaml.snakeyaml.nodes.Tag;
import org.yaml.snakeyaml.resolver.Resolver;
import tools.jackson.databind.JsonNode;

/**
 * Plain scalars are typed without SnakeYAML's YAML 1.1 resolution, and read as they did with it: the converter
 * types a plain scalar only when YAML 1.1 too reads it as other than a string (before, a scalar that YAML 1.1 left a
 * string stayed one), so skipping the resolution changes no value.
 */
class PlainScalarResolverTests {
    private static final Resolver YAML_11 = new Resolver();
    private final LocatedYamlReader reader = new LocatedYamlReader(YamlLimits.DEFAULTS);

    @Property(tries = 3000, shrinking = ShrinkingMode.OFF, seed = "20261203")
    void everyPlainScalarTypedAsNullBooleanOrNumberIsOneYaml11DoesNotLeaveAString(@ForAll("plain") String text)
            throws YamlProblem {
        JsonNode value;
        try {
            value = reader.read("v: " + text + "\n").root().get("v");
        } catch (YamlProblem e) {
            return; // not a plain scalar on its own (a flow indicator, a comment, ...): nothing is typed
        }
        if (value != null && !value.isString() && !value.isContainer()) {
            assertNotEquals(Tag.STR, YAML_11.resolve(NodeId.scalar, text.strip(), true),
                    "typed as " + value.getNodeType() + " though YAML 1.1 leaves it a string: '" + text + "'");
        }
    }

    @Provide
    Arbitrary<String> plain() {
        Arbitrary<String> numberish = Arbitraries.strings().withChars("0123456789+-.eE_:xob ").ofMinLength(1)
                .ofMaxLength(8);
        Arbitrary<String> words = Arbitraries.of("true", "True", "TRUE", "false", "False", "FALSE", "null", "Null",
                "NULL", "~", "yes", "no", "on", "off", "tRue", "nULL", "0x1F", "0o17", "1_000", "2:30", ".inf", ".nan",
                "1e5", "1.5e-3", ".5", "5.", "+0", "-0", "007", "1e", "e5");
        return Arbitraries.oneOf(numberish, words);
    }

    @Test
    void valuesReadAsTheYaml12CoreSchemaSays() throws YamlProblem {
        JsonNode doc = reader.read("""
                a: 12
                b: -0.5
                c: true
                d: ~
                e: 2:30
                f: yes
                g: "12"
                h: !!str 12
                i: 1e5
                j:
                """).root();
        assertTrue(doc.get("a").isIntegralNumber());
        assertTrue(doc.get("b").isFloatingPointNumber() || doc.get("b").isBigDecimal());
        assertTrue(doc.get("c").isBoolean());
        assertTrue(doc.get("d").isNull());
        assertEquals("2:30", doc.get("e").asString());
        assertEquals("yes", doc.get("f").asString());
        assertEquals("12", doc.get("g").asString());
        assertEquals("12", doc.get("h").asString());
        assertEquals("1e5", doc.get("i").asString(), "as before: an exponent without a decimal point stays text");
        assertTrue(doc.get("j").isNull());
    }

    @Test
    void mergeKeysStillMerge() throws YamlProblem {
        JsonNode doc = reader.read("""
                base: &b {sets: 3, reps: 8}
                work:
                  <<: *b
                  reps: 10
                """).root();
        assertEquals(3, doc.get("work").get("sets").asInt());
        assertEquals(10, doc.get("work").get("reps").asInt());
    }
}
