package dev.mesolint.core.yaml;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import tools.jackson.databind.JsonNode;

/**
 * The one-pass road must build exactly what the composer's road builds, or stay out: checked against the composer's
 * road itself (SnakeYAML's composer and {@link NodeConverter}) on every rule fixture, every sample programme, the
 * built-in catalogue and thousands of random documents, node by node: the same JSON values and node types, the same
 * keys in the same order, and the same line and column for every key and value.
 */
class DirectTreeBuilderTests {
    private static final LocatedYamlReader READER = new LocatedYamlReader(YamlLimits.DEFAULTS);

    @Test
    void everyFixtureSampleAndTheCatalogueIsBuiltAsTheComposerBuildsIt() throws IOException {
        int direct = 0;
        int documents = 0;
        for (Path file : documents()) {
            documents++;
            if (agree(Files.readString(file, StandardCharsets.UTF_8))) {
                direct++;
            }
        }
        try (InputStream in = getClass().getResourceAsStream("/dev/mesolint/catalogue/exercises.yaml")) {
            assertTrue(agree(new String(in.readAllBytes(), StandardCharsets.UTF_8)), "the built-in catalogue");
        }
        assertTrue(documents > 100, "fixtures and samples found: " + documents);
        // Only the fixtures written to break the reader (syntax, aliases, tags) take the composer's road.
        assertTrue(direct >= documents - 10, direct + " of " + documents + " built in one pass");
    }

    @Test
    void everySoundAndExampleProgrammeTakesTheOnePassRoad() throws IOException {
        for (String folder : List.of("sound", "programmes")) {
            try (Stream<Path> files = Files.list(samples().resolve(folder))) {
                for (Path file : files.toList()) {
                    assertTrue(agree(Files.readString(file)), file + " was left for the composer");
                }
            }
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "base: &b {a: 1}\nother: *b\n", // an anchor and an alias
        "base: &b {a: 1}\nother:\n  <<: *b\n  c: 2\n", // a merge key
        "a: !!str 5\n", // a standard tag
        "a: !custom x\n", // a custom tag
        "a: 1\nb: 2\na: 3\n", // a repeated key
        "a: 1\n---\nb: 2\n", // a second document
        "", // nothing at all
        "- a\n- b\n", // a list at the root
        "just text\n", // a scalar at the root
        "a: [1, 2\n", // a syntax error
        "a:\n\tb: 1\n", // a tab
        "? [a, b]\n: 1\n", // a list as a key
    })
    void documentsThatAreNotPlainAreLeftForTheComposer(String text) {
        assertNull(READER.direct(text));
        agree(text);
    }

