package dev.mesolint.core.config;

import dev.mesolint.core.catalogue.Named;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Goal;
import dev.mesolint.core.ruleset.RuleSetVersion;
import dev.mesolint.core.value.InvalidValueException;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.yaml.Pointers;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tools.jackson.databind.JsonNode;

/** Reads and checks the repository configuration file; every problem is located at the key or value at fault. */
public final class RepositoryConfigReader {
    static final List<String> KEYS = List.of("profile", "goals", "folders", "catalogues", "fail-on", "baseline", "root",
            "plate-increment", "rules-version");
    private static final List<String> FOLDER_KEYS = List.of("match", "profile");
    private static final String EXAMPLE = "folders: [{match: rehab/, profile: profiles/rehab.yaml}]";

    private RepositoryConfigReader() {
    }

    /**
     * Whether {@code file} says {@code root: true}. A file that cannot be read says nothing here: the run reads it in
     * full and reports its problems at their place.
     */
    static boolean declaresRoot(Path file) {
        try {
            JsonNode root = ConfigDocument.read(file, file.toString()).root();
            return root.isObject() && root.has(RepositoryLayout.ROOT_KEY)
                    && root.get(RepositoryLayout.ROOT_KEY).isBoolean() && root.get(RepositoryLayout.ROOT_KEY).asBoolean();
        } catch (ConfigProblem e) {
            return false;
        }
    }

    /**
     * Reads {@code file}; {@code shown} is how messages name it (relative to the root where possible). Every path it
     * names must lie inside the folder that holds it.
     */
    public static RepositoryConfig read(Path file, String shown) throws ConfigProblem {
        return read(file, shown, file.toAbsolutePath().normalize().getParent(), false);
    }

    /**
     * Reads {@code file}; every path it names (catalogues, profile files, baseline) must lie inside {@code root} once
     * links are resolved, unless {@code allowOutsideRoot}: a configuration must not make mesolint read, and quote
     * back, a file elsewhere on the machine.
     */
    public static RepositoryConfig read(Path file, String shown, Path root, boolean allowOutsideRoot)
            throws ConfigProblem {
        return read(file, shown, root, allowOutsideRoot, SettingNames.NEUTRAL);
    }

    /** As above; a refused path's hint names the caller's setting that would accept it, if it offers one. */
    public static RepositoryConfig read(Path file, String shown, Path root, boolean allowOutsideRoot,
            SettingNames names) throws ConfigProblem {
        ConfigDocument doc = ConfigDocument.read(file, shown);
        RepositoryConfig config = parse(doc, file);
        if (!allowOutsideRoot) {
            new Confinement(doc, root, names.find(SettingNames.ALLOW_OUTSIDE_ROOT)).check(config);
        }
        return config;
    }

    private static RepositoryConfig parse(ConfigDocument doc, Path file) throws ConfigProblem {
        Path base = file.toAbsolutePath().normalize().getParent();
        JsonNode root = doc.root();
        if (!root.isObject()) {
            throw doc.problemAt("", "the configuration must be a mapping of 'key: value' lines",
                    "start from: profile: hypertrophy");
        }
        doc.onlyKeys(root, "", KEYS, "the repository configuration");
        if (root.has(RepositoryLayout.ROOT_KEY) && !root.get(RepositoryLayout.ROOT_KEY).isBoolean()) {
            throw doc.problemAt("/root", "root must be true or false",
                    "write root: true to stop the search for the repository root at this folder");
        }
        Optional<ProfileRef> profile = Optional.empty();
        if (root.has("profile")) {
            profile = Optional.of(ref(doc, root.get("profile"), "/profile", base));
        }
        Optional<Severity> failOn = Optional.empty();
        if (root.has("fail-on")) {
            String text = doc.scalar(root.get("fail-on"), "/fail-on", "fail-on: warning");
            failOn = Optional.of(Severity.parseFailLevel(text).orElseThrow(() -> doc.problemAt(
                    "/fail-on", "fail-on '" + text + "' is not a level", "one of: error, warning, info")));
        }
        Optional<Path> baseline = Optional.empty();
        if (root.has("baseline")) {
            baseline = Optional.of(base.resolve(doc.scalar(root.get("baseline"), "/baseline",
                    "baseline: .mesolint-baseline.json")).normalize());
        }
        return new RepositoryConfig(Optional.of(file.toAbsolutePath().normalize()), profile,
                goals(doc, root.get("goals"), base), folders(doc, root.get("folders"), base),
                catalogues(doc, root.get("catalogues"), base), failOn, baseline, plateIncrement(doc, root),
                rulesVersion(doc, root));
    }

