package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.mesolint.core.finding.Severity;
import java.io.IOException;
import java.io.StringWriter;
import java.util.List;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/** Streaming a report's long array writes the very text the whole tree would have given. */
class JsonTextTests {
    private static final JsonMapper INDENTED = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT)
            .build();

    private static ObjectNode item(int i) {
        ObjectNode item = JsonText.object().put("ruleId", "rule-" + i).put("line", i).put("ratio", i / 3.0)
                .put("text", "a \"quoted\" \u00e9 \\ line " + i);
        item.putArray("weeks").add(i).add(i + 1);
        item.putObject("nested").putNull("none").put("ok", i % 2 == 0);
        return item;
    }

    @Test
    void aStreamedArrayIsWrittenExactlyAsTheWholeTree() throws IOException {
        ObjectNode whole = JsonText.object().put("$schema", "urn:x");
        ObjectNode run = whole.putArray("runs").addObject().put("before", 1);
        IntStream.range(0, 50).forEach(i -> run.withArray("results").add(item(i)));
        run.put("after", "end").putArray("empty");
        String expected = INDENTED.writeValueAsString(whole) + "\n";

        ObjectNode streamed = JsonText.object().put("$schema", "urn:x");
        ObjectNode holder = streamed.putArray("runs").addObject().put("before", 1);
        holder.putArray("results");
        holder.put("after", "end").putArray("empty");
        StringWriter out = new StringWriter();
        List<JsonNode> items = IntStream.range(0, 50).mapToObj(JsonTextTests::item).map(JsonNode.class::cast).toList();
        JsonText.write(streamed, holder, "results", items.iterator(), out);

        assertEquals(expected, out.toString());
        StringWriter plain = new StringWriter();
        JsonText.write(whole, plain);
        assertEquals(expected, plain.toString());
    }

    @Test
    void theSarifReportOfARealRunParsesBackWithEveryResult() {
        var run = ReportFixtures.handMadeRun(Severity.ERROR);
        JsonNode log = INDENTED.readTree(ReportFixtures.render(ReportFormat.SARIF, ReportFixtures.input(run)));
        long findings = run.files().stream().flatMap(f -> f.findings().stream())
                .filter(f -> f.severity() != Severity.OFF).count();
        assertEquals(findings, log.at("/runs/0/results").size());
        assertEquals("unicodeCodePoints", log.at("/runs/0/columnKind").asString(), "fields after the results remain");
    }
}
