package dev.mesolint.core.rule;

import dev.mesolint.core.finding.Severity;
import java.util.Map;

/** A rule's configured severity and parameter values, after the profile chain is applied. */
public record RuleSettings(Severity severity, Map<String, Double> values) {

    public RuleSettings {
        values = Map.copyOf(values);
    }

    /** The metadata defaults. */
    public static RuleSettings defaults(RuleMetadata metadata) {
        Map<String, Double> values = new java.util.HashMap<>();
        metadata.parameters().forEach(p -> values.put(p.name(), p.defaultValue()));
        return new RuleSettings(metadata.defaultSeverity(), values);
    }

    public double value(String name) {
        Double v = values.get(name);
        if (v == null) {
            throw new IllegalArgumentException("no parameter " + name);
        }
        return v;
    }

    public RuleSettings with(Severity newSeverity) {
        return new RuleSettings(newSeverity, values);
    }

    public RuleSettings with(String name, double value) {
        Map<String, Double> copy = new java.util.HashMap<>(values);
        copy.put(name, value);
        return new RuleSettings(severity, copy);
    }
}