    private static Optional<Load.Absolute> plateIncrement(ConfigDocument doc, JsonNode root) throws ConfigProblem {
        if (!root.has("plate-increment")) {
            return Optional.empty();
        }
        String text = doc.scalar(root.get("plate-increment"), "/plate-increment", "plate-increment: 2.5kg");
        try {
            if (Load.parse(text) instanceof Load.Absolute step) {
                return Optional.of(step);
            }
        } catch (InvalidValueException e) {
            // reported below with the configuration's own hint
        }
        throw doc.problemAt("/plate-increment", "plate-increment '" + text + "' is not a weight",
                "write the smallest loading step with its unit: plate-increment: 2.5kg (or 5lb)");
    }

    private static Optional<RuleSetVersion> rulesVersion(ConfigDocument doc, JsonNode root) throws ConfigProblem {
        if (!root.has("rules-version")) {
            return Optional.empty();
        }
        String example = "rules-version: " + RuleSetVersion.current();
        String text = doc.scalar(root.get("rules-version"), "/rules-version", example);
        return Optional.of(RuleSetVersion.parse(text).orElseThrow(() -> doc.problemAt("/rules-version",
                "rules-version '" + text + "' is not a rule-set version (YEAR.MONTH.RELEASE)", "write " + example
                        + ", the rule set of this mesolint ('mesolint --version' names it)")));
    }

    private static ProfileRef ref(ConfigDocument doc, JsonNode node, String pointer, Path base) throws ConfigProblem {
        String text = doc.scalar(node, pointer, "profile: strength, or profile: profiles/club.yaml");
        if (text.isBlank()) {
            throw doc.problemAt(pointer, "the profile is empty", "name a profile (hypertrophy, strength, "
                    + "general-fitness) or the path of a team profile file");
        }
        return ProfileRef.of(text, base, doc.shown(), doc.valueAt(pointer));
    }

    private static Map<Goal, ProfileRef> goals(ConfigDocument doc, JsonNode node, Path base) throws ConfigProblem {
        Map<Goal, ProfileRef> goals = new EnumMap<>(Goal.class);
        if (node == null) {
            return goals;
        }
        doc.mapping(node, "/goals", "goals", "goals: {strength: profiles/club-strength.yaml}");
        List<String> names = Arrays.stream(Goal.values()).map(Goal::yamlName).toList();
        doc.onlyKeys(node, "/goals", names, "goals (one entry per programme goal)");
        for (Map.Entry<String, JsonNode> e : node.properties()) {
            String pointer = Pointers.child("/goals", e.getKey());
            goals.put(Named.byYamlName(Goal.class, e.getKey()).orElseThrow(), ref(doc, e.getValue(), pointer, base));
        }
        return goals;
    }

    private static List<FolderRule> folders(ConfigDocument doc, JsonNode node, Path base) throws ConfigProblem {
        List<FolderRule> rules = new ArrayList<>();
        if (node == null) {
            return rules;
        }
        if (!node.isArray()) {
            throw doc.problemAt("/folders", "folders must be a list", "write " + EXAMPLE);
        }
        for (int i = 0; i < node.size(); i++) {
            String pointer = Pointers.child("/folders", i);
            JsonNode entry = doc.mapping(node.get(i), pointer, "a folders entry", "{match: rehab/, profile: rehab}");
            doc.onlyKeys(entry, pointer, FOLDER_KEYS, "a folders entry");
            for (String key : FOLDER_KEYS) {
                if (!entry.has(key)) {
                    throw doc.problemAt(pointer, "the folders entry has no '" + key + "'",
                            "write {match: rehab/, profile: profiles/rehab.yaml}");
                }
            }
            String match = doc.scalar(entry.get("match"), Pointers.child(pointer, "match"), "match: rehab/");
            ProfileRef profile = ref(doc, entry.get("profile"), Pointers.child(pointer, "profile"), base);
            try {
                rules.add(new FolderRule(match, profile));
            } catch (IllegalArgumentException e) {
                throw doc.problemAt(Pointers.child(pointer, "match"), "'" + match + "' is not a valid folder or glob",
                        "write a folder (rehab/) or a glob (rehab/**/*.yaml)");
            }
        }
        return rules;
    }

    private static List<Path> catalogues(ConfigDocument doc, JsonNode node, Path base) throws ConfigProblem {
        List<Path> files = new ArrayList<>();
        if (node == null) {
            return files;
        }
        if (!node.isArray()) {
            throw doc.problemAt("/catalogues", "catalogues must be a list of files",
                    "write catalogues: [catalogue/club-exercises.yaml]");
        }
        for (int i = 0; i < node.size(); i++) {
            String pointer = Pointers.child("/catalogues", i);
            files.add(base.resolve(doc.scalar(node.get(i), pointer, "catalogue/club-exercises.yaml")).normalize());
        }
        return files;
    }
}
