package dev.mesolint.core.rules;

import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import java.util.List;

/** A baseline entry that no finding matched: the problem was fixed, or its programme changed id. */
public final class UnusedBaselineEntryRule implements RuleDefinition {
    public static final String ID = FrameworkRules.UNUSED_BASELINE_ENTRY;

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Every baseline entry still matches a finding.", Severity.INFO, RuleMetadata.Category.STRUCTURE,
            List.of(),
            "A baseline lists findings a team accepted when it adopted the checks. Once such a finding is fixed, its "
                    + "entry would silently accept the same problem if it came back, and an entry never moves to "
                    + "another programme: a programme is known by its id, so a new file with another id at the old "
                    + "path starts clean. Stale entries are reported, located in the baseline file, so the baseline "
                    + "shrinks as the programmes improve; regenerate it to drop them.",
            "common practice (stale suppressions are reported by most code checkers)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }
}
