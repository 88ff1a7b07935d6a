package dev.mesolint.core.rule;

import java.util.List;

/** A rule's parameters as a profile sets them, for people: {@code min-rest 3min (default 2min)}. */
public final class Thresholds {
    private Thresholds() {
    }

    /** One parameter's value under {@code settings}, with the rule's default where they differ. */
    public static List<String> of(RuleMetadata rule, RuleSettings settings) {
        return rule.parameters().stream().map(p -> {
            String value = p.format(settings.value(p.name()));
            String byDefault = p.format(p.defaultValue());
            return p.name() + " " + value + (value.equals(byDefault) ? "" : " (default " + byDefault + ")");
        }).toList();
    }

    /** The rule's summary with the thresholds in force under {@code settings} (a profile's, say). */
    public static String summary(RuleMetadata rule, RuleSettings settings) {
        return rule.summary(p -> settings.value(p.name()));
    }

    /** {@code min-rest 3min (default 2min), min-rest-squat-hinge 3min}, or empty for a rule without parameters. */
    public static String line(RuleMetadata rule, RuleSettings settings) {
        return String.join(", ", of(rule, settings));
    }
}
