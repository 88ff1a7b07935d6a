package dev.mesolint.core.rules;

import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import java.util.List;

/** Reports a file that mesolint itself failed on, so that one file never stops a run and no stack trace leaks. */
public final class InternalErrorRule implements RuleDefinition {
    public static final String ID = FrameworkRules.INTERNAL_ERROR;

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "mesolint could not finish checking the file (a defect in mesolint, not in the programme).",
            Severity.ERROR, RuleMetadata.Category.STRUCTURE, List.of(),
            "A defect in one check must not hide the findings of the other files in the run, and must not pass "
                    + "silently either: the file is reported as unchecked, with the cause in one line.",
            "common practice");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }
}
