package dev.mesolint.core.rule;

import dev.mesolint.core.finding.Severity;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * What a rule is, for profiles, the CLI, reports and the generated reference page.
 *
 * @param defaultSeverity severity in the default ({@code hypertrophy}) profile; profiles may change it
 * @param rationale       one paragraph: why the rule exists, in words a coach can follow
 * @param source          the published source, or "common practice"
 */
public record RuleMetadata(String id, String summary, Severity defaultSeverity, Category category,
        List<RuleParameter> parameters, String rationale, String source) {

    /** Groups rules in the reference and in reports. */
    public enum Category {
        STRUCTURE, EFFORT, REST, FATIGUE, VOLUME, RECOVERY, TIME, SAFETY
    }

    public RuleMetadata {
        if (id == null || !id.matches("[a-z][a-z0-9]*(-[a-z0-9]+)*")) {
            throw new IllegalArgumentException("rule ids are lower-case words joined by hyphens: " + id);
        }
        require(summary, id, "summary");
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
