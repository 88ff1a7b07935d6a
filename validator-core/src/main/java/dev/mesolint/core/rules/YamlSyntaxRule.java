package dev.mesolint.core.rules;

import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import java.util.List;

/** The file is well-formed YAML, within the safety limits. Reported by the loader, before any other rule. */
public final class YamlSyntaxRule implements RuleDefinition {
    public static final String ID = FrameworkRules.YAML_SYNTAX;

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "The file is well-formed YAML text, within the size, alias and nesting limits.", Severity.ERROR,
            RuleMetadata.Category.STRUCTURE, List.of(),
            "Nothing else can be checked in a file that does not parse. The limits (2 MB per file, 50 aliases to "
                    + "collections, 40 levels of nesting, 250,000 nodes after expansion) keep a hostile or broken file "
                    + "from stalling a whole run; a real programme stays far below them.",
            "YAML 1.2 specification; resource limits are common practice for safe YAML loading");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }
}
