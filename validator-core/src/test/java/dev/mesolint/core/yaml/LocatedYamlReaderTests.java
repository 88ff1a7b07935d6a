package dev.mesolint.core.yaml;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.source.Location;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;

class LocatedYamlReaderTests {
    private final LocatedYamlReader reader = new LocatedYamlReader(YamlLimits.DEFAULTS);

    @Test
    void everyValueAndKeyKeepsItsLineAndColumn() throws YamlProblem {
        LocatedDocument doc = reader.read("""
                programme:
                  id: harbour-test
                weeks:
                  - week: 1
                    sessions: []
                """);
        // "harbour-test" starts at column 7 and is 12 characters long: the span ends at column 19
        assertEquals(new Location(2, 7, 2, 19, "/programme/id"), doc.valueAt("/programme/id"));
        assertEquals(2, doc.keyAt("/programme/id").line());
        assertEquals(3, doc.keyAt("/programme/id").column());
        assertEquals(4, doc.valueAt("/weeks/0/week").line());
        assertEquals(11, doc.valueAt("/weeks/0/week").column());
        // an unwritten pointer falls back to its nearest written ancestor
        assertEquals(4, doc.valueAt("/weeks/0/deload").line());
    }

    @Test
    void pointersFindEscapedKeysAndStopAtTheNearestWrittenAncestor() throws YamlProblem {
        LocatedDocument doc = reader.read("""
                "a/b": 1
                "c~d":
                  - x
                  - y: 2
                """);
        // RFC 6901: '/' in a key is written ~1 and '~' is written ~0
        assertEquals(new Location(1, 8, 1, 9, "/a~1b"), doc.valueAt("/a~1b"));
        assertEquals(new Location(1, 1, 1, 6, "/a~1b"), doc.keyAt("/a~1b"));
        // a block mapping starts at its first key
        assertEquals("4:5 /c~0d/1", doc.valueAt("/c~0d/1") + " " + doc.valueAt("/c~0d/1").pointer());
        assertEquals(new Location(4, 5, 4, 6, "/c~0d/1/y"), doc.keyAt("/c~0d/1/y"));
        // unescaped or unknown segments are not the keys: the walk stops at the last node it found, and says which
        assertEquals("", doc.valueAt("/a/b").pointer());
        assertEquals("/c~0d", doc.valueAt("/c~0d/7").pointer());
        assertEquals("/c~0d", doc.valueAt("/c~0d/01").pointer());
        assertEquals("/c~0d/1", doc.valueAt("/c~0d/1/z").pointer());
        // a list element has no key: its key is where its value is
        assertEquals(doc.valueAt("/c~0d/0"), doc.keyAt("/c~0d/0"));
        // only a written value is found exactly
        assertEquals(doc.valueAt("/c~0d/1/y"), doc.writtenAt("/c~0d/1/y"));
        assertEquals(null, doc.writtenAt("/c~0d/1/z"));
        JsonNode list = doc.root().get("c~d");
        assertEquals(doc.valueAt("/c~0d/1"), doc.childAt(list, 1, "/c~0d/1"));
        assertEquals(doc.valueAt("/c~0d/1/y"), doc.childAt(list.get(1), "y", "/c~0d/1/y"));
        assertEquals(null, doc.childAt(list, 2, "/c~0d/2"));
    }

    @Test
    void onlyYaml12NumbersAreNumbers() throws YamlProblem {
        JsonNode root = reader.read("""
                a: -0
                b: +12
                c: 1.
                d: .5e-3
                e: 1.5E+2
                f: 0x1F
                g: 1_000
                h: .
                i: 1e5
                j: '-5'
                k: 123456789012345678901
                """).root();
        // YAML 1.2 core schema, integers [-+]?(0|[1-9][0-9]*) and floats with a point (yaml.org/spec/1.2.2, 10.3.2)
        assertEquals(0, root.get("a").asLong());
        assertEquals(12, root.get("b").asLong());
        assertTrue(root.get("c").isNumber());
        assertEquals(0.0005, root.get("d").asDouble(), 1e-12);
        assertEquals(150, root.get("e").asDouble(), 1e-9);
        assertTrue(root.get("f").isString());
        assertTrue(root.get("g").isString());
        assertTrue(root.get("h").isString());
        // the decimal form needs its point: 1e5 stays text
        assertTrue(root.get("i").isString());
        assertTrue(root.get("j").isString());
        assertEquals("123456789012345678901", root.get("k").bigIntegerValue().toString());
    }

    @Test
    void yaml11SurprisesStayTheTextTheAuthorWrote() throws YamlProblem {
        JsonNode root = reader.read("""
                rest: 2:30
                deload: no
                flag: on
                week: 08
                count: 12
                rpe: 8.5
                real: true
                quoted: "12"
                """).root();
        // YAML 1.1 would read 2:30 as the sexagesimal integer 150, no/on as booleans and 08 as an error
        assertTrue(root.get("rest").isString());
        assertEquals("2:30", root.get("rest").asString());
        assertEquals("no", root.get("deload").asString());
        assertTrue(root.get("flag").isString());
        assertEquals("08", root.get("week").asString());
        assertTrue(root.get("count").isIntegralNumber());
        assertTrue(root.get("rpe").isNumber());
        assertTrue(root.get("real").isBoolean());
        assertTrue(root.get("quoted").isString());
    }

