package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.format.EditorSchemas;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * No output or document names a web address the project cannot promise: schemas carry URNs, reports link rule
 * pages only when the front end names where they are published.
 */
class PromisedAddressTests {
    private static final String UNOWNED_DOMAIN = "mesolint.dev";
    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Test
    void publishedSchemasAreNamedByUrn() throws IOException {
        try (Stream<Path> schemas = Files.list(ReportFixtures.ROOT.resolve("docs/schema"))) {
            List<Path> files = schemas.filter(p -> p.toString().endsWith(".schema.json")).toList();
            assertFalse(files.isEmpty());
            for (Path file : files) {
                String text = Files.readString(file);
                assertFalse(text.contains(UNOWNED_DOMAIN), file.toString());
                JsonNode id = JSON.readTree(text).get("$id");
                if (id != null) {
                    assertTrue(id.asString().startsWith("urn:mesolint:schema:"), file + ": " + id);
                }
            }
        }
    }

    @Test
    void editorSchemasNameNoDomain() {
        EditorSchemas.render(ReportFixtures.catalogue(), ReportFixtures.RULES.stream().map(r -> r.id()).toList()).forEach(
                (name, text) -> assertFalse(text.contains(UNOWNED_DOMAIN), name));
    }

    @Test
    void noReportFormatNamesTheDomain() {
        ReportInput input = ReportFixtures.withCatalogue(ReportFixtures.handMadeRun(Severity.WARNING));
        for (ReportFormat format : ReportFormat.values()) {
            String text = ReportFixtures.render(format, input);
            assertFalse(text.contains(UNOWNED_DOMAIN), format.name());
        }
        JsonNode json = JSON.readTree(ReportFixtures.render(ReportFormat.JSON, input));
        assertEquals("urn:mesolint:schema:report:1", json.get("$schema").asString());
    }

    @Test
    void htmlLinksRulePagesOnlyUnderAGivenBase() {
        ReportInput input = ReportFixtures.withCatalogue(ReportFixtures.handMadeRun(Severity.WARNING));
        String plain = ReportFixtures.render(ReportFormat.HTML, input);
        assertFalse(plain.contains("<a class=\"rule\""));
        assertTrue(plain.contains("<span class=\"rule\" title=\"mesolint explain week-sequence\">"));
        String linked = ReportFixtures.render(ReportFormat.HTML, input.withOptions(
                ReportOptions.DEFAULTS.withHelpUriBase(Optional.of("https://docs.example.org/rules"))));
        assertTrue(linked.contains("<a class=\"rule\" href=\"https://docs.example.org/rules/week-sequence.md\">"));
    }

    @Test
    void docsNameNoDomain() throws IOException {
        try (Stream<Path> docs = Stream.concat(Files.walk(ReportFixtures.ROOT.resolve("docs")),
                Stream.of(ReportFixtures.ROOT.resolve("README.md"), ReportFixtures.ROOT.resolve("pom.xml")))) {
            for (Path file : docs.filter(Files::isRegularFile).filter(p -> !p.toString().endsWith(".png")).toList()) {
                assertFalse(Files.readString(file).contains(UNOWNED_DOMAIN), file.toString());
            }
        }
    }
}
