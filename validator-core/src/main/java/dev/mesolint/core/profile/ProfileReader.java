package dev.mesolint.core.profile;

import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.config.ProfileRef;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.model.NamedModelParameters;
import dev.mesolint.core.model.OneRepMaxRelation;
import dev.mesolint.core.model.ParameterBound;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.value.InvalidValueException;
import dev.mesolint.core.yaml.Pointers;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import tools.jackson.databind.JsonNode;

/**
 * Reads one profile file and checks it against the installed rules: every rule id, parameter name and value is
 * checked here, so a profile that loads can always be applied.
 */
public final class ProfileReader {
    static final List<String> KEYS = List.of("profile", "extends", "description", "rules", "model");
    private static final String MODEL_DOC = "docs/model.md, section 6, lists them with their bounds";
    static final String NAME_PATTERN = "[a-z][a-z0-9]*(-[a-z0-9]+)*";

    /** Rules that report files which could not be loaded: their severity is fixed, or a broken file could pass. */
    static final Set<String> FIXED = FrameworkRules.FIXED_SEVERITY;

    private final Map<String, RuleDefinition> rules;

    /** False for the rules whose severity profiles may not change (those that report unloadable files). */
    public static boolean configurable(String ruleId) {
        return !FIXED.contains(ruleId);
    }

    public ProfileReader(List<? extends RuleDefinition> rules) {
        Map<String, RuleDefinition> byId = new LinkedHashMap<>();
        rules.forEach(r -> byId.put(r.id(), r));
        this.rules = Map.copyOf(byId);
    }

    /**
     * Reads a profile.
     *
     * @param folder the folder that {@code extends} paths are relative to
     */
    public Profile read(ConfigDocument doc, Path folder) throws ConfigProblem {
        JsonNode root = doc.root();
        if (!root.isObject()) {
            throw doc.problemAt("", "a profile must be a mapping of 'key: value' lines",
                    "start from: profile: club-hypertrophy, extends: hypertrophy, rules: {...}");
        }
        doc.onlyKeys(root, "", KEYS, "a profile");
        if (!root.has("profile")) {
            throw doc.problemAt("", "the profile has no name", "add profile: club-hypertrophy (lower-case words "
                    + "joined by hyphens)");
        }
        String name = doc.scalar(root.get("profile"), "/profile", "profile: club-hypertrophy");
        if (!name.matches(NAME_PATTERN)) {
            throw doc.problemAt("/profile", "profile name '" + name + "' is not lower-case words joined by hyphens",
                    "write e.g. profile: club-hypertrophy");
        }
        Optional<ProfileRef> parent = Optional.empty();
        if (root.has("extends")) {
            String text = doc.scalar(root.get("extends"), "/extends", "extends: hypertrophy");
            parent = Optional.of(ProfileRef.of(text, folder, doc.shown(), doc.valueAt("/extends")));
        }
        String description = root.has("description")
                ? doc.scalar(root.get("description"), "/description", "description: what the profile is for") : "";
        Map<String, RuleOverride> overrides = new LinkedHashMap<>();
        JsonNode list = root.get("rules");
        if (list != null && !list.isNull()) {
            doc.mapping(list, "/rules", "rules", "rules: {unstable-surface: {severity: off}}");
            for (Map.Entry<String, JsonNode> e : list.properties()) {
                overrides.put(e.getKey(), override(doc, e.getKey(), e.getValue()));
            }
        }
        return new Profile(name, parent, description, overrides, model(doc, root.get("model")), doc.shown());
    }

    /**
     * The {@code model:} block: training-model parameters by the names docs/model.md gives them, each checked
     * against its bounds here, so a wrong one is located at its value.
     */
    private static ModelOverride model(ConfigDocument doc, JsonNode node) throws ConfigProblem {
        if (node == null || node.isNull()) {
            return ModelOverride.NONE;
        }
        doc.mapping(node, "/model", "model", "model: {recoveryTimeConstantSeconds: 120}");
        Map<String, Object> values = new LinkedHashMap<>();
        for (Map.Entry<String, JsonNode> e : node.properties()) {
            String key = e.getKey();
            String at = Pointers.child("/model", key);
            Optional<NamedModelParameters.Kind> kind = NamedModelParameters.kind(key);
            if (kind.isEmpty()) {
                throw doc.problemAtKey(at, "unknown model parameter '" + key + "'", closestModelName(key)
                        .map(k -> "did you mean '" + k + "'? ").orElse("") + MODEL_DOC);
            }
            values.put(key, modelValue(doc, e.getValue(), at, key, kind.get()));
        }
        return new ModelOverride(values, Optional.of(doc.keyAt("/model")));
    }

    /** A near name, or one that starts the same way: camelCase names are long and have no hyphens to split on. */
    private static Optional<String> closestModelName(String key) {
        String wanted = key.toLowerCase(Locale.ROOT);
        return ConfigDocument.closest(key, NamedModelParameters.names()).or(() -> NamedModelParameters.names()
                .stream().filter(n -> n.toLowerCase(Locale.ROOT).startsWith(wanted)
                        || wanted.startsWith(n.toLowerCase(Locale.ROOT))).findFirst());
    }

