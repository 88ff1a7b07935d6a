package dev.mesolint.core.config;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.ruleset.RuleSetVersion;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** {@code rules-version:} in the repository configuration, and the configuration schema that editors read. */
class RulesVersionSettingTests {
    @TempDir
    Path dir;

    private RepositoryConfig read(String text) throws Exception {
        Path file = dir.resolve(RepositoryConfig.FILE_NAME);
        Files.writeString(file, text);
        return RepositoryConfigReader.read(file, ".mesolint.yaml", dir, false);
    }

    @Test
    void theRecordedVersionIsRead() throws Exception {
        assertEquals(RuleSetVersion.parse("2026.12.0"), read("rules-version: 2026.12.0\n").rulesVersion());
        assertEquals(Optional.empty(), read("fail-on: warning\n").rulesVersion());
    }

    @Test
    void aVersionInAnotherFormIsALocatedErrorNamingTheCurrentOne() {
        ConfigProblem p = assertThrows(ConfigProblem.class, () -> read("fail-on: error\nrules-version: 2026.12\n"));
        assertEquals(".mesolint.yaml:2:16: rules-version '2026.12' is not a rule-set version (YEAR.MONTH.RELEASE) "
                + "(fix: write rules-version: " + RuleSetVersion.current() + ", the rule set of this mesolint "
                + "('mesolint --version' names it))", p.describe());
    }

    @Test
    void theConfigurationSchemaKnowsEveryKeyTheReaderAccepts() throws IOException {
        JsonNode schema;
        try (InputStream in = getClass().getResourceAsStream("/dev/mesolint/schema/configuration.schema.json")) {
            schema = JsonMapper.builder().build().readTree(in.readAllBytes());
        }
        List<String> keys = new ArrayList<>(schema.get("properties").propertyNames());
        assertEquals(RepositoryConfigReader.KEYS.stream().sorted().toList(), keys.stream().sorted().toList());
        String pattern = schema.at("/properties/rules-version/pattern").asString();
        for (String text : List.of("2026.12.1", "2027.01.10", "2026.13.1", "2026.1.1", "2026.12", "v2026.12.1")) {
            assertEquals(RuleSetVersion.parse(text).isPresent(), text.matches(pattern),
                    "the schema and the reader agree on " + text);
        }
    }
}
