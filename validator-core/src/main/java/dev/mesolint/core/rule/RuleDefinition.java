package dev.mesolint.core.rule;

/** Anything with rule metadata: programme rules, and the load-stage rules that report unreadable files. */
public interface RuleDefinition {
    RuleMetadata metadata();

    default String id() {
        return metadata().id();
    }
}
