package dev.mesolint.core.reference;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.profile.BuiltInProfiles;
import dev.mesolint.core.profile.ProfileReader;
import dev.mesolint.core.profile.ProfileSet;
import dev.mesolint.core.report.ConsoleReport;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.rule.RuleSettings;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * Writes the rule reference: one Markdown page per rule from its metadata, the built-in profiles and its fixture
 * examples, and an index. The pages in {@code docs/rules/} are this class's output; a test fails when they are stale.
 */
public final class RuleReference {
    /** How to regenerate the pages, quoted in every page. */
    public static final String REGENERATE = "mvn -o -q -B -pl validator-core -am test -Dtest=RuleReferenceTests "
            + "-Dsurefire.failIfNoSpecifiedTests=false -Dmesolint.regenerateDocs=true";

    private final List<? extends RuleDefinition> rules;
    private final ProfileSet profiles;

    public RuleReference(List<? extends RuleDefinition> rules, ProfileSet profiles) {
        this.rules = List.copyOf(rules);
        this.profiles = profiles;
    }

    /** A rule's failing and passing example, and what mesolint reported for the failing one. */
    public record Examples(RuleExample failing, FileReport failingReport, RuleExample passing) {
    }

    /**
     * Each rule's examples from a fixture folder ({@code <rule-id>/failing*.yaml}, {@code passing*.yaml}; the plain
     * {@code failing.yaml} and {@code passing.yaml} are preferred), with the failing one checked.
     */
    public Map<String, Examples> examples(Path fixtures) throws IOException {
        List<RuleExample> all = new ArrayList<>();
        for (Path p : RuleExample.find(fixtures)) {
            all.add(RuleExample.read(p));
        }
        Map<String, RuleExample> failing = new LinkedHashMap<>();
        Map<String, RuleExample> passing = new LinkedHashMap<>();
        for (RuleExample e : all) {
            Map<String, RuleExample> into = e.failing() ? failing : passing;
            String plain = e.failing() ? "failing.yaml" : "passing.yaml";
            if (!into.containsKey(e.ruleId()) || e.file().getFileName().toString().equals(plain)) {
                into.put(e.ruleId(), e);
            }
        }
        Map<Path, FileReport> reports = ExampleRun.check(List.copyOf(failing.values()), fixtures, rules);
        Map<String, Examples> examples = new LinkedHashMap<>();
        failing.forEach((id, f) -> {
            if (passing.containsKey(id) && reports.containsKey(f.file())) {
                examples.put(id, new Examples(f, reports.get(f.file()), passing.get(id)));
            }
        });
        return examples;
    }

    /** Every page by file name: {@code <rule-id>.md} and {@code README.md}. */
    public Map<String, String> pages(Map<String, Examples> examples) {
        Map<String, String> pages = new LinkedHashMap<>();
        pages.put("README.md", index());
        for (RuleDefinition rule : rules) {
            pages.put(rule.id() + ".md", page(rule, Optional.ofNullable(examples.get(rule.id()))));
        }
        return pages;
    }

    /** The index of all rules with their severity in each built-in profile. */
    public String index() {
        StringBuilder out = new StringBuilder();
        out.append("# Rule reference\n\n").append(generatedNote()).append('\n');
        out.append("Every rule mesolint applies, with its severity in each built-in profile (`off` = not checked). ")
                .append("Teams change severities and parameters in their own profiles: see ")
                .append("[profiles](../profiles.md).\n\n");
        out.append("| Rule | Category | ");
        BuiltInProfiles.NAMES.forEach(n -> out.append(n).append(" | "));
        out.append("Checks |\n|---|---|");
        BuiltInProfiles.NAMES.forEach(n -> out.append("---|"));
        out.append("---|\n");
        for (RuleDefinition rule : rules) {
            RuleMetadata m = rule.metadata();
            out.append("| [").append(m.id()).append("](").append(m.id()).append(".md) | ")
                    .append(m.category().name().toLowerCase(Locale.ROOT)).append(" | ");
            BuiltInProfiles.NAMES.forEach(n -> out.append(settings(n, rule).severity().label()).append(" | "));
            out.append(m.summary().replace("|", "\\|")).append(" |\n");
        }
        out.append('\n').append(caution());
        return out.toString();
    }

