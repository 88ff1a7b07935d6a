package dev.mesolint.core.rule;

/**
 * A check over one loaded programme. Implementations are stateless and thread-safe: per-file state lives in the
 * {@link RuleContext}. Read figures from the context, compare them with the configured parameters, report.
 */
public interface Rule extends RuleDefinition {
    void check(RuleContext context);
}
