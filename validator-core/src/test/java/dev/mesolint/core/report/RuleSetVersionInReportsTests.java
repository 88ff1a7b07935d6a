package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.finding.Severity;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** Every machine-readable report and the coach's page name the tool and the rule-set version they were made with. */
class RuleSetVersionInReportsTests {
    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Test
    void jsonAndSarifCarryItAsData() {
        ReportInput input = ReportFixtures.withCatalogue(ReportFixtures.handMadeRun(Severity.WARNING));
        JsonNode json = JSON.readTree(ReportFixtures.render(ReportFormat.JSON, input));
        assertEquals(Mesolint.RULE_SET_VERSION, json.path("tool").path("rulesVersion").asString());
        assertEquals(Mesolint.version(), json.path("tool").path("version").asString());
        JsonNode sarif = JSON.readTree(ReportFixtures.render(ReportFormat.SARIF, input));
        JsonNode driver = sarif.path("runs").get(0).path("tool").path("driver");
        assertEquals(Mesolint.RULE_SET_VERSION, driver.path("properties").path("rulesVersion").asString());
        assertTrue(driver.path("properties").path("caution").asString().contains("PAR-Q+"),
                "the caution stays beside it");
    }

    @Test
    void junitAndHtmlNameIt() {
        ReportInput input = ReportFixtures.withCatalogue(ReportFixtures.handMadeRun(Severity.WARNING));
        assertTrue(ReportFixtures.render(ReportFormat.JUNIT, input).contains(
                "name=\"mesolint.rules-version\" value=\"" + Mesolint.RULE_SET_VERSION + "\""));
        assertTrue(ReportFixtures.render(ReportFormat.HTML, input).contains(Mesolint.RULE_SET_VERSION));
    }
}
