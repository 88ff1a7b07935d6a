package dev.mesolint.core.rule;

import java.util.List;

/**
 * A team's own rules, packaged in a jar and found on the class path through {@link java.util.ServiceLoader}: list the
 * implementing class in {@code META-INF/services/dev.mesolint.core.rule.RulePack}. The class needs a public
 * no-argument constructor.
 *
 * <p>Pack rules are configured in profiles like built-in ones (severity, parameters) and waived the same way. Their
 * ids must not clash with built-in ids or with another pack's; a clash stops the run with a message naming both.
 * Stable API for rule-pack authors: see docs/rule-packs.md.
 */
public interface RulePack {

    /** A short name shown by {@code mesolint rules}, e.g. {@code harbourside-club}. */
    String name();

    /** The pack's rules; each stateless and thread-safe, like the built-in rules. */
    List<Rule> rules();
}
