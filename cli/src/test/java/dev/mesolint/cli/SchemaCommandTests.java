package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.format.EditorSchemas;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

class SchemaCommandTests {
    private static final JsonMapper JSON = JsonMapper.builder().build();

    @TempDir
    Path repo;

    @Test
    void writesTheFourSchemasWithTheRepositorysExerciseIdsAndReadableMessages() throws IOException {
        Files.writeString(repo.resolve(".mesolint.yaml"), "root: true\ncatalogues: [club.yaml]\n");
        Files.writeString(repo.resolve("club.yaml"), ClubCatalogue.SLED_PUSH);
        Path out = repo.resolve("schemas");
        int exit = MesolintCommand.execute(new String[] {"schema", "--root", repo.toString(), "--out", out.toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()));
        assertEquals(0, exit);
        for (String name : EditorSchemas.FILES) {
            JsonNode schema = JSON.readTree(Files.readString(out.resolve(name)));
            assertFalse(schema.has("$id"), name + ": no site is promised");
        }

        JsonNode programme = JSON.readTree(Files.readString(out.resolve("programme.schema.json")));
        List<String> ids = new ArrayList<>();
        programme.at("/$defs/knownExerciseId/enum").forEach(n -> ids.add(n.asString()));
        assertTrue(ids.contains("harbour-sled-push"), "the repository's catalogue");
        assertTrue(ids.contains("barbell-back-squat"), "the built-in catalogue");
        assertEquals("#/$defs/knownExerciseId",
                programme.at("/$defs/exerciseEntry/properties/exercise/$ref").asString());
        assertEquals("#/$defs/exerciseId", programme.at("/$defs/catalogueEntry/properties/id/$ref").asString(),
                "a new id defined in the programme is not limited to the known ones");
        assertTrue(programme.at("/$defs/reps/then/errorMessage").asString().startsWith("Reps per set:"));

        JsonNode profile = JSON.readTree(Files.readString(out.resolve("profile.schema.json")));
        List<String> rules = new ArrayList<>();
        profile.at("/$defs/ruleId/enum").forEach(n -> rules.add(n.asString()));
        assertTrue(rules.contains("short-rest-compound"), rules.toString());
    }
}
