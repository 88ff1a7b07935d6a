package dev.mesolint.core.cache;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.FileTiming;
import dev.mesolint.core.engine.OwnFileKind;
import dev.mesolint.core.engine.ProgrammeIdentity;
import dev.mesolint.core.finding.Anchor;
import dev.mesolint.core.finding.Edit;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.source.Location;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/** Findings to JSON and back, field for field, so a cached run prints exactly the lines a fresh run would. */
final class FindingCodec {
    private static final JsonNodeFactory JSON = JsonNodeFactory.instance;

    private FindingCodec() {
    }

    static ObjectNode report(FileReport report) {
        ObjectNode node = JSON.objectNode();
        node.put("file", report.displayPath());
        node.put("profile", report.profile());
        report.identity().ifPresent(i -> {
            ObjectNode identity = node.putObject("identity");
            identity.put("id", i.id());
            location(identity, i.location());
        });
        report.checkedAs().ifPresent(kind -> node.put("checkedAs", kind.name()));
        ArrayNode findings = node.putArray("findings");
        report.findings().forEach(f -> findings.add(finding(f)));
        return node;
    }

    /** A report without its programme or figures: the cache keeps findings, not the loaded model. */
    static FileReport report(JsonNode node) {
        List<Finding> findings = new ArrayList<>();
        for (JsonNode f : required(node, "findings")) {
            findings.add(finding(f));
        }
        JsonNode identity = node.get("identity");
        Optional<ProgrammeIdentity> id = identity == null || identity.isNull() ? Optional.empty()
                : Optional.of(new ProgrammeIdentity(text(identity, "id"), location(identity)));
        Optional<OwnFileKind> checkedAs = node.hasNonNull("checkedAs")
                ? Optional.of(OwnFileKind.valueOf(text(node, "checkedAs"))) : Optional.empty();
        return new FileReport(text(node, "file"), Optional.empty(), text(node, "profile"), findings, Optional.empty(),
                FileTiming.NONE, id, checkedAs);
    }

    private static ObjectNode finding(Finding f) {
        ObjectNode node = JSON.objectNode();
        node.put("rule", f.ruleId());
        node.put("severity", f.severity().label());
        node.put("file", f.file());
        location(node, f.location());
        node.put("message", f.message());
        node.put("fix", f.fix());
        node.put("programme", f.anchor().programme());
        node.put("anchor", f.anchor().path());
        facts(node, f.facts());
        f.waiver().ifPresent(w -> {
            ObjectNode waiver = node.putObject("waiver");
            waiver.put("rule", w.ruleId());
            waiver.put("reason", w.reason());
            waiver.put("wholeFile", w.wholeFile());
            location(waiver, w.location());
        });
        return node;
    }

    private static Finding finding(JsonNode node) {
        Severity severity = Severity.parse(text(node, "severity"))
                .orElseThrow(() -> new IllegalArgumentException("unknown severity " + node.get("severity")));
        Optional<Waiver> waiver = Optional.empty();
        JsonNode w = node.get("waiver");
        if (w != null && !w.isNull()) {
            waiver = Optional.of(new Waiver(text(w, "rule"), text(w, "reason"), location(w),
                    required(w, "wholeFile").asBoolean()));
        }
        return new Finding(text(node, "rule"), severity, text(node, "file"), location(node), text(node, "message"),
                text(node, "fix"), waiver, false, facts(node), new Anchor(text(node, "programme"),
                        text(node, "anchor")));
    }

    private static void facts(ObjectNode node, Facts facts) {
        Subject s = facts.subject();
        ObjectNode subject = node.putObject("subject");
        subject.put("muscle", s.muscle());
        subject.put("exercise", s.exercise());
        subject.put("day", s.day());
        ArrayNode weeks = subject.putArray("weeks");
        s.weeks().forEach(weeks::add);
        facts.measure().ifPresent(m -> {
            ObjectNode measure = node.putObject("measure");
            measure.put("value", m.value());
            measure.put("limit", m.limit());
            measure.put("unit", m.unit());
        });
        facts.edit().ifPresent(e -> {
            ObjectNode edit = node.putObject("edit");
            edit.put("pointer", e.pointer());
            edit.put("key", e.key());
            edit.put("text", e.text());
            // Its own object: the location's pointer (the key) is not the edit's pointer (the entry it changes).
            location(edit.putObject("at"), e.location());
        });
    }

    private static Facts facts(JsonNode node) {
        JsonNode s = required(node, "subject");
        List<Integer> weeks = new ArrayList<>();
        required(s, "weeks").forEach(w -> weeks.add(w.asInt()));
        Facts facts = Facts.about(new Subject(optionalText(s, "muscle"), optionalText(s, "exercise"),
                s.hasNonNull("day") ? s.get("day").asInt() : null, weeks));
        JsonNode m = node.get("measure");
        if (m != null && !m.isNull()) {
            facts = facts.measured(required(m, "value").asDouble(), required(m, "limit").asDouble(),
                    text(m, "unit"));
        }
        JsonNode e = node.get("edit");
        if (e != null && !e.isNull()) {
            facts = facts.withEdit(new Edit(text(e, "pointer"), text(e, "key"), text(e, "text"),
                    location(required(e, "at"))));
        }
        return facts;
    }

    private static String optionalText(JsonNode node, String field) {
        JsonNode value = node.get(field);
        return value == null || value.isNull() ? null : value.asString();
    }

    private static void location(ObjectNode node, Location location) {
        node.put("line", location.line());
        node.put("column", location.column());
        node.put("endLine", location.endLine());
        node.put("endColumn", location.endColumn());
        node.put("pointer", location.pointer());
    }

    private static Location location(JsonNode node) {
        return new Location(required(node, "line").asInt(), required(node, "column").asInt(),
                required(node, "endLine").asInt(), required(node, "endColumn").asInt(), text(node, "pointer"));
    }

    private static String text(JsonNode node, String field) {
        return required(node, field).asString();
    }

    private static JsonNode required(JsonNode node, String field) {
        JsonNode value = node.get(field);
        if (value == null || value.isNull()) {
            throw new IllegalArgumentException("cache entry without '" + field + "'");
        }
        return value;
    }
}
