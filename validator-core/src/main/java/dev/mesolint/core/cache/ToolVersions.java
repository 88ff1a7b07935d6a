package dev.mesolint.core.cache;

import dev.mesolint.core.Mesolint;

/**
 * The versions a cache file is written under, kept in the file in plain text: results stored by another mesolint or
 * another rule set are never reused, whatever the configuration key says.
 */
record ToolVersions(String mesolint, String ruleSet) {
    static ToolVersions current() {
        return new ToolVersions(Mesolint.version(), Mesolint.RULE_SET_VERSION);
    }

    @Override
    public String toString() {
        return "mesolint " + mesolint + ", rule set " + ruleSet;
    }
}
