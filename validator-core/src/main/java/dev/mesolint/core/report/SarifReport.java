package dev.mesolint.core.report;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.io.IOException;
import java.io.Writer;
import java.net.URI;
import java.net.URISyntaxException;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * SARIF 2.1.0: one run, every registered rule in {@code tool.driver.rules} with its reference page inline, one result
 * per reported finding with its region and snippet (waived ones carry an in-source suppression), paths relative to
 * {@code %SRCROOT%} (the repository root), git provenance when known, the caution in the run's and the driver's
 * properties. Athlete-constraint reasons are left out unless {@link ReportOptions#includeReasons()}.
 * {@code baselineState} appears only when a baseline was in force; {@code helpUri} only when the front
 * end names where the reference pages are published.
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
        run.putObject("automationDetails").put("id", "mesolint/check/" + input.options().revision().orElse(""));
        // SARIF requires an absolute repositoryUri: without a server address for the origin, no provenance at all
        // (a file: URI of the checkout would leak the machine's layout into code-scanning uploads).
        input.options().revision().filter(r -> input.options().repositoryUri().isPresent()).ifPresent(revision -> {
            ObjectNode vcs = run.putArray("versionControlProvenance").addObject();
            vcs.put("repositoryUri", input.options().repositoryUri().orElseThrow());
            vcs.put("revisionId", revision);
            input.options().branch().ifPresent(b -> vcs.put("branch", b));
            vcs.putObject("mappedTo").put("uriBaseId", SRCROOT);
        });
        // No "uri": the checkout's absolute path would leak the machine's layout into code-scanning uploads; the
        // consumer supplies the root (SARIF 2.1.0, 3.14.14: a base id without a uri is resolved by the consumer).
        run.putObject("originalUriBaseIds").putObject(SRCROOT)
                .putObject("description").put("text", "The folder that the checked programme paths are relative to.");
        // A placeholder keeps the field's place: the results are made one by one as they are written.
        run.putArray("results");
        SourceLines sources = new SourceLines(input.root());
        Stream<ObjectNode> found = input.run().files().stream().flatMap(file -> file.findings().stream())
                .filter(f -> f.severity() != Severity.OFF).map(f -> result(input, f, sources));
        // Resolved findings are located in the base revision's files, which are not on disk: no snippets.
        Stream<ObjectNode> resolved = absent.stream()
                .map(f -> result(input, f, SourceLines.none()).put("baselineState", "absent"));
        run.put("columnKind", "unicodeCodePoints");
        ObjectNode properties = run.putObject("properties");
        properties.put("caution", Mesolint.CAUTION);
        properties.put("failOn", input.run().failOn().label());
        properties.put("failed", input.run().failed());
        JsonText.write(log, run, "results", Stream.concat(found, resolved).iterator(), out);
    }

    private static ObjectNode tool(ReportInput input) {
        ObjectNode driver = JsonText.object();
        driver.put("name", "mesolint");
        driver.put("fullName", "mesolint " + Mesolint.version() + ", a checker for resistance-training programmes");
        driver.put("version", Mesolint.version());
        driver.put("semanticVersion", Mesolint.version());
        driver.putObject("shortDescription").put("text",
                "Checks resistance-training programmes written in YAML the way a compiler checks code.");
        driver.putObject("fullDescription").put("text",
                "Checks resistance-training programmes written in YAML the way a compiler checks code. "
                        + Mesolint.CAUTION);
        ArrayNode rules = driver.putArray("rules");
        input.rules().forEach(r -> rules.add(rule(r, input.options())));
        // The rule-set version changes whenever a default threshold, severity or model figure does.
        driver.putObject("properties").put("caution", Mesolint.CAUTION)
                .put("rulesVersion", Mesolint.RULE_SET_VERSION);
        ObjectNode tool = JsonText.object();
        tool.set("driver", driver);
        return tool;
    }

    static ObjectNode rule(RuleDefinition definition, ReportOptions options) {
        RuleMetadata m = definition.metadata();
        ObjectNode rule = JsonText.object();
        rule.put("id", m.id());
        rule.put("name", pascalCase(m.id()));
        rule.putObject("shortDescription").put("text", m.summary());
        rule.putObject("fullDescription").put("text", m.rationale());
        // The whole reference page inline: a dashboard shows it without any site to link to.
        String markdown = RulePages.page(m.id()).orElse("**" + m.summary() + "**\n\n" + m.rationale()
                + "\n\nSource: " + m.source() + "\n");
        rule.putObject("help")
                .put("text", m.summary() + " " + m.rationale() + " Source: " + m.source() + " " + Mesolint.CAUTION)
                .put("markdown", markdown);
        options.helpUri(m.id()).ifPresent(uri -> rule.put("helpUri", uri));
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

    private static ObjectNode result(ReportInput input, Finding f, SourceLines sources) {
        ObjectNode result = JsonText.object();
        result.put("ruleId", f.ruleId());
        int index = input.ruleIndex(f.ruleId());
        if (index >= 0) {
            result.put("ruleIndex", index);
        }
        result.put("level", level(f.severity()));
        ReportedReasons reasons = new ReportedReasons(input.options());
        result.putObject("message").put("text", reasons.text(f, messageText(f)));
        ObjectNode location = result.putArray("locations").addObject();
        ObjectNode physical = location.putObject("physicalLocation");
        physical.set("artifactLocation", artifactLocation(f.file()));
        ObjectNode region = physical.putObject("region").put("startLine", f.location().line())
                .put("startColumn", f.location().column());
        // The node's whole span when it has one; SARIF's end column is the one after the last character.
        if (f.location().endLine() > f.location().line() || f.location().endColumn() > f.location().column()) {
            region.put("endLine", f.location().endLine()).put("endColumn", f.location().endColumn());
        }
        sources.lines(f.file(), f.location().line(), f.location().endLine())
                .ifPresent(text -> region.putObject("snippet").put("text", reasons.snippet(text)));
        if (!f.location().pointer().isEmpty()) {
            location.putArray("logicalLocations").addObject()
                    .put("fullyQualifiedName", f.location().pointer()).put("kind", "element");
        }
        result.putObject("partialFingerprints").put(FINGERPRINT_KEY, Fingerprints.hash(f));
        if (input.options().baselineInForce()) {
            result.put("baselineState", f.baselined() ? "unchanged" : "new");
        }
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
        boolean internal = input.run().active().stream().anyMatch(f -> f.ruleId().equals(FrameworkRules.INTERNAL_ERROR));
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

    /** {@code week-sequence} → {@code WeekSequence}: SARIF's readable rule name. */
    static String pascalCase(String id) {
        StringBuilder name = new StringBuilder();
        for (String part : id.split("-")) {
            name.append(Character.toUpperCase(part.charAt(0))).append(part.substring(1));
        }
        // SARIF 3.49.7: a name that only differs from the id in case is no name (validators flag it, SARIF1001).
        return name.toString().equalsIgnoreCase(id) ? name + "Check" : name.toString();
    }
}
