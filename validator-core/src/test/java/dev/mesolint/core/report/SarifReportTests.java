package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

class SarifReportTests {
    private static final JsonMapper JSON = JsonMapper.builder().build();

    private static JsonNode sarif(ReportInput input) {
        return JSON.readTree(ReportFixtures.render(ReportFormat.SARIF, input));
    }

    @Test
    void declaresVersionSchemaAndTheTool() {
        JsonNode log = sarif(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR)));
        assertEquals("2.1.0", log.get("version").asString());
        assertTrue(log.get("$schema").asString().endsWith("sarif-schema-2.1.0.json"));
        assertEquals(1, log.get("runs").size());
        JsonNode driver = log.at("/runs/0/tool/driver");
        assertEquals("mesolint", driver.get("name").asString());
        assertEquals(Mesolint.version(), driver.get("version").asString());
        assertTrue(driver.get("fullName").asString().startsWith("mesolint " + Mesolint.version()));
        // No site is promised: no informationUri, no helpUri unless the front end names a base.
        assertFalse(driver.has("informationUri"));
        assertTrue(driver.at("/fullDescription/text").asString().contains(Mesolint.CAUTION));
        assertEquals(Mesolint.CAUTION, driver.at("/properties/caution").asString());
        assertEquals("mesolint/check/", log.at("/runs/0/automationDetails/id").asString());
        assertFalse(log.at("/runs/0").has("versionControlProvenance"), "no git revision was given");
        assertEquals(Mesolint.CAUTION, log.at("/runs/0/properties/caution").asString());
    }

    @Test
    void listsEveryRegisteredRuleWithHelpAndDefaultLevel() {
        JsonNode rules = sarif(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR)))
                .at("/runs/0/tool/driver/rules");
        List<RuleDefinition> registered = ReportFixtures.RULES;
        assertEquals(registered.size(), rules.size());
        for (int i = 0; i < registered.size(); i++) {
            var m = registered.get(i).metadata();
            JsonNode rule = rules.get(i);
            assertEquals(m.id(), rule.get("id").asString());
            assertEquals(m.summary(), rule.at("/shortDescription/text").asString());
            assertEquals(m.rationale(), rule.at("/fullDescription/text").asString());
            assertEquals(SarifReport.pascalCase(m.id()), rule.get("name").asString(), "every rule has a name");
            assertFalse(rule.get("name").asString().equalsIgnoreCase(m.id()),
                    "SARIF 3.49.7: the name is not the id again (" + m.id() + ")");
            assertFalse(rule.has("helpUri"));
            // The rule's whole reference page, inline: the generated page starts with its id as the title.
            assertTrue(rule.at("/help/markdown").asString().startsWith("# " + m.id() + "\n"),
                    rule.at("/help/markdown").asString());
            assertTrue(rule.at("/help/text").asString().contains(m.rationale()));
            assertEquals(SarifReport.level(m.defaultSeverity()), rule.at("/defaultConfiguration/level").asString());
        }
    }

    @Test
    void mapsSeveritiesToSarifLevels() {
        assertEquals("error", SarifReport.level(Severity.ERROR));
        assertEquals("warning", SarifReport.level(Severity.WARNING));
        assertEquals("note", SarifReport.level(Severity.INFO));
        assertEquals("none", SarifReport.level(Severity.OFF));
    }

    @Test
    void resultsPointAtTheirRuleAndLineRelativeToTheRoot() {
        JsonNode run = sarif(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR))).at("/runs/0");
        JsonNode results = run.get("results");
        assertEquals(5, results.size(), "four findings in a.yaml (one waived) and one in b.yaml");
        JsonNode rules = run.at("/tool/driver/rules");
        for (JsonNode r : results) {
            assertEquals(r.get("ruleId").asString(), rules.get(r.get("ruleIndex").asInt()).get("id").asString());
            assertEquals("%SRCROOT%", r.at("/locations/0/physicalLocation/artifactLocation/uriBaseId").asString());
            assertTrue(r.at("/partialFingerprints").get(SarifReport.FINGERPRINT_KEY).asString().matches("[0-9a-f]{64}"));
            assertFalse(r.has("baselineState"), "no baseline was in force");
        }
        JsonNode first = results.get(0);
        assertEquals("unused-waiver", first.get("ruleId").asString(), "a.yaml's findings come in line order");
        JsonNode error = find(results, "week-sequence");
        assertEquals("error", error.get("level").asString());
        assertEquals("programmes/a.yaml", error.at("/locations/0/physicalLocation/artifactLocation/uri").asString());
        assertEquals(41, error.at("/locations/0/physicalLocation/region/startLine").asInt());
        assertEquals(7, error.at("/locations/0/physicalLocation/region/startColumn").asInt());
        assertFalse(error.at("/locations/0/physicalLocation/region").has("snippet"),
                "programmes/a.yaml is made up: there is no line to quote");
        assertEquals("week 4 follows week 2: week 3 is missing. Fix: fix for week 4 follows week 2: week 3 is missing.",
                error.at("/message/text").asString());
        assertEquals("note", find(results, "unknown-exercise").get("level").asString());
        // The root is declared but not given: an absolute checkout path must not reach code-scanning uploads
        // (SARIF 2.1.0 section 3.14.14 lets a base id omit its uri).
        assertTrue(run.at("/originalUriBaseIds/%SRCROOT%").has("description"));
        assertFalse(run.at("/originalUriBaseIds/%SRCROOT%").has("uri"));
        assertFalse(run.toString().contains(ReportFixtures.ROOT.toString()), "no absolute root path in the SARIF");
    }

    @Test
    void waivedFindingsCarryAnInSourceSuppressionWithTheReason() {
        JsonNode results = sarif(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR)))
                .at("/runs/0/results");
        List<JsonNode> suppressed = new ArrayList<>();
        results.forEach(r -> {
            if (r.has("suppressions")) {
                suppressed.add(r);
            }
        });
        assertEquals(1, suppressed.size());
        JsonNode s = suppressed.get(0).at("/suppressions/0");
        assertEquals("inSource", s.get("kind").asString());
        assertEquals("kept while the club reviews its waivers", s.get("justification").asString());
        assertEquals(29, s.at("/location/physicalLocation/region/startLine").asInt());
    }

    @Test
    void baselinedFindingsAreUnchangedAndFingerprintsIgnoreLineMoves() {
        RunReport run = ReportFixtures.handMadeRun(Severity.ERROR);
        Finding error = run.files().get(0).findings().stream().filter(f -> f.ruleId().equals("week-sequence"))
                .findFirst().orElseThrow();
        JsonNode results = sarif(ReportFixtures.input(ReportFixtures.baselining(run, Set.of(error.fingerprint())))
                .withOptions(ReportOptions.DEFAULTS.withBaselineInForce(true))).at("/runs/0/results");
        assertEquals("unchanged", find(results, "week-sequence").get("baselineState").asString());
        assertEquals("new", find(results, "schema").get("baselineState").asString());

        Finding moved = ReportFixtures.finding("week-sequence", Severity.ERROR, "programmes/a.yaml", 58, 7,
                "/weeks/2/week", "week 4 follows week 2: week 3 is missing");
        assertEquals(Fingerprints.hash(error), Fingerprints.hash(moved));
        Finding other = ReportFixtures.finding("week-sequence", Severity.ERROR, "programmes/a.yaml", 41, 7,
                "/weeks/3/week", "week 4 follows week 2: week 3 is missing");
        assertFalse(Fingerprints.hash(error).equals(Fingerprints.hash(other)));
    }

    @Test
    void reportsTheBrokenSamplesWithTheirRealRules() {
        RunReport run = ReportFixtures.check("sample-programs/broken/week-sequence.yaml",
                "sample-programs/broken/yaml-syntax.yaml");
        JsonNode results = sarif(ReportFixtures.input(run)).at("/runs/0/results");
        assertEquals(run.active().size(), results.size());
        assertEquals("sample-programs/broken/yaml-syntax.yaml",
                find(results, "yaml-syntax").at("/locations/0/physicalLocation/artifactLocation/uri").asString());
        // The snippet is the finding's line as written in the file.
        JsonNode week = find(results, "week-sequence").at("/locations/0/physicalLocation/region");
        List<String> lines;
        try {
            lines = Files.readAllLines(ReportFixtures.ROOT.resolve("sample-programs/broken/week-sequence.yaml"));
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        int first = week.get("startLine").asInt();
        int last = week.has("endLine") ? week.get("endLine").asInt() : first;
        assertEquals(String.join("\n", lines.subList(first - 1, last)), week.at("/snippet/text").asString());
        // The node's span: the value 'week: 4' is written on one line, so it ends where its text ends.
        assertEquals(first, last);
        String line = lines.get(first - 1);
        String value = line.substring(week.get("startColumn").asInt() - 1, week.get("endColumn").asInt() - 1);
        assertEquals(value.strip(), value, "the region covers the value and nothing around it");
        assertFalse(value.isEmpty());
    }

    @Test
    void aRevisionWithoutAServerAddressGivesNoProvenance() {
        ReportOptions options = ReportOptions.DEFAULTS.withGit(
                Optional.of("0123456789abcdef0123456789abcdef01234567"), Optional.of("main"), Optional.empty());
        JsonNode run = sarif(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR)).withOptions(options))
                .at("/runs/0");
        assertTrue(run.path("versionControlProvenance").isMissingNode(), "no repositoryUri, no provenance entry");
    }

    @Test
    void helpLinksAndGitProvenanceAppearOnlyWhenTheFrontEndGivesThem() {
        ReportOptions options = ReportOptions.DEFAULTS.withHelpUriBase(Optional.of("https://docs.example.org/rules"))
                .withGit(Optional.of("0123456789abcdef0123456789abcdef01234567"), Optional.of("main"),
                        Optional.of("https://git.example.org/harbourside/programmes.git"));
        JsonNode run = sarif(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR)).withOptions(options))
                .at("/runs/0");
        assertEquals("https://docs.example.org/rules/week-sequence.md",
                find(run.at("/tool/driver/rules"), "id", "week-sequence").get("helpUri").asString());
        JsonNode vcs = run.at("/versionControlProvenance/0");
        assertEquals("https://git.example.org/harbourside/programmes.git", vcs.get("repositoryUri").asString());
        assertEquals("0123456789abcdef0123456789abcdef01234567", vcs.get("revisionId").asString());
        assertEquals("main", vcs.get("branch").asString());
        assertEquals("%SRCROOT%", vcs.at("/mappedTo/uriBaseId").asString());
        assertEquals("mesolint/check/0123456789abcdef0123456789abcdef01234567",
                run.at("/automationDetails/id").asString());
    }

    @Test
    void spacesInPathsAreEscapedInUris() {
        assertEquals("my%20programmes/a%20b.yaml", SarifReport.relativeUri("my programmes/a b.yaml"));
    }

    /** Where {@code .ci/run} installs the SARIF multitool, whose npm package ships the OASIS schema. */
    private static final Path INSTALLED_SCHEMA = Path.of(System.getProperty("user.home"), ".cache", "mesolint",
            "sarif-multitool", "node_modules", "@microsoft", "sarif-multitool-linux", "sarif-2.1.0.json");

    /**
     * Validates the SARIF of the samples against the OASIS schema when it is present: the multitool's copy that
     * {@code .ci/run} installs, or a path given with {@code -Dmesolint.sarifSchema=.../sarif-2.1.0.json}.
     */
    @Test
    void validatesAgainstTheOasisSchemaWhenProvided() throws IOException {
        String path = System.getProperty("mesolint.sarifSchema", INSTALLED_SCHEMA.toString());
        Assumptions.assumeTrue(!path.isBlank() && Files.isRegularFile(Path.of(path)),
                "no SARIF schema given: run with -Dmesolint.sarifSchema=/path/to/sarif-2.1.0.json");
        Schema schema;
        try (InputStream in = Files.newInputStream(Path.of(path))) {
            schema = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12).getSchema(in);
        }
        for (RunReport run : List.of(ReportFixtures.check("sample-programs"), ReportFixtures.handMadeRun(Severity.INFO))) {
            JsonNode log = sarif(ReportFixtures.input(run));
            List<com.networknt.schema.Error> errors = schema.validate(log);
            assertEquals(List.of(), errors.stream().map(Object::toString).toList());
        }
        JsonNode broken = JSON.readTree("{\"version\": \"2.1.0\", \"runs\": [{\"tool\": {}}]}");
        assertFalse(schema.validate(broken).isEmpty(), "the schema must reject a run without a driver");
    }

    private static JsonNode find(JsonNode results, String ruleId) {
        return find(results, "ruleId", ruleId);
    }

    private static JsonNode find(JsonNode nodes, String key, String value) {
        for (JsonNode r : nodes) {
            if (r.get(key).asString().equals(value)) {
                return r;
            }
        }
        throw new AssertionError("no entry with " + key + " " + value);
    }
}
