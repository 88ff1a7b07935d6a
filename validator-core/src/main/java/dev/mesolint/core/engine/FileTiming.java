package dev.mesolint.core.engine;

import java.time.Duration;
import java.util.Map;
import java.util.Objects;

/**
 * How long one file's check took: in all (reading, schema, binding, model, rules) and in each rule's own check.
 * Measured for reports (JUnit's {@code time}); never a test's pass criterion.
 */
public record FileTiming(Duration total, Map<String, Duration> perRule) {
    /** Not measured: the result was reused from the cache, or assembled elsewhere. */
    public static final FileTiming NONE = new FileTiming(Duration.ZERO, Map.of());

    public FileTiming {
        Objects.requireNonNull(total, "total");
        perRule = Map.copyOf(perRule);
    }

    /** The time spent in {@code ruleId}'s check; zero for a rule that did not run. */
    public Duration of(String ruleId) {
        return perRule.getOrDefault(ruleId, Duration.ZERO);
    }
}
