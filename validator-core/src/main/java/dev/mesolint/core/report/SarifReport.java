package dev.mesolint.core.report;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.rules.InternalErrorRule;
import java.io.IOException;
import java.io.Writer;
import java.net.URI;
import java.net.URISyntaxException;
import java.util.List;
import java.util.Locale;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * SARIF 2.1.0: one run, every registered rule in {@code tool.driver.rules}, one result per reported finding (waived
 * ones carry an in-source suppression), paths relative to {@code %SRCROOT%}, the caution in the run's properties.
 */
public final class SarifReport implements ReportWriter {
    static final String SCHEMA = "https://docs.oasis-open.org/sarif/sarif/v2.1.0/errata01/os/schemas/sarif-schema-2.1.0.json";
    static final String SRCROOT = "%SRCROOT%";
    /** The key of our hash in {@code partialFingerprints}; versioned so that a new hash can sit beside the old. */
    static final String FINGERPRINT_KEY = "mesolintFingerprint/v1";

    private final List<Finding> absent;

    /** The run's findings, each {@code new} or (held by a baseline) {@code unchanged}. */
    public SarifReport() {
        this(List.of());
    }

    /**
     * The run's findings, and after them {@code absent}: findings of an earlier run that this one no longer has,
     * reported with {@code baselineState: absent} (a review of a change lists what it resolved).
     */
    public SarifReport(List<Finding> absent) {
        this.absent = List.copyOf(absent);
    }

    @Override
    public void write(ReportInput input, Writer out) throws IOException {
        ObjectNode log = JsonText.object();
        log.put("$schema", SCHEMA);
        log.put("version", "2.1.0");
        ObjectNode run = log.putArray("runs").addObject();
        run.set("tool", tool(input));
        run.putArray("invocations").add(invocation(input));
        run.putObject("originalUriBaseIds").putObject(SRCROOT)
                .put("uri", directoryUri(input))
                .putObject("description").put("text", "The folder that the checked programme paths are relative to.");
        ArrayNode results = run.putArray("results");
        for (FileReport file : input.run().files()) {
            for (Finding f : file.findings()) {
                if (f.severity() != Severity.OFF) {
                    results.add(result(input, f));
                }
            }
        }
        for (Finding f : absent) {
            results.add(result(input, f).put("baselineState", "absent"));
        }
        run.put("columnKind", "unicodeCodePoints");
        ObjectNode properties = run.putObject("properties");
        properties.put("caution", Mesolint.CAUTION);
        properties.put("failOn", input.run().failOn().label());
        properties.put("failed", input.run().failed());
        JsonText.write(log, out);
    }

    private static ObjectNode tool(ReportInput input) {
        ObjectNode driver = JsonText.object();
        driver.put("name", "mesolint");
        driver.put("version", Mesolint.version());
        driver.put("semanticVersion", Mesolint.version());
        driver.put("informationUri", Mesolint.INFORMATION_URI);
        driver.putObject("shortDescription").put("text",
                "Checks resistance-training programmes written in YAML the way a compiler checks code.");
        driver.putObject("fullDescription").put("text",
                "Checks resistance-training programmes written in YAML the way a compiler checks code. "
                        + Mesolint.CAUTION);
        ArrayNode rules = driver.putArray("rules");
        input.rules().forEach(r -> rules.add(rule(r)));
        ObjectNode tool = JsonText.object();
        tool.set("driver", driver);
        return tool;
    }

    static ObjectNode rule(RuleDefinition definition) {
        RuleMetadata m = definition.metadata();
        ObjectNode rule = JsonText.object();
        rule.put("id", m.id());
        String name = pascalCase(m.id());
        if (!name.equalsIgnoreCase(m.id())) {
            // SARIF wants a readable name distinct from the id; a one-word id has none.
            rule.put("name", name);
        }
        rule.putObject("shortDescription").put("text", m.summary());
        rule.putObject("fullDescription").put("text", m.rationale());
        rule.putObject("help")
                .put("text", m.summary() + " " + m.rationale() + " Reference: " + RuleDocs.uri(m.id()))
                .put("markdown", "**" + m.summary() + "**\n\n" + m.rationale() + "\n\nSource: " + m.source()
                        + "\n\nSee [" + RuleDocs.path(m.id()) + "](" + RuleDocs.uri(m.id()) + ").");
        rule.put("helpUri", RuleDocs.uri(m.id()));
        rule.putObject("defaultConfiguration").put("level", level(m.defaultSeverity()));
        ObjectNode properties = rule.putObject("properties");
        properties.put("category", m.category().name().toLowerCase(Locale.ROOT));
        properties.putArray("tags").add("training").add(m.category().name().toLowerCase(Locale.ROOT));
        properties.put("source", m.source());
        if (!m.parameters().isEmpty()) {
            ObjectNode parameters = properties.putObject("parameters");
            for (RuleParameter p : m.parameters()) {
                parameters.putObject(p.name()).put("default", p.format(p.defaultValue()))
                        .put("description", p.description());
            }
        }
        return rule;
    }

