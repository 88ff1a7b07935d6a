package dev.mesolint.core.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/** Editors show a sentence, never a raw regex or a dump of allowed values, for the catalogue, profile and configuration. */
class EditorSchemaMessagesTests {
    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final Path ROOT = Path.of("..").toAbsolutePath().normalize();

    private static Map<String, String> schemas() {
        List<RuleDefinition> rules = BuiltInRules.all();
        return EditorSchemas.render(new Checker(CheckRequest.of(List.of(), ROOT), rules).catalogue(),
                rules.stream().map(RuleDefinition::id).toList());
    }

    @Test
    void everyEnumAndPatternCarriesAMessage() {
        schemas().forEach((name, text) -> {
            List<String> bare = new ArrayList<>();
            unexplained(JSON.readTree(text), "", bare);
            assertTrue(bare.isEmpty(), name + ": " + bare);
        });
    }

    @Test
    void aTypicalMistakeInEachSchemaReadsAsASentence() {
        Map<String, String> schemas = schemas();
        JsonNode configuration = JSON.readTree(schemas.get("configuration.schema.json"));
        // fail-on: warnings (a plural) is the typical slip.
        assertFalse(configuration.at("/properties/fail-on/errorMessage").asString().isBlank());
        JsonNode profile = JSON.readTree(schemas.get("profile.schema.json"));
        assertEquals("a severity is error, warning, info or off", profile.at("/$defs/severity/errorMessage").asString());
        JsonNode catalogue = JSON.readTree(schemas.get("catalogue.schema.json"));
        // A misspelt muscle: the 18 allowed names are pointed to, not dumped.
        String muscle = catalogue.at("/$defs/catalogueEntry/properties/muscles/propertyNames/errorMessage").asString();
        assertTrue(muscle.startsWith("not a value this field accepts"), muscle);
        // Credit per hard set: a short list is named.
        assertEquals("one of: 0.5, 1",
                catalogue.at("/$defs/catalogueEntry/properties/muscles/additionalProperties/errorMessage").asString());
        // A property called "pattern" is a name, not a constraint: no message lands in the properties map.
        assertFalse(catalogue.at("/$defs/catalogueEntry/properties").has("errorMessage"));
    }

    private static void unexplained(JsonNode node, String pointer, List<String> out) {
        if (node instanceof ObjectNode object) {
            if ((object.has("enum") || object.has("pattern")) && !object.has("errorMessage")
                    && !pointer.endsWith("/properties") && !pointer.endsWith("/$defs")) {
                out.add(pointer);
            }
            object.properties().forEach(e -> unexplained(e.getValue(), pointer + "/" + e.getKey(), out));
        }
        if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                unexplained(node.get(i), pointer + "/" + i, out);
            }
        }
    }
}
