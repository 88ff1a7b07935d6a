package dev.mesolint.core.baseline;

import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.ProgrammeFiles;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.finding.Anchor;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.yaml.Pointers;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The findings a repository accepted when it adopted mesolint. A run compared with the baseline counts only the
 * findings the baseline does not hold.
 *
 * <p>Findings are matched by {@link Finding#fingerprint()}: rule, programme id, logical path and subject, never the
 * message, line numbers, limits, weeks or file path. Each entry says how many findings it held when recorded; it
 * covers every finding with its fingerprint. The file, message and count are kept for the reader only. Three safety
 * rules: a file that did not load (its findings are {@link FrameworkRules#LOAD_FAILURES}) is never covered, since
 * its other problems cannot be seen; errors are recorded only when asked; entries that match nothing are reported
 * ({@link #UNUSED_ENTRY}). Immutable.
 */
public final class Baseline {
    static final int FORMAT = 2;
    /** The rule id of the finding that reports a baseline entry no finding matched. */
    public static final String UNUSED_ENTRY = FrameworkRules.UNUSED_BASELINE_ENTRY;
    private static final List<String> ENTRY_KEYS = List.of("rule", "programme", "anchor", "subject", "file", "message",
            "count");
    /** Baselines of large repositories outgrow the limits meant for one programme. */
    private static final YamlLimits LIMITS = new YamlLimits(64L * 1024 * 1024, 0, 8, 5_000_000);

    /**
     * One accepted finding (or several identical ones).
     *
     * @param file    where the finding was when recorded (for the reader; not matched)
     * @param message the finding's words when recorded (for the reader; not matched)
     * @param at      where the entry is written in the baseline file ({@link Location#START} for a new one)
     */
    public record Entry(String rule, String programme, String anchor, String subject, String file, String message,
            int count, Location at) {
        String fingerprint() {
            return Finding.fingerprint(rule, new Anchor(programme, anchor), subject);
        }
    }

    /**
     * A baseline made from a run, and what it left out.
     *
     * @param errorsLeftOut   active errors not recorded because errors were not asked for
     * @param unloadedLeftOut active findings of files that did not load, never recorded
     */
    public record Recorded(Baseline baseline, int errorsLeftOut, int unloadedLeftOut) {
    }

    private final List<Entry> entries;
    private final String shown;

    private Baseline(List<Entry> entries, String shown) {
        this.entries = List.copyOf(entries);
        this.shown = shown;
    }

    /** The active findings of {@code run}, errors included, in a stable order. */
    public static Baseline of(RunReport run) {
        return record(run, true).baseline();
    }

    /**
     * The active findings of {@code run} (not waived, not off) of files that loaded; errors only when
     * {@code includeErrors}, since an accepted error (a load over an athlete's cap) would then pass silently.
     */
    public static Recorded record(RunReport run, boolean includeErrors) {
        Map<String, Entry> byPrint = new LinkedHashMap<>();
        int errors = 0;
        int unloaded = 0;
        for (FileReport file : run.files()) {
            boolean loaded = loaded(file);
            for (Finding f : file.active()) {
                if (!loaded) {
                    unloaded++;
                } else if (f.severity() == Severity.ERROR && !includeErrors) {
                    errors++;
                } else {
                    byPrint.merge(f.fingerprint(), new Entry(f.ruleId(), f.anchor().programme(), f.anchor().path(),
                            f.subject().identity(), f.file(), f.message(), 1, Location.START),
                            (a, b) -> new Entry(a.rule(), a.programme(), a.anchor(), a.subject(), a.file(),
                                    a.message(), a.count() + 1, a.at()));
                }
            }
        }
        List<Entry> entries = new ArrayList<>(byPrint.values());
        entries.sort(Comparator.comparing(Entry::programme).thenComparing(Entry::anchor).thenComparing(Entry::rule)
                .thenComparing(Entry::subject));
        return new Recorded(new Baseline(entries, ""), errors, unloaded);
    }

    /** True when the file loaded as a programme: no finding says it could not be read, validated or checked. */
    static boolean loaded(FileReport file) {
        return file.findings().stream().noneMatch(Finding::loadFailure);
    }

    public List<Entry> entries() {
        return entries;
    }

    /** How many findings the baseline holds. */
    public int size() {
        return entries.stream().mapToInt(Entry::count).sum();
    }

    /**
     * Marks the active findings of {@code run} that the baseline holds as baselined; the rest stay as they are. An
     * entry covers every finding with its fingerprint: a baselined line that a new repeat or deload week copies, in
     * other words, stays accepted. Findings of a file that did not load stay new. Entries that match nothing are
     * reported as {@link #UNUSED_ENTRY} findings (info) on the baseline file, located at the entry.
     */
    public RunReport apply(RunReport run) {
        Set<String> held = new HashSet<>();
        entries.forEach(e -> held.add(e.fingerprint()));
        Set<String> used = new HashSet<>();
        List<FileReport> files = new ArrayList<>();
        for (FileReport file : run.files()) {
            boolean loaded = loaded(file);
            List<Finding> findings = new ArrayList<>();
            for (Finding f : file.findings()) {
                boolean active = !f.waived() && !f.baselined() && f.severity() != Severity.OFF;
                if (loaded && active && held.contains(f.fingerprint())) {
                    used.add(f.fingerprint());
                    findings.add(f.asBaselined());
                } else {
                    findings.add(f);
                }
            }
            files.add(file.withFindings(findings));
        }
        List<Finding> unused = entries.stream().filter(e -> !used.contains(e.fingerprint())).map(this::unused)
                .toList();
        if (!unused.isEmpty()) {
            files.add(new FileReport(shown, Optional.empty(), "", unused));
        }
        return new RunReport(files, run.failOn(), run.missing(), true);
    }

    private Finding unused(Entry e) {
        return new Finding(UNUSED_ENTRY, Severity.INFO, shown, e.at(), "baseline entry " + e.rule() + " in "
                + e.programme().replaceFirst("^(id|file):", "") + (e.anchor().isEmpty() ? "" : " at " + e.anchor())
                + " matches no finding (fixed, or the programme's id changed)",
                "regenerate the baseline with 'mesolint baseline', or delete the entry", Optional.empty());
    }

    /**
     * {@code report} compared with the workspace's baseline file, when there is one (the option's, else the
     * configuration's): the findings it holds are marked baselined and no longer count. Without one, {@code report}.
     */
    public static RunReport applyConfigured(Workspace workspace, RunReport report) throws ConfigProblem {
        Optional<Path> file = workspace.baselineFile();
        if (file.isEmpty()) {
            return report;
        }
        return read(file.get(), ProgrammeFiles.display(workspace.root(), file.get())).apply(report);
    }

    /** Writes the baseline as JSON, sorted, so that a regenerated baseline diffs cleanly. */
    public void write(Path file) throws IOException {
        JsonMapper json = JsonMapper.builder().build();
        ObjectNode root = json.createObjectNode();
        root.put("format", FORMAT);
        root.put("note", "Findings accepted when this baseline was written, matched by rule, programme id, place and "
                + "subject (never by message or line). 'mesolint check' with this baseline fails only on findings "
                + "not listed here; findings of files that do not load are never covered. Regenerate with "
                + "'mesolint baseline'.");
        ArrayNode list = root.putArray("findings");
        for (Entry e : entries) {
            ObjectNode o = list.addObject();
            o.put("rule", e.rule());
            o.put("programme", e.programme());
            o.put("anchor", e.anchor());
            o.put("subject", e.subject());
            o.put("file", e.file());
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
                    + "leave out the baseline setting");
        }
        ConfigDocument doc = ConfigDocument.read(file, shown, LIMITS);
        JsonNode root = doc.mapping(doc.root(), "", "a baseline", "{\"format\": " + FORMAT + ", \"findings\": []}");
        doc.onlyKeys(root, "", List.of("format", "note", "findings"), "a baseline");
        JsonNode format = root.get("format");
        if (format == null || !format.isIntegralNumber() || format.asInt() != FORMAT) {
            throw doc.problemAt("/format", "this is not a format " + FORMAT + " baseline (format 1 matched findings "
                    + "by their message, which broke on cosmetic edits)",
                    "regenerate it with 'mesolint baseline PATH... --output " + shown + "'");
        }
        JsonNode list = root.get("findings");
        if (list == null || !list.isArray()) {
            throw doc.problemAt("/findings", "the baseline has no findings list", "regenerate it with 'mesolint "
                    + "baseline'");
        }
        List<Entry> entries = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            entries.add(entry(doc, list.get(i), Pointers.child("/findings", i)));
        }
        return new Baseline(entries, shown);
    }

    private static Entry entry(ConfigDocument doc, JsonNode node, String at) throws ConfigProblem {
        JsonNode e = doc.mapping(node, at, "a baseline entry", "{\"rule\": ..., \"programme\": ..., "
                + "\"anchor\": ..., \"subject\": ..., \"count\": 1}");
        doc.onlyKeys(e, at, ENTRY_KEYS, "a baseline entry");
        List<String> text = new ArrayList<>();
        for (String key : ENTRY_KEYS.subList(0, 6)) {
            JsonNode v = e.get(key);
            boolean optional = key.equals("file") || key.equals("message");
            if (v == null && optional) {
                text.add("");
            } else if (v == null || !v.isString()) {
                throw doc.problemAt(v == null ? at : Pointers.child(at, key), "the entry's '" + key
                        + "' is missing or not text", "regenerate the baseline with 'mesolint baseline'");
            } else {
                text.add(v.asString());
            }
        }
        JsonNode count = e.get("count");
        if (count != null && !(count.isIntegralNumber() && count.asInt() >= 1)) {
            throw doc.problemAt(Pointers.child(at, "count"), "count must be a whole number from 1",
                    "write \"count\": 1");
        }
        return new Entry(text.get(0), text.get(1), text.get(2), text.get(3), text.get(4), text.get(5),
                count == null ? 1 : count.asInt(), doc.valueAt(at));
    }
}