    /** One rule's page; without examples for a rule that has no fixtures (e.g. a rule pack's). */
    public String page(RuleDefinition rule, Optional<Examples> examples) {
        RuleMetadata m = rule.metadata();
        StringBuilder out = new StringBuilder();
        out.append("# ").append(m.id()).append("\n\n").append(generatedNote()).append('\n');
        out.append(m.summary()).append("\n\n");
        out.append("Category: ").append(m.category().name().toLowerCase(Locale.ROOT)).append(". Default severity: ")
                .append(m.defaultSeverity().label()).append(".\n\n");
        byProfile(rule, out);
        parameters(m, out);
        out.append("## Why\n\n").append(m.rationale()).append("\n\n");
        out.append("Source: ").append(m.source()).append(".\n\n");
        examples.ifPresent(e -> examples(m, e, out));
        configuring(m, out);
        out.append(caution());
        return out.toString();
    }

    private void byProfile(RuleDefinition rule, StringBuilder out) {
        List<RuleParameter> params = rule.metadata().parameters();
        out.append("## By profile\n\n| Profile | Severity |");
        params.forEach(p -> out.append(" `").append(p.name()).append("` |"));
        out.append("\n|---|---|");
        params.forEach(p -> out.append("---|"));
        out.append('\n');
        for (String name : BuiltInProfiles.NAMES) {
            RuleSettings s = settings(name, rule);
            out.append("| ").append(name).append(name.equals(BuiltInProfiles.DEFAULT) ? " (default)" : "").append(" | ")
                    .append(s.severity().label()).append(" |");
            params.forEach(p -> out.append(' ').append(p.format(s.value(p.name()))).append(" |"));
            out.append('\n');
        }
        out.append('\n');
    }

    private static void parameters(RuleMetadata m, StringBuilder out) {
        if (m.parameters().isEmpty()) {
            return;
        }
        out.append("## Parameters\n\n| Parameter | Meaning | Default | Allowed |\n|---|---|---|---|\n");
        for (RuleParameter p : m.parameters()) {
            out.append("| `").append(p.name()).append("` | ").append(p.description()).append(" | ")
                    .append(p.format(p.defaultValue())).append(" | ").append(p.format(p.min())).append(" to ")
                    .append(p.format(p.max())).append(" |\n");
        }
        out.append('\n');
    }

    private static void examples(RuleMetadata m, Examples e, StringBuilder out) {
        out.append("## Example: reported\n\n");
        e.failing().profile().ifPresent(p -> out.append("Checked with the `").append(p).append("` profile. "));
        out.append("Lines marked `# expect:` are where mesolint reports (these markers drive the tests).\n\n");
        out.append("```yaml\n").append(e.failing().text().stripTrailing()).append("\n```\n\n");
        List<Finding> findings = e.failingReport().findings().stream()
                .filter(f -> f.ruleId().equals(m.id())).toList();
        if (!findings.isEmpty()) {
            out.append("mesolint reports:\n\n```text\n");
            for (Finding f : findings) {
                out.append(ConsoleReport.line(f)).append("\n    fix: ").append(f.fix()).append('\n');
            }
            out.append("```\n\n");
        }
        out.append("## Example: not reported\n\n");
        e.passing().profile().ifPresent(p -> out.append("Checked with the `").append(p).append("` profile.\n\n"));
        out.append("```yaml\n").append(e.passing().text().stripTrailing()).append("\n```\n\n");
    }

    private static void configuring(RuleMetadata m, StringBuilder out) {
        out.append("## Configuring and waiving\n\n");
        if (!ProfileReader.configurable(m.id())) {
            out.append(m.id().equals(FrameworkRules.DUPLICATE_PROGRAMME_ID)
                    ? "This rule reports programmes that cannot be told apart. Its severity is fixed and it cannot "
                            + "be waived: give each programme its own id.\n\n"
                    : "This rule reports files that could not be loaded. Its severity is fixed and it cannot be "
                            + "waived: fix the file.\n\n");
            return;
        }
        String params = m.parameters().stream().map(p -> ", " + p.name() + ": " + p.format(p.defaultValue()))
                .collect(Collectors.joining());
        out.append("In a team profile (see [profiles](../profiles.md)):\n\n```yaml\nrules:\n  ").append(m.id())
                .append(": {severity: ").append(m.defaultSeverity().label()).append(params).append("}\n```\n\n")
                .append("In a programme, on the file, a week, session, exercise entry, set, superset or superset ")
                .append("item, with the reason:\n\n```yaml\nwaive:\n  - rule: ").append(m.id())
                .append("\n    reason: why this does not apply here, and who decided\n```\n\n");
    }

    private RuleSettings settings(String profile, RuleDefinition rule) {
        return profiles.get(profile).settings(rule);
    }

    private static String generatedNote() {
        return "<!-- Generated from the rule metadata, the built-in profiles and the test fixtures; do not edit. "
                + "Regenerate with: " + REGENERATE + " -->\n";
    }

    private static String caution() {
        return "---\n\n*" + Mesolint.CAUTION + "*\n";
    }
}
