package dev.mesolint.core.cache;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
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
        return new FileReport(text(node, "file"), Optional.empty(), text(node, "profile"), findings, Optional.empty());
    }

    private static ObjectNode finding(Finding f) {
        ObjectNode node = JSON.objectNode();
        node.put("rule", f.ruleId());
        node.put("severity", f.severity().label());
        node.put("file", f.file());
        location(node, f.location());
        node.put("message", f.message());
        node.put("fix", f.fix());
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
                text(node, "fix"), waiver);
    }

    private static void location(ObjectNode node, Location location) {
        node.put("line", location.line());
        node.put("column", location.column());
        node.put("pointer", location.pointer());
    }

    private static Location location(JsonNode node) {
        return new Location(required(node, "line").asInt(), required(node, "column").asInt(), text(node, "pointer"));
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
