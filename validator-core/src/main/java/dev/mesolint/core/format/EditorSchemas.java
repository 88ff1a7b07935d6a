package dev.mesolint.core.format;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Exercise;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The JSON Schemas an editor's YAML language server reads: the programme schema with the exercise ids of this
 * repository's catalogue (for completion and checking), and the catalogue, configuration and profile schemas. Each
 * carries readable messages ({@code errorMessage}, which language servers show instead of a raw pattern) taken from
 * the descriptions the schemas already have. Written as local files, so nothing is fetched.
 */
public final class EditorSchemas {
    /** The file names written, in order. */
    /** Up to this many allowed values are named in a message; longer lists are pointed to instead. */
    private static final int ENUM_LISTED = 8;
    private static final java.util.Set<String> NAMED_SCHEMAS = java.util.Set.of("properties", "$defs",
            "patternProperties", "dependentSchemas");

    public static final List<String> FILES = List.of("programme.schema.json", "catalogue.schema.json",
            "configuration.schema.json", "profile.schema.json");

    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final String FOLDER = "/dev/mesolint/schema/";
    /** Where in the programme schema an exercise is named by id (not where a new id is defined). */
    private static final List<String> NAMING = List.of("/$defs/exerciseEntry/properties/exercise",
            "/$defs/supersetItem/properties/exercise", "/$defs/adjust/properties/only/items",
            "/$defs/constraint/properties/avoid/items");

    private EditorSchemas() {
    }

    /** File name to JSON text, for {@code catalogue}'s exercises and the rules {@code ruleIds}. */
    public static Map<String, String> render(Catalogue catalogue, Collection<String> ruleIds) {
        Map<String, String> files = new LinkedHashMap<>();
        files.put("programme.schema.json", text(programme(catalogue)));
        files.put("catalogue.schema.json", text(readable(load("catalogue.schema.json"))));
        files.put("configuration.schema.json", text(readable(load("configuration.schema.json"))));
        ObjectNode profile = readable(load("profile.schema.json"));
        ArrayNode ids = ((ObjectNode) profile.at("/$defs/ruleId")).putArray("enum");
        ruleIds.stream().sorted().forEach(ids::add);
        ((ObjectNode) profile.at("/$defs/ruleId")).put("errorMessage",
                "not a rule id; 'mesolint rules' lists them");
        files.put("profile.schema.json", text(profile));
        return files;
    }

    static ObjectNode programme(Catalogue catalogue) {
        ObjectNode schema = readable(load("programme.schema.json"));
        ObjectNode known = ((ObjectNode) schema.get("$defs")).putObject("knownExerciseId");
        known.put("description", "An exercise id from the built-in catalogue or this repository's catalogue files "
                + "('mesolint catalogue search WORDS' finds one).");
        known.put("type", "string");
        ArrayNode ids = known.putArray("enum");
        catalogue.entries().stream().map(Exercise::id).sorted().forEach(ids::add);
        known.put("errorMessage", "unknown exercise id: choose one the catalogue has ('mesolint catalogue search "
                + "WORDS'), or add it to a catalogue file and run 'mesolint schema' again");
        for (String pointer : NAMING) {
            JsonNode node = schema.at(pointer);
            if (node instanceof ObjectNode object && object.has("$ref")) {
                object.put("$ref", "#/$defs/knownExerciseId");
            }
        }
        return schema;
    }

    /** The schema without its {@code $id} (no site is promised), with a message on every described definition. */
    static ObjectNode readable(ObjectNode schema) {
        schema.remove("$id");
        JsonNode defs = schema.get("$defs");
        if (defs instanceof ObjectNode all) {
            for (Iterator<Map.Entry<String, JsonNode>> it = all.properties().iterator(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> def = it.next();
                if (def.getValue() instanceof ObjectNode d && d.has("description") && !d.has("errorMessage")) {
                    String message = d.get("description").asString();
                    d.put("errorMessage", message);
                    // A message on the branch that fails, too: servers report the innermost schema.
                    for (String branch : List.of("then", "else")) {
                        if (d.get(branch) instanceof ObjectNode b) {
                            b.put("errorMessage", message);
                        }
                    }
                }
            }
        }
        constrainedValues(schema);
        return schema;
    }

    /**
     * A message on every enum or pattern not yet covered, anywhere in the schema: editors otherwise show the raw
     * regex or the whole list of allowed values.
     */
    private static void constrainedValues(JsonNode node) {
        if (node instanceof ObjectNode object) {
            if ((object.has("enum") || object.has("pattern")) && !object.has("errorMessage")) {
                object.put("errorMessage", messageFor(object));
            }
            for (Map.Entry<String, JsonNode> child : object.properties()) {
                if (NAMED_SCHEMAS.contains(child.getKey()) && child.getValue() instanceof ObjectNode named) {
                    // A map from names to schemas: its keys are names (a property may be called "pattern").
                    named.properties().forEach(entry -> constrainedValues(entry.getValue()));
                } else {
                    constrainedValues(child.getValue());
                }
            }
        } else if (node instanceof ArrayNode array) {
            array.forEach(EditorSchemas::constrainedValues);
        }
    }

    private static String messageFor(ObjectNode constrained) {
        if (constrained.has("description")) {
            return constrained.get("description").asString();
        }
        if (constrained.get("enum") instanceof ArrayNode values && values.size() <= ENUM_LISTED) {
            List<String> names = new ArrayList<>();
            values.forEach(v -> names.add(v.asString()));
            return "one of: " + String.join(", ", names);
        }
        return constrained.has("enum") ? "not a value this field accepts: see the format documentation"
                : "not in the form this field expects: see the format documentation";
    }

    private static ObjectNode load(String name) {
        try (InputStream in = EditorSchemas.class.getResourceAsStream(FOLDER + name)) {
            if (in == null) {
                throw new IllegalStateException("the schema " + name + " is missing from the core jar");
            }
            return (ObjectNode) JSON.readTree(in.readAllBytes());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String text(JsonNode node) {
        return JSON.writerWithDefaultPrettyPrinter().writeValueAsString(node) + "\n";
    }
}