    private static ObjectNode result(ReportInput input, Finding f) {
        ObjectNode result = JsonText.object();
        result.put("ruleId", f.ruleId());
        int index = input.ruleIndex(f.ruleId());
        if (index >= 0) {
            result.put("ruleIndex", index);
        }
        result.put("level", level(f.severity()));
        result.putObject("message").put("text", messageText(f));
        ObjectNode location = result.putArray("locations").addObject();
        ObjectNode physical = location.putObject("physicalLocation");
        physical.set("artifactLocation", artifactLocation(f.file()));
        physical.putObject("region").put("startLine", f.location().line()).put("startColumn", f.location().column());
        if (!f.location().pointer().isEmpty()) {
            location.putArray("logicalLocations").addObject()
                    .put("fullyQualifiedName", f.location().pointer()).put("kind", "element");
        }
        result.putObject("partialFingerprints").put(FINGERPRINT_KEY, Fingerprints.hash(f));
        result.put("baselineState", f.baselined() ? "unchanged" : "new");
        f.waiver().ifPresent(w -> {
            ObjectNode suppression = result.putArray("suppressions").addObject();
            suppression.put("kind", "inSource");
            suppression.put("status", "accepted");
            suppression.put("justification", w.reason());
            ObjectNode where = suppression.putObject("location").putObject("physicalLocation");
            where.set("artifactLocation", artifactLocation(f.file()));
            where.putObject("region").put("startLine", w.location().line()).put("startColumn", w.location().column());
        });
        return result;
    }

    private static ObjectNode invocation(ReportInput input) {
        ObjectNode invocation = JsonText.object();
        boolean internal = input.run().active().stream().anyMatch(f -> f.ruleId().equals(InternalErrorRule.ID));
        invocation.put("executionSuccessful", !internal && input.run().missing().isEmpty());
        if (!input.run().missing().isEmpty()) {
            ArrayNode notes = invocation.putArray("toolExecutionNotifications");
            input.run().missing().forEach(m -> notes.addObject().put("level", "error").putObject("message")
                    .put("text", "No such file or folder: " + m + "."));
        }
        return invocation;
    }

    /** The result text: the message, then the fix, as full sentences. */
    static String messageText(Finding f) {
        return sentence(f.message()) + " Fix: " + sentence(f.fix());
    }

    private static String sentence(String text) {
        String t = text.strip();
        return t.endsWith(".") ? t : t + ".";
    }

    /** Maps a severity to a SARIF level: error, warning, note, none. */
    static String level(Severity severity) {
        return switch (severity) {
            case ERROR -> "error";
            case WARNING -> "warning";
            case INFO -> "note";
            case OFF -> "none";
        };
    }

    /** A relative path becomes a URI reference under {@code %SRCROOT%}; a path outside the root an absolute file URI. */
    private static ObjectNode artifactLocation(String displayPath) {
        ObjectNode location = JsonText.object();
        if (isAbsolute(displayPath)) {
            location.put("uri", java.nio.file.Path.of(displayPath).toUri().toString());
        } else {
            location.put("uri", relativeUri(displayPath));
            location.put("uriBaseId", SRCROOT);
        }
        return location;
    }

    private static boolean isAbsolute(String path) {
        return path.startsWith("/") || path.matches("^[A-Za-z]:/.*");
    }

    static String relativeUri(String path) {
        try {
            return new URI(null, null, path, null).toASCIIString();
        } catch (URISyntaxException e) {
            throw new IllegalArgumentException("cannot express " + path + " as a URI", e);
        }
    }

    private static String directoryUri(ReportInput input) {
        String uri = input.root().toUri().toString();
        return uri.endsWith("/") ? uri : uri + "/";
    }

    /** {@code week-sequence} → {@code WeekSequence}: SARIF's readable rule name. */
    static String pascalCase(String id) {
        StringBuilder name = new StringBuilder();
        for (String part : id.split("-")) {
            name.append(Character.toUpperCase(part.charAt(0))).append(part.substring(1));
        }
        return name.toString();
    }
}
