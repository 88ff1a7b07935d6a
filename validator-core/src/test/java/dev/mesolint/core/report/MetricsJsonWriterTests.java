package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.testing.HarbourDemo;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

class MetricsJsonWriterTests {

    private static final String SCHEMA = "/dev/mesolint/schema/metrics.schema.json";
    private static final JsonMapper MAPPER = JsonMapper.builder().build();

    private static JsonNode written;

    @BeforeAll
    static void write() throws IOException {
        StringWriter out = new StringWriter();
        new MetricsJsonWriter().write(List.of(new FileMetrics("programmes/harbour-upper-lower.yaml",
                HarbourDemo.metrics())), out);
        written = MAPPER.readTree(out.toString());
    }

    private static JsonNode schemaNode() throws IOException {
        try (InputStream in = MetricsJsonWriterTests.class.getResourceAsStream(SCHEMA)) {
            assertNotNull(in, "the schema is packaged at " + SCHEMA);
            return MAPPER.readTree(in);
        }
    }

    @Test
    void theOutputValidatesAgainstThePublishedSchema() throws IOException {
        SchemaRegistry registry = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12);
        Schema schema;
        try (InputStream in = MetricsJsonWriterTests.class.getResourceAsStream(SCHEMA)) {
            schema = registry.getSchema(in);
        }
        List<com.networknt.schema.Error> errors = schema.validate(written);
        assertEquals(List.of(), errors.stream().map(Object::toString).toList());
    }

    @Test
    void theSchemaRefusesARenamedField() throws IOException {
        SchemaRegistry registry = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12);
        Schema schema = registry.getSchema(schemaNode());
        JsonNode renamed = MAPPER.readTree(written.toString().replace("\"hardSets\"", "\"hardSetCount\""));
        assertTrue(!schema.validate(renamed).isEmpty(), "the shape is fixed: a renamed field must fail");
    }

    @Test
    void theDocumentedShapeIsThere() {
        JsonNode programme = written.get("programmes").get(0);
        JsonNode week = programme.get("weeks").get(0);
        JsonNode session = week.get("sessions").get(0);
        JsonNode set = session.get("sets").get(0);
        assertEquals("programmes/harbour-upper-lower.yaml", programme.get("file").asString());
        assertEquals("harbour-test-block", programme.get("id").asString());
        assertEquals(1, week.get("week").asInt());
        assertTrue(week.get("muscles").get("chest").get("hardSets").isNumber());
        assertEquals(1, session.get("day").asInt());
        assertEquals("Upper A", session.get("name").asString());
        assertEquals("barbell-bench-press", set.get("exercise").asString());
        assertEquals(1, set.get("set").asInt());
        assertEquals(31, set.get("line").asInt());
        assertEquals(8, set.get("reps").asInt());
        assertEquals(2, set.get("rir").asInt());
        assertTrue(set.get("hard").asBoolean());
        // Common practice: 8 reps at RIR 2 -> 3 stimulating reps; the first set of a session is fresh.
        assertEquals(3, set.get("stimulatingReps").asInt());
        assertEquals(1.0, set.get("recruitment").asDouble(), 1e-9);
        assertEquals(0.6, set.get("stimulus").asDouble(), 1e-9);
    }

    @Test
    void unknownFiguresAreNull() {
        JsonNode lower = written.get("programmes").get(0).get("weeks").get(0).get("sessions").get(1);
        JsonNode legExtension = lower.get("sets").get(6);
        assertEquals("leg-extension", legExtension.get("exercise").asString());
        assertTrue(legExtension.get("rir").isNull());
        assertEquals("unknown", legExtension.get("effortSource").asString());
        assertTrue(legExtension.get("agreement").get("repsToFailure").isNull());
    }

    @Test
    void theSchemaListsExactlyTheModelsMuscles() throws IOException {
        Set<String> inSchema = new TreeSet<>();
        schemaNode().get("$defs").get("muscle").get("enum").forEach(n -> inSchema.add(n.asString()));
        Set<String> inModel = Arrays.stream(Muscle.values()).map(Muscle::yamlName)
                .collect(Collectors.toCollection(TreeSet::new));
        assertEquals(inModel, inSchema);
    }

    @Test
    void theFiguresCarryTheCaution() {
        // House rule: every report, machine-readable ones too, carries the caution.
        assertEquals(dev.mesolint.core.Mesolint.CAUTION, written.get("caution").asString());
        assertTrue(written.get("caution").asString().contains("PAR-Q+"));
    }

    @Test
    void eachWeekAndSessionListsItsLiftsStrengthFigures() {
        JsonNode week = written.get("programmes").get(0).get("weeks").get(0);
        JsonNode bench = week.get("lifts").get(0);
        assertEquals("barbell-bench-press", bench.get("exercise").asString());
        // 3 x 8 at 75% of a 100 kg 1RM: top set 0.75, 24 x 75 = 1800 kg, no reps at 80% or more.
        assertEquals(0.75, bench.get("topSetFraction").asDouble(), 1e-9);
        assertEquals(1800, bench.get("volumeLoad").asDouble(), 1e-9);
        assertEquals(0, bench.get("heavyReps").asDouble(), 1e-9);
        JsonNode zones = week.get("sessions").get(0).get("lifts").get(0).get("zones");
        assertEquals(5, zones.size());
        // 75% falls in the 70-80% zone.
        assertEquals(24, zones.get(2).get("reps").asDouble(), 1e-9);
        assertTrue(zones.get(4).get("below").isNull());
    }

    @Test
    void everyPropertyInTheSchemaHasADescription() throws IOException {
        List<String> missing = new ArrayList<>();
        collectUndescribed(schemaNode(), "", missing);
        assertEquals(List.of(), missing);
    }

    private static void collectUndescribed(JsonNode node, String path, List<String> missing) {
        if (node.has("properties")) {
            for (Map.Entry<String, JsonNode> p : node.get("properties").properties()) {
                if (!p.getValue().has("description")) {
                    missing.add(path + "/" + p.getKey());
                }
                collectUndescribed(p.getValue(), path + "/" + p.getKey(), missing);
            }
        }
        if (node.has("$defs")) {
            for (Map.Entry<String, JsonNode> d : node.get("$defs").properties()) {
                if (!d.getValue().has("description")) {
                    missing.add(path + "/$defs/" + d.getKey());
                }
                collectUndescribed(d.getValue(), path + "/$defs/" + d.getKey(), missing);
            }
        }
    }
}
