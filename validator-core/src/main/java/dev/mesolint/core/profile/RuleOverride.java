package dev.mesolint.core.profile;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleSettings;
import java.util.Map;
import java.util.Optional;

/**
 * What one profile changes about one rule: its severity, some parameter values (in base units), or both.
 */
public record RuleOverride(Optional<Severity> severity, Map<String, Double> values) {

    public RuleOverride {
        values = Map.copyOf(values);
    }

    /** {@code base} with this override's changes applied. */
    public RuleSettings applyTo(RuleSettings base) {
        RuleSettings result = severity.map(base::with).orElse(base);
        for (Map.Entry<String, Double> e : values.entrySet()) {
            result = result.with(e.getKey(), e.getValue());
        }
        return result;
    }
}
