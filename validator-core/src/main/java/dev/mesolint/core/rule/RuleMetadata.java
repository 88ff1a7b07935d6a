package dev.mesolint.core.rule;

import dev.mesolint.core.finding.Severity;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.function.ToDoubleFunction;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * What a rule is, for profiles, the CLI, reports and the generated reference page.
 *
 * @param summaryTemplate one sentence: what the rule checks, with each threshold written as its parameter's name in
 *                        braces ({@code More than {max-weeks} weeks ...}), so that it reads true in every profile
 * @param defaultSeverity severity in the default ({@code hypertrophy}) profile; profiles may change it
 * @param rationale       one paragraph: why the rule exists, in words a coach can follow
 * @param source          the published source, or "common practice"
 */
public record RuleMetadata(String id, String summaryTemplate, Severity defaultSeverity, Category category,
        List<RuleParameter> parameters, String rationale, String source) {

    /** Groups rules in the reference and in reports. */
    public enum Category {
        STRUCTURE, EFFORT, REST, FATIGUE, VOLUME, RECOVERY, TIME, SAFETY
    }

    /** A threshold in a summary: a parameter name in braces. */
    private static final Pattern PLACEHOLDER = Pattern.compile("\\{([a-z][a-z0-9-]*)}");

    public RuleMetadata {
        if (id == null || !id.matches("[a-z][a-z0-9]*(-[a-z0-9]+)*")) {
            throw new IllegalArgumentException("rule ids are lower-case words joined by hyphens: " + id);
        }
        require(summaryTemplate, id, "summary");
        require(rationale, id, "rationale");
        require(source, id, "source");
        if (defaultSeverity == null || defaultSeverity == Severity.OFF && category != Category.STRUCTURE) {
            throw new IllegalArgumentException(id + ": a default severity is required");
        }
        parameters = List.copyOf(parameters);
        Set<String> names = new HashSet<>();
        for (RuleParameter p : parameters) {
            if (!names.add(p.name())) {
                throw new IllegalArgumentException(id + ": parameter " + p.name() + " declared twice");
            }
        }
        Matcher named = PLACEHOLDER.matcher(summaryTemplate);
        while (named.find()) {
            if (!names.contains(named.group(1))) {
                throw new IllegalArgumentException(id + ": the summary names {" + named.group(1)
                        + "}, which is not one of its parameters " + names);
            }
        }
    }

    /** The summary with the default value of each threshold. */
    public String summary() {
        return summary(RuleParameter::defaultValue);
    }

    /**
     * The summary with each threshold as {@code value} gives it (a profile's effective value, say), written as a
     * coach reads it ({@code 3 min}, {@code 10%}).
     */
    public String summary(ToDoubleFunction<RuleParameter> value) {
        Matcher named = PLACEHOLDER.matcher(summaryTemplate);
        StringBuilder out = new StringBuilder();
        while (named.find()) {
            RuleParameter p = parameter(named.group(1)).orElseThrow();
            named.appendReplacement(out, Matcher.quoteReplacement(p.display(value.applyAsDouble(p))));
        }
        named.appendTail(out);
        return out.toString();
    }

    private static void require(String text, String id, String what) {
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException(id + ": " + what + " is required");
        }
    }

    public Optional<RuleParameter> parameter(String name) {
        return parameters.stream().filter(p -> p.name().equals(name)).findFirst();
    }
}