    private static Object modelValue(ConfigDocument doc, JsonNode node, String at, String name,
            NamedModelParameters.Kind kind) throws ConfigProblem {
        Object byDefault = NamedModelParameters.value(ModelParameters.defaults(), name);
        String text = doc.scalar(node, at, name + ": " + byDefault).strip();
        if (kind == NamedModelParameters.Kind.RELATION) {
            List<String> names = Arrays.stream(OneRepMaxRelation.values())
                    .map(r -> r.name().toLowerCase(Locale.ROOT)).toList();
            if (!names.contains(text.toLowerCase(Locale.ROOT))) {
                throw doc.problemAt(at, "model " + name + " '" + text + "' is not a 1RM relation", "one of: "
                        + String.join(", ", names));
            }
            return OneRepMaxRelation.valueOf(text.toUpperCase(Locale.ROOT));
        }
        double value;
        try {
            value = Double.parseDouble(text);
        } catch (NumberFormatException e) {
            throw doc.problemAt(at, "model " + name + " '" + text + "' is not a number", "write e.g. " + name + ": "
                    + byDefault + " (in the unit its name says: seconds, minutes, reps, a share of 1RM)");
        }
        ParameterBound bound = ModelParameters.BOUNDS.get(name);
        boolean whole = kind == NamedModelParameters.Kind.WHOLE_NUMBER;
        if (whole && value != Math.rint(value)) {
            throw doc.problemAt(at, "model " + name + " " + text + " is not a whole number", "write a whole number "
                    + "from " + shown(bound.min()) + " to " + shown(bound.max()));
        }
        if (!bound.contains(value)) {
            throw doc.problemAt(at, "model " + name + " " + text + " is outside " + shown(bound.min()) + ".."
                    + shown(bound.max()), "choose a value from " + shown(bound.min()) + " to " + shown(bound.max())
                    + " (" + MODEL_DOC + ")");
        }
        return whole ? (Object) Integer.valueOf((int) value) : (Object) Double.valueOf(value);
    }

    private static String shown(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }

    private RuleOverride override(ConfigDocument doc, String id, JsonNode node) throws ConfigProblem {
        String pointer = Pointers.child("/rules", id);
        RuleDefinition rule = rules.get(id);
        if (rule == null) {
            throw doc.problemAtKey(pointer, "unknown rule '" + id + "'",
                    ConfigDocument.closest(id, rules.keySet()).map(k -> "did you mean '" + k + "'? ").orElse("")
                            + "list the rules with 'mesolint rules'");
        }
        if (FIXED.contains(id)) {
            throw doc.problemAtKey(pointer, "rule '" + id + "' cannot be configured: it reports files that could not "
                    + "be loaded, and a file that cannot be loaded cannot be checked", "remove this entry");
        }
        if (!node.isObject()) {
            // Shorthand: "rule-id: off"
            return new RuleOverride(Optional.of(severity(doc, node, pointer)), Map.of());
        }
        List<String> known = new ArrayList<>();
        known.add("severity");
        rule.metadata().parameters().forEach(p -> known.add(p.name()));
        for (String key : node.propertyNames()) {
            if (!known.contains(key)) {
                String params = rule.metadata().parameters().isEmpty() ? id + " has no parameters, only severity"
                        : "parameters of " + id + ": " + String.join(", ", known.subList(1, known.size()));
                throw doc.problemAtKey(Pointers.child(pointer, key), "unknown parameter '" + key + "' for rule '" + id
                        + "'", ConfigDocument.closest(key, known).map(k -> "did you mean '" + k + "'? ").orElse("")
                                + params);
            }
        }
        Optional<Severity> severity = node.has("severity")
                ? Optional.of(severity(doc, node.get("severity"), Pointers.child(pointer, "severity")))
                : Optional.empty();
        Map<String, Double> values = new LinkedHashMap<>();
        for (RuleParameter p : rule.metadata().parameters()) {
            if (node.has(p.name())) {
                String at = Pointers.child(pointer, p.name());
                String text = doc.scalar(node.get(p.name()), at, p.name() + ": " + p.format(p.defaultValue()));
                try {
                    values.put(p.name(), p.parse(text));
                } catch (InvalidValueException e) {
                    throw doc.problemAt(at, id + " " + p.name() + ": " + e.getMessage(), e.hint());
                }
            }
        }
        return new RuleOverride(severity, values);
    }

    private static Severity severity(ConfigDocument doc, JsonNode node, String pointer) throws ConfigProblem {
        String text = doc.scalar(node, pointer, "severity: warning");
        return Severity.parse(text).orElseThrow(() -> doc.problemAt(pointer, "severity '" + text + "' is not known",
                "one of: error, warning, info, off"));
    }
}
