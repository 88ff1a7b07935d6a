package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Severity;
import java.io.IOException;
import java.io.InputStream;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

class JsonReportTests {
    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final Schema SCHEMA = loadSchema();

    private static Schema loadSchema() {
        try (InputStream in = JsonReportTests.class.getResourceAsStream("/dev/mesolint/schema/report.schema.json")) {
            return SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12).getSchema(in);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static List<String> violations(JsonNode doc) {
        return SCHEMA.validate(doc).stream().map(com.networknt.schema.Error::toString).toList();
    }

    private static JsonNode json(ReportInput input) {
        return JSON.readTree(ReportFixtures.render(ReportFormat.JSON, input));
    }

    @Test
    void samplesReportValidatesAgainstThePublishedSchema() {
        RunReport run = ReportFixtures.check("sample-programs");
        JsonNode doc = json(ReportFixtures.input(run));
        assertEquals(List.of(), violations(doc));
        assertEquals(run.files().size(), doc.get("files").size());
        assertEquals(run.count(Severity.ERROR), doc.at("/summary/errors").asLong());
        assertTrue(doc.at("/summary/errors").asLong() > 0, "the broken samples have errors");
        assertFalse(doc.has("metrics"), "no figures were supplied");
    }

    @Test
    void findingsCarryTheirSubjectMeasureAndApplicableEdit() {
        RunReport run = ReportFixtures.check("sample-programs");
        JsonNode doc = json(ReportFixtures.input(run));
        assertEquals(List.of(), violations(doc));
        JsonNode rest = null;
        for (JsonNode file : doc.get("files")) {
            for (JsonNode f : file.get("findings")) {
                if (f.get("ruleId").asString().equals("short-rest-compound") && rest == null) {
                    rest = f;
                }
            }
        }
        assertTrue(rest != null, "a broken sample has a short compound rest");
        // the hypertrophy profile's 2 min after compound sets: ACSM 2009 position stand (Ratamess et al.)
        assertEquals(120, rest.at("/measure/limit").asDouble());
        assertEquals("s", rest.at("/measure/unit").asString());
        assertTrue(rest.at("/measure/value").asDouble() < 120, rest.toString());
        assertTrue(rest.at("/subject/exercise").isString(), rest.toString());
        assertTrue(rest.at("/subject/weeks").size() >= 1, rest.toString());
        assertEquals("rest", rest.at("/edit/key").asString());
        assertEquals(rest.get("line").asInt(), rest.at("/edit/line").asInt(), "the edit is at the finding's key");
        assertTrue(rest.get("endColumn").asInt() > rest.get("column").asInt(), "the span covers the value");
    }

    @Test
    void carriesTheCautionAndTheFindingDetails() {
        RunReport run = ReportFixtures.handMadeRun(Severity.ERROR);
        String waivedPrint = run.files().get(0).waived().get(0).fingerprint();
        JsonNode doc = json(ReportFixtures.input(ReportFixtures.baselining(run, Set.of(waivedPrint))));
        assertEquals(List.of(), violations(doc));
        assertEquals(Mesolint.CAUTION, doc.get("caution").asString());
        assertTrue(doc.get("failed").asBoolean());
        assertEquals(1, doc.at("/summary/waived").asInt());
        JsonNode a = doc.at("/files/0");
        assertEquals("programmes/a.yaml", a.get("path").asString());
        assertTrue(a.get("loaded").asBoolean());
        assertEquals("harbour-thirty-minutes", a.at("/programme/id").asString());
        JsonNode waived = a.get("findings").get(2);
        assertEquals("kept while the club reviews its waivers", waived.at("/waiver/reason").asString());
        assertTrue(waived.get("baselined").asBoolean());
        JsonNode error = a.get("findings").get(3);
        assertEquals("week-sequence", error.get("ruleId").asString());
        assertEquals(41, error.get("line").asInt());
        assertEquals("/weeks/2/week", error.get("pointer").asString());
        assertFalse(error.get("baselined").asBoolean());
        assertFalse(doc.at("/files/1/loaded").asBoolean());
    }

    @Test
    void includesMetricsFromTheFiguresAndStillValidates() {
        RunReport run = ReportFixtures.check(HandMadeFigures.FILE);
        ReportFigures figures = file -> file.displayPath().equals(HandMadeFigures.FILE)
                ? Optional.of(new HandMadeFigures()) : Optional.empty();
        JsonNode doc = json(ReportFixtures.input(run).withFigures(figures));
        assertEquals(List.of(), violations(doc));
        JsonNode metrics = doc.at("/metrics/0");
        assertEquals(HandMadeFigures.FILE, metrics.get("file").asString());
        assertEquals(5, metrics.get("weeks").size());
        assertEquals(3.0, metrics.at("/weeks/0/muscles/biceps/hardSets").asDouble());
        assertEquals(22.0, metrics.at("/weeks/3/muscles/quadriceps/hardSets").asDouble());
        assertEquals("Lower B", metrics.at("/weeks/0/sessions/3/name").asString());
        assertEquals(4, metrics.at("/weeks/4/sessions/0/sets").size(), "the deload week has fewer sets");
    }

    @Test
    void schemaRejectsDocumentsThatBreakTheContract() {
        ObjectNode doc = (ObjectNode) json(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR)));
        doc.remove("caution");
        assertFalse(violations(doc).isEmpty(), "the caution is required");
        ObjectNode bad = (ObjectNode) json(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR)));
        ((ObjectNode) bad.at("/files/0/findings/0")).put("severity", "off");
        assertFalse(violations(bad).isEmpty(), "off findings are never reported");
        ObjectNode metrics = (ObjectNode) json(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR)));
        metrics.putArray("metrics").addObject().put("file", "x.yaml");
        assertFalse(violations(metrics).isEmpty(), "a metrics programme needs id and weeks");
    }

    @Test
    void everySchemaPropertyIsDescribed() throws IOException {
        JsonNode root;
        try (InputStream in = JsonReportTests.class.getResourceAsStream("/dev/mesolint/schema/report.schema.json")) {
            root = JSON.readTree(in);
        }
        assertEquals(List.of(), undescribed(root, ""));
    }

    /** JSON pointers of property schemas (and $defs) that lack a description. */
    private static List<String> undescribed(JsonNode node, String at) {
        List<String> missing = new java.util.ArrayList<>();
        for (String container : List.of("properties", "$defs")) {
            JsonNode children = node.get(container);
            if (children == null) {
                continue;
            }
            for (var e : children.properties()) {
                String where = at + "/" + container + "/" + e.getKey();
                if (!e.getValue().has("description")) {
                    missing.add(where);
                }
                missing.addAll(undescribed(e.getValue(), where));
            }
        }
        for (String nested : List.of("items", "additionalProperties")) {
            JsonNode child = node.get(nested);
            if (child != null && child.isObject()) {
                missing.addAll(undescribed(child, at + "/" + nested));
            }
        }
        return missing;
    }

    @Test
    void unloadedFilesHaveNoProgrammeHeader() {
        FileReport broken = ReportFixtures.check("sample-programs/broken/schema.yaml").files().get(0);
        JsonNode doc = json(ReportFixtures.input(new RunReport(List.of(broken), Severity.ERROR, List.of("gone.yaml"))));
        assertEquals(List.of(), violations(doc));
        assertFalse(doc.at("/files/0").has("programme"));
        assertEquals("gone.yaml", doc.at("/missing/0").asString());
        assertEquals("schema", doc.at("/files/0/findings/0/ruleId").asString());
    }
}