    @Test
    void aRepeatedKeyInALargeMappingIsLeftForTheComposerToo() {
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < 40; i++) {
            text.append("key-").append(i).append(": ").append(i).append('\n');
        }
        assertTrue(agree(text.toString()), "forty distinct keys are plain");
        text.append("key-25: again\n");
        assertNull(READER.direct(text.toString()));
        agree(text.toString());
    }

    @Test
    void nestingAndSizeNearTheLimitsAreLeftForTheComposer() {
        YamlLimits tight = new YamlLimits(YamlLimits.DEFAULTS.maxFileBytes(), 50, 6, 16);
        LocatedYamlReader reader = new LocatedYamlReader(tight);
        String deep = "a:\n  b:\n    c:\n      d:\n        e:\n          f:\n            g: 1\n";
        assertNull(reader.direct(deep));
        assertNotNull(reader.direct("a:\n  b: 1\n"));
        StringBuilder wide = new StringBuilder("a:\n");
        for (int i = 0; i < 30; i++) {
            wide.append("  - ").append(i).append('\n');
        }
        assertNull(reader.direct(wide.toString()));
    }

    /**
     * Random documents, most of them valid and plain, some with the features the one-pass road leaves alone (anchors,
     * aliases, merge keys, tags, repeated keys, a second document) or with a broken line: whatever the composer's
     * road makes of each, the one-pass road makes the same or stays out.
     */
    @Property(tries = 2000)
    void randomDocumentsAreBuiltTheSameOrLeftAlone(@ForAll long seed) {
        boolean built = agree(new RandomYaml(new Random(seed)).document());
        Statistics.label("road").collect(built ? "one pass" : "composer");
    }

    @Property(tries = 300)
    void mostRandomPlainDocumentsTakeTheOnePassRoad(@ForAll long seed) {
        RandomYaml yaml = new RandomYaml(new Random(seed));
        yaml.plainOnly = true;
        String text = yaml.document();
        assertTrue(agree(text), "left for the composer:\n" + text);
    }

    /**
     * Both roads on {@code text}: the one-pass road's document equals the composer's, or it stays out (always when
     * the composer's road finds a problem). True when the one-pass road built it.
     */
    private static boolean agree(String text) {
        LocatedDocument direct = READER.direct(text);
        LocatedDocument composed;
        try {
            composed = READER.composed(text);
        } catch (YamlProblem e) {
            assertNull(direct, "built a tree where the composer's road says: " + e.getMessage() + "\n" + text);
            return false;
        }
        if (direct == null) {
            return false;
        }
        assertEquals(composed.valueAt(""), direct.valueAt(""), "the root's span");
        same(composed.root(), direct.root(), "");
        return true;
    }

    private static void same(JsonNode expected, JsonNode actual, String pointer) {
        assertEquals(expected.getClass(), actual.getClass(), "node type at '" + pointer + "'");
        assertEquals(expected, actual, "value at '" + pointer + "'");
        if (expected instanceof LocatedObject e && actual instanceof LocatedObject a) {
            for (int i = 0; i < e.size(); i++) {
                String at = Pointers.child(pointer, e.name(i));
                assertEquals(e.name(i), a.name(i), "key order at '" + pointer + "'");
                assertEquals(e.keyLocation(i, at), a.keyLocation(i, at), "key span at '" + at + "'");
                assertEquals(e.valueLocation(i, at), a.valueLocation(i, at), "value span at '" + at + "'");
                same(e.child(i), a.child(i), at);
            }
        } else if (expected instanceof LocatedArray e && actual instanceof LocatedArray a) {
            for (int i = 0; i < e.size(); i++) {
                String at = Pointers.child(pointer, i);
                assertEquals(e.valueLocation(i, at), a.valueLocation(i, at), "element span at '" + at + "'");
                same(e.get(i), a.get(i), at);
            }
        }
    }

    private static List<Path> documents() {
        List<Path> files = new ArrayList<>();
        try {
            Path fixtures = Path.of(DirectTreeBuilderTests.class.getResource("/fixtures").toURI());
            for (Path root : List.of(fixtures, samples())) {
                try (Stream<Path> walk = Files.walk(root)) {
                    walk.filter(p -> p.toString().endsWith(".yaml")).sorted().forEach(files::add);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
        return files;
    }

    /** The project's sample programmes, beside this module. */
    private static Path samples() {
        Path here = Path.of("").toAbsolutePath();
        Path samples = here.resolveSibling("sample-programs");
        return Files.isDirectory(samples) ? samples : here.resolve("sample-programs");
    }

    /** YAML text made at random: block and flow collections, every scalar style, comments, and rarer features. */
    private static final class RandomYaml {
        private static final String[] PLAIN = {"1", "-2", "+3", "0", "007", "3.5", "-0.25", "1e3", "0x1F", ".5",
            "true", "False", "TRUE", "null", "Null", "~", "yes", "no", "on", "2:30", "12-14", "8+", "amrap", "90s",
            "rest 2min", "a b c", "barbell-back-squat", "RPE 8", "e\u0301t\u00e9", "100%", "5 x 5", "1_000"};
        private static final String[] QUOTED = {"\"quoted\"", "'single'", "\"with \\\"escape\\\"\"", "''", "\"\"",
            "'it''s'", "\"8\"", "'true'", "\"line\\nbreak\""};
        private static final String[] KEYS = {"week", "day", "name", "sets", "reps", "rir", "rpe", "rest", "load",
            "exercise", "work", "notes", "\"quoted key\"", "'single key'", "a/b", "c~d", "x y"};

        private final Random random;
        private final StringBuilder out = new StringBuilder();
        private int anchors;
        boolean plainOnly;

        RandomYaml(Random random) {
            this.random = random;
        }

        String document() {
            if (!plainOnly && random.nextInt(10) == 0) {
                out.append("---\n");
            }
            if (random.nextInt(8) == 0) {
                out.append("# a comment line\n");
            }
            blockMapping(0, 0, false);
            if (!plainOnly) {
                switch (random.nextInt(30)) {
                    case 0 -> out.append("---\nsecond: document\n");
                    case 1 -> out.append("...\n");
                    case 2 -> out.insert(random.nextInt(out.length() + 1), random.nextBoolean() ? ":" : "\t");
                    default -> { }
                }
            }
            return out.toString();
        }

        /** A block mapping at {@code indent}; {@code afterDash}: its first key follows a list item's "- ". */
        private void blockMapping(int indent, int depth, boolean afterDash) {
            int keys = 1 + random.nextInt(depth == 0 ? 6 : 4);
            List<String> used = new ArrayList<>();
            for (int i = 0; i < keys; i++) {
                String key = KEYS[random.nextInt(KEYS.length)];
                if (used.contains(key) && (plainOnly || random.nextInt(4) != 0)) {
                    continue; // a repeated key now and then, unless plain documents are asked for
                }
                used.add(key);
                if (!afterDash || used.size() > 1) {
                    out.append(" ".repeat(indent));
                }
                out.append(key).append(':');
                blockValue(indent, depth);
            }
        }

        private void blockValue(int indent, int depth) {
            int choice = depth >= 4 ? random.nextInt(3) : random.nextInt(8);
            if (!plainOnly && random.nextInt(25) == 0) {
                rare(indent);
                return;
            }
            switch (choice) {
                case 0, 1 -> out.append(' ').append(scalar()).append(comment()).append('\n');
                case 2 -> out.append(' ').append(flow(depth)).append('\n');
                case 3 -> out.append(" |\n").append(" ".repeat(indent + 2)).append("literal text\n")
                        .append(" ".repeat(indent + 2)).append("  kept indented\n");
                case 4 -> out.append(" >-\n").append(" ".repeat(indent + 2)).append("folded\n")
                        .append(" ".repeat(indent + 2)).append("text\n");
                case 5, 6 -> {
                    out.append(comment()).append('\n');
                    blockMapping(indent + 2, depth + 1, false);
                }
                default -> {
                    out.append('\n');
                    int items = 1 + random.nextInt(4);
                    int dash = indent + (random.nextBoolean() ? 2 : 0); // one column for the whole list
                    for (int i = 0; i < items; i++) {
                        out.append(" ".repeat(dash)).append("- ");
                        if (random.nextBoolean()) {
                            blockMapping(dash + 2, depth + 1, true);
                        } else {
                            out.append(scalar()).append('\n');
                        }
                    }
                }
            }
        }

        private void rare(int indent) {
            switch (random.nextInt(6)) {
                case 0 -> out.append(" &a").append(++anchors).append(" {x: 1, y: [2, 3]}\n");
                case 1 -> out.append(anchors > 0 ? " *a" + anchors : " *missing").append('\n');
                case 2 -> out.append('\n').append(" ".repeat(indent + 2)).append("<<: ")
                        .append(anchors > 0 ? "*a" + anchors : "{m: 1}").append('\n')
                        .append(" ".repeat(indent + 2)).append("own: 2\n");
                case 3 -> out.append(" !!str 12\n");
                case 4 -> out.append(" !local thing\n");
                default -> out.append(" &s").append(++anchors).append(" anchored-scalar\n");
            }
        }

        private String flow(int depth) {
            if (random.nextBoolean()) {
                StringBuilder list = new StringBuilder("[");
                int items = random.nextInt(4);
                for (int i = 0; i < items; i++) {
                    list.append(i > 0 ? ", " : "").append(depth < 3 && random.nextInt(4) == 0 ? flow(depth + 1)
                            : flowScalar());
                }
                return list.append(']').toString();
            }
            StringBuilder map = new StringBuilder("{");
            int items = random.nextInt(3);
            for (int i = 0; i < items; i++) {
                map.append(i > 0 ? ", " : "").append("k").append(i).append(": ")
                        .append(depth < 3 && random.nextInt(4) == 0 ? flow(depth + 1) : flowScalar());
            }
            return map.append('}').toString();
        }

        private String scalar() {
            return random.nextInt(3) == 0 ? QUOTED[random.nextInt(QUOTED.length)] : PLAIN[random.nextInt(PLAIN.length)];
        }

        private String flowScalar() {
            String s = scalar();
            return s.contains(" ") ? "'" + s + "'" : s;
        }

        private String comment() {
            return random.nextInt(6) == 0 ? "  # trailing comment" : "";
        }
    }
}