    @Test
    void anchorsAliasesAndMergeKeysWorkAndPointAtTheWrittenLines() throws YamlProblem {
        LocatedDocument doc = reader.read("""
                base: &base
                  reps: 8
                  rest: 2min
                copy: *base
                tuned:
                  <<: *base
                  reps: 10
                """);
        assertEquals(8, doc.root().get("copy").get("reps").asInt());
        assertEquals(10, doc.root().get("tuned").get("reps").asInt());
        assertEquals("2min", doc.root().get("tuned").get("rest").asString());
        // the aliased value is located where it was written, inside the anchor
        assertEquals(2, doc.valueAt("/copy/reps").line());
        assertEquals(3, doc.valueAt("/tuned/rest").line());
        assertEquals(7, doc.valueAt("/tuned/reps").line());
    }

    @Test
    void duplicateKeysAreRefusedAtTheSecondOne() {
        YamlProblem p = assertThrows(YamlProblem.class, () -> reader.read("""
                reps: 8
                rest: 2min
                reps: 10
                """));
        assertEquals(3, p.location().line());
        assertTrue(p.getMessage().contains("'reps' appears twice"), p.getMessage());
    }

    @Test
    void syntaxErrorsAreLocated() {
        YamlProblem p = assertThrows(YamlProblem.class, () -> reader.read("""
                weeks:
                  - week: 1
                    sessions: [ {day: 1
                """));
        assertTrue(p.getMessage().startsWith("YAML syntax"), p.getMessage());
        assertTrue(p.location().line() >= 3, "located at or after the unclosed bracket: " + p.location());
        assertTrue(!p.hint().isBlank());
    }

    @Test
    void anAliasBombStopsQuicklyWithAClearError() {
        StringBuilder bomb = new StringBuilder("a: &a [x, x, x, x, x, x, x, x, x, x]\n");
        for (char c = 'b'; c <= 'k'; c++) {
            char prev = (char) (c - 1);
            bomb.append(c).append(": &").append(c).append(" [");
            for (int i = 0; i < 10; i++) {
                bomb.append(i == 0 ? "" : ", ").append('*').append(prev);
            }
            bomb.append("]\n");
        }
        YamlProblem p = assertTimeoutPreemptively(Duration.ofSeconds(20),
                () -> assertThrows(YamlProblem.class, () -> reader.read(bomb.toString())));
        assertTrue(p.getMessage().contains("alias"), p.getMessage());
    }

    @Test
    void nodeCountIsCappedEvenUnderTheAliasLimit() {
        // 5 levels x 8 aliases = 40 aliases (under the limit of 50) still expand to 8^5 = 32,768 leaves per level...
        StringBuilder doc = new StringBuilder("a: &a [x, x, x, x, x, x, x, x, x, x, x, x, x, x, x, x]\n");
        String prev = "a";
        for (int level = 0; level < 5; level++) {
            String name = "l" + level;
            doc.append(name).append(": &").append(name).append(" [");
            for (int i = 0; i < 8; i++) {
                doc.append(i == 0 ? "" : ", ").append('*').append(prev);
            }
            doc.append("]\n");
            prev = name;
        }
        YamlProblem p = assertThrows(YamlProblem.class, () -> reader.read(doc.toString()));
        assertTrue(p.getMessage().contains("nodes"), p.getMessage());
    }

    @Test
    void tenThousandLevelsOfNestingAreRefusedWithoutAStackOverflow() {
        String deep = "[".repeat(10_000) + "]".repeat(10_000);
        YamlProblem p = assertThrows(YamlProblem.class, () -> reader.read(deep));
        assertTrue(p.getMessage().contains("nest"), p.getMessage());
        assertEquals(1, p.location().line());
    }

    @Test
    void binaryAndNonUtf8FilesAreRefused() {
        byte[] binary = {(byte) 0x89, 'P', 'N', 'G', 0, 0, 0, 13};
        assertTrue(assertThrows(YamlProblem.class, () -> reader.read(binary)).getMessage().contains("binary"));
        byte[] latin1 = "name: Caf\u00e9".getBytes(StandardCharsets.ISO_8859_1);
        assertTrue(assertThrows(YamlProblem.class, () -> reader.read(latin1)).getMessage().contains("UTF-8"));
    }

    @Test
    void customTagsAndSeveralDocumentsAreRefused() {
        assertTrue(assertThrows(YamlProblem.class, () -> reader.read("a: !shell rm\n")).getMessage().contains("tag"));
        YamlProblem twoDocs = assertThrows(YamlProblem.class, () -> reader.read("a: 1\n---\nb: 2\n"));
        assertEquals(3, twoDocs.location().line());
        YamlProblem global = assertThrows(YamlProblem.class,
                () -> reader.read("a: !!javax.script.ScriptEngineManager [x]\n"));
        assertEquals(1, global.location().line());
    }

    @Test
    void anEmptyFileSaysSo() {
        assertTrue(assertThrows(YamlProblem.class, () -> reader.read("# only a comment\n")).getMessage()
                .contains("empty"));
    }
}
