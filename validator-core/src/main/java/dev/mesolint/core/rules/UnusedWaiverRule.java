package dev.mesolint.core.rules;

import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import java.util.List;

/** A waiver that accepts no finding: stale after an edit, misspelt, or for a rule that is off. */
public final class UnusedWaiverRule implements RuleDefinition {
    public static final String ID = FrameworkRules.UNUSED_WAIVER;

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Every waiver accepts at least one finding of the rule it names.", Severity.WARNING,
            RuleMetadata.Category.STRUCTURE, List.of(),
            "A waiver is a coach's recorded decision. Once the programme changes so that the rule no longer fires, "
                    + "the waiver hides nothing but would silently hide the next real problem at that place; a waiver "
                    + "naming an unknown rule is a typo. Both are reported so waivers stay few and current.",
            "common practice (stale suppressions are reported by most code checkers)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }
}
