package dev.mesolint.core.baseline;

import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.yaml.Pointers;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The findings a repository accepted when it adopted mesolint. A run compared with the baseline counts only the
 * findings the baseline does not hold.
 *
 * <p>Findings are matched by {@link Finding#fingerprint()}: rule, file, YAML path and message, never line numbers,
 * so edits that only move lines keep them matched. Each entry has a count: two identical findings need two.
 * Immutable.
 */
public final class Baseline {
    static final int FORMAT = 1;
    private static final List<String> ENTRY_KEYS = List.of("rule", "file", "path", "message", "count");
    /** Baselines of large repositories outgrow the limits meant for one programme. */
    private static final YamlLimits LIMITS = new YamlLimits(64L * 1024 * 1024, 0, 8, 5_000_000);

    /** One accepted finding (or several identical ones). */
    public record Entry(String rule, String file, String path, String message, int count) {
        String fingerprint() {
            return Finding.fingerprint(rule, file, path, message);
        }
    }

    private final List<Entry> entries;

    private Baseline(List<Entry> entries) {
        this.entries = List.copyOf(entries);
    }

    /** The active findings of {@code run} (not waived, not off), in a stable order. */
    public static Baseline of(RunReport run) {
        Map<String, Entry> byPrint = new LinkedHashMap<>();
        for (Finding f : run.active()) {
            byPrint.merge(f.fingerprint(), new Entry(f.ruleId(), f.file(), f.location().pointer(), f.message(), 1),
                    (a, b) -> new Entry(a.rule(), a.file(), a.path(), a.message(), a.count() + 1));
        }
        List<Entry> entries = new ArrayList<>(byPrint.values());
        entries.sort(Comparator.comparing(Entry::file).thenComparing(Entry::path).thenComparing(Entry::rule)
                .thenComparing(Entry::message));
        return new Baseline(entries);
    }

    public List<Entry> entries() {
        return entries;
    }

    /** How many findings the baseline holds. */
    public int size() {
        return entries.stream().mapToInt(Entry::count).sum();
    }

    /** Marks the active findings of {@code run} that the baseline holds as baselined; the rest stay as they are. */
    public RunReport apply(RunReport run) {
        Map<String, Integer> left = new HashMap<>();
        entries.forEach(e -> left.merge(e.fingerprint(), e.count(), Integer::sum));
        List<FileReport> files = new ArrayList<>();
        for (FileReport file : run.files()) {
            List<Finding> findings = new ArrayList<>();
            for (Finding f : file.findings()) {
                boolean active = !f.waived() && !f.baselined() && f.severity() != Severity.OFF;
                Integer n = left.get(f.fingerprint());
                if (active && n != null && n > 0) {
                    left.put(f.fingerprint(), n - 1);
                    findings.add(f.asBaselined());
                } else {
                    findings.add(f);
                }
            }
            files.add(new FileReport(file.displayPath(), file.programme(), file.profile(), findings, file.metrics(),
                    file.timing()));
        }
        return new RunReport(files, run.failOn(), run.missing());
    }

    /** Writes the baseline as JSON, sorted, so that a regenerated baseline diffs cleanly. */
    public void write(Path file) throws IOException {
        JsonMapper json = JsonMapper.builder().build();
        ObjectNode root = json.createObjectNode();
        root.put("format", FORMAT);
        root.put("note", "Findings accepted when this baseline was written. 'mesolint check' with this baseline "
                + "fails only on findings not listed here. Regenerate with 'mesolint baseline'.");
        ArrayNode list = root.putArray("findings");
        for (Entry e : entries) {
            ObjectNode o = list.addObject();
            o.put("rule", e.rule());
            o.put("file", e.file());
            o.put("path", e.path());
            o.put("message", e.message());
            o.put("count", e.count());
        }
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        Files.writeString(file, json.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n",
                StandardCharsets.UTF_8);
    }

    /** Reads a baseline file; any problem is located at the key or value at fault. */
    public static Baseline read(Path file, String shown) throws ConfigProblem {
        if (!Files.isRegularFile(file)) {
            throw new ConfigProblem(shown, null, "no baseline file", "write one with 'mesolint baseline PATH...', or "
                    + "leave out --baseline (and baseline: in .mesolint.yaml)");
        }
        ConfigDocument doc = ConfigDocument.read(file, shown, LIMITS);
        JsonNode root = doc.mapping(doc.root(), "", "a baseline", "{\"format\": 1, \"findings\": []}");
        doc.onlyKeys(root, "", List.of("format", "note", "findings"), "a baseline");
        JsonNode format = root.get("format");
        if (format == null || !format.isIntegralNumber() || format.asInt() != FORMAT) {
            throw doc.problemAt("/format", "this is not a format " + FORMAT + " baseline",
                    "regenerate it with 'mesolint baseline PATH... --output " + shown + "'");
        }
        JsonNode list = root.get("findings");
        if (list == null || !list.isArray()) {
            throw doc.problemAt("/findings", "the baseline has no findings list", "regenerate it with 'mesolint "
                    + "baseline'");
        }
        List<Entry> entries = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            String at = Pointers.child("/findings", i);
            JsonNode e = doc.mapping(list.get(i), at, "a baseline entry", "{\"rule\": ..., \"file\": ..., "
                    + "\"path\": ..., \"message\": ..., \"count\": 1}");
            doc.onlyKeys(e, at, ENTRY_KEYS, "a baseline entry");
            List<String> text = new ArrayList<>();
            for (String key : ENTRY_KEYS.subList(0, 4)) {
                JsonNode v = e.get(key);
                if (v == null || !v.isString()) {
                    throw doc.problemAt(v == null ? at : Pointers.child(at, key), "the entry's '" + key
                            + "' is missing or not text", "regenerate the baseline with 'mesolint baseline'");
                }
                text.add(v.asString());
            }
            JsonNode count = e.get("count");
            if (count != null && !(count.isIntegralNumber() && count.asInt() >= 1)) {
                throw doc.problemAt(Pointers.child(at, "count"), "count must be a whole number from 1",
                        "write \"count\": 1");
            }
            entries.add(new Entry(text.get(0), text.get(1), text.get(2), text.get(3),
                    count == null ? 1 : count.asInt()));
        }
        return new Baseline(entries);
    }
}
