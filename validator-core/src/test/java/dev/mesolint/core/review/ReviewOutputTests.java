package dev.mesolint.core.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.finding.ConstraintReasons;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.commonmark.ext.gfm.tables.TableBlock;
import org.commonmark.ext.gfm.tables.TablesExtension;
import org.commonmark.node.AbstractVisitor;
import org.commonmark.node.CustomBlock;
import org.commonmark.node.Node;
import org.commonmark.parser.Parser;
import org.commonmark.renderer.html.HtmlRenderer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** The review's outputs for one change: Markdown rendered as GitHub-flavoured Markdown, JSON, SARIF, console. */
class ReviewOutputTests {
    private static final String BLOCK = "programmes/block.yaml";

    @TempDir
    Path folder;

    private ReviewInput change(boolean showReasons) throws Exception {
        try (GitFixture repo = GitFixture.init(folder)) {
            String base = repo.write(BLOCK, ReviewProgrammes.block()).commit("block");
            repo.write(BLOCK, ReviewProgrammes.block(5, "60s", "75%"));
            Review review = ChangeReview.run(new ReviewRequest(RunOptions.at(repo.root()), List.of(),
                    Optional.of(base), Optional.empty()), ChangeReviewTests.rules());
            return new ReviewInput(review, ChangeReviewTests.rules(), repo.root(), showReasons);
        }
    }

    private static String write(ReviewWriter writer, ReviewInput input) throws Exception {
        StringWriter out = new StringWriter();
        writer.write(input, out);
        return out.toString();
    }

    @Test
    void theMarkdownRendersAsATablePerChangedProgrammeWithCollapsedDetailsAndTheCaution() throws Exception {
        String markdown = write(new ReviewMarkdown(), change(false));
        Parser parser = Parser.builder().extensions(List.of(TablesExtension.create())).build();
        Node document = parser.parse(markdown);
        int[] tables = {0};
        document.accept(new AbstractVisitor() {
            @Override
            public void visit(CustomBlock block) {
                if (block instanceof TableBlock) {
                    tables[0]++;
                }
                visitChildren(block);
            }
        });
        assertEquals(1, tables[0], "one changed programme, one table:\n" + markdown);
        String html = HtmlRenderer.builder().extensions(List.of(TablesExtension.create())).build().render(document);
        assertTrue(html.contains("<th align=\"right\">week</th>") && html.contains("<th>figure</th>"), html);
        // Two more bench press sets: chest hard sets 3 -> 5 (credit 1 per prime-mover set, common practice).
        assertTrue(html.contains("<td>chest hard sets</td>\n<td align=\"right\">3</td>\n<td align=\"right\">5</td>\n"
                + "<td align=\"right\">+2</td>"), html);
        assertTrue(html.contains("<details><summary>"), "resolved and unchanged findings are collapsed");
        assertTrue(html.contains("</details>"));
        assertTrue(html.contains("<blockquote>") && html.contains("PAR-Q+"), "the caution closes the comment");
        assertTrue(markdown.startsWith("### mesolint: changes since `"), markdown);
    }

    @Test
    void theJsonCarriesTheFiguresTheFindingsByStateAndTheCaution() throws Exception {
        JsonNode json = JsonMapper.builder().build().readTree(write(new ReviewJson(), change(false)));
        assertEquals(Mesolint.CAUTION, json.get("caution").asString());
        assertEquals(1, json.get("summary").get("programmesChanged").asInt());
        JsonNode programme = json.get("programmes").get(0);
        assertEquals("edited", programme.get("status").asString());
        JsonNode squat = null;
        for (JsonNode lift : programme.get("lifts")) {
            if (lift.get("exercise").asString().equals("barbell-back-squat")) {
                squat = lift;
            }
        }
        // 70% -> 75% of 1RM on the squat's top set (common practice: intensity as a share of 1RM).
        assertEquals(5.0, squat.get("topSetPercentOf1RM").get("change").asDouble(), 1e-9);
        assertEquals(List.of("short-rest-compound"), names(programme.get("findings").get("new")));
        assertEquals(List.of("weekly-volume-min"), names(programme.get("findings").get("resolved")));
    }

    @Test
    void theJsonValidatesAgainstThePublishedSchema() throws Exception {
        JsonNode json = JsonMapper.builder().build().readTree(write(new ReviewJson(), change(false)));
        com.networknt.schema.Schema schema;
        try (java.io.InputStream in = ReviewOutputTests.class.getResourceAsStream(
                "/dev/mesolint/schema/diff.schema.json")) {
            schema = com.networknt.schema.SchemaRegistry.withDefaultDialect(
                    com.networknt.schema.SpecificationVersion.DRAFT_2020_12).getSchema(in);
        }
        assertEquals(List.of(), schema.validate(json).stream().map(Object::toString).toList());
    }

    private static List<String> names(JsonNode findings) {
        List<String> names = new java.util.ArrayList<>();
        findings.forEach(f -> names.add(f.get("rule").asString()));
        return names;
    }

    @Test
    void theSarifStatesEachResultRelativeToTheBase() throws Exception {
        JsonNode sarif = JsonMapper.builder().build().readTree(write(new ReviewSarif(), change(false)));
        JsonNode run = sarif.get("runs").get(0);
        assertEquals(Mesolint.CAUTION, run.get("properties").get("caution").asString());
        int fresh = 0;
        int unchanged = 0;
        int absent = 0;
        for (JsonNode result : run.get("results")) {
            switch (result.get("baselineState").asString()) {
                case "new" -> fresh++;
                case "unchanged" -> unchanged++;
                case "absent" -> absent++;
                default -> throw new AssertionError(result.toString());
            }
        }
        assertEquals(1, fresh, "the short rows");
        assertEquals(6, unchanged, "the floor findings of the other muscles");
        assertEquals(1, absent, "the chest floor finding the two sets resolved");
    }

    @Test
    void theConsoleShowsChangesOnlyThenTheSummaryAndTheCaution() throws Exception {
        String console = write(new ReviewConsole(), change(false));
        assertTrue(console.contains("  week 1 chest: working sets 3 -> 5 (+2), hard sets 3 -> 5 (+2), stimulus "),
                console);
        assertFalse(console.contains("week 1 glutes"), "the squat's heavier load changes no sets:\n" + console);
        assertTrue(console.contains("  limit week 1 chest: weekly hard sets 3 -> 5, back at or above the floor of 4"),
                console);
        assertTrue(console.contains("findings: 1 new, 1 resolved, 6 unchanged"), console);
        assertTrue(console.strip().endsWith(Mesolint.CAUTION), console);
    }

    @Test
    void constraintReasonsAreLeftOutUnlessAsked() {
        String message = "the athlete's 70% cap for the shoulder (reason given: Returning from a shoulder problem "
                + "(left side); capped for now.); this exercise loads the shoulder";
        assertEquals("the athlete's 70% cap for the shoulder (reason left out); this exercise loads the shoulder",
                ConstraintReasons.leaveOut(message));
    }
}
