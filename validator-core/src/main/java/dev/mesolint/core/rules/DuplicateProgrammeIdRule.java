package dev.mesolint.core.rules;

import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import java.util.List;

/** Two programme files with the same id. */
public final class DuplicateProgrammeIdRule implements RuleDefinition {
    public static final String ID = FrameworkRules.DUPLICATE_PROGRAMME_ID;

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "No two programme files of one run share a programme id.", Severity.ERROR,
            RuleMetadata.Category.STRUCTURE, List.of(),
            "A programme is known by its id: findings, baselines and comparisons between revisions follow the id, "
                    + "not the file name, so that moving or renaming a file keeps its history. Two files with one "
                    + "id would share that history, and a baseline written for one would accept the other's "
                    + "findings. The severity is fixed, like that of the checks that a file loads.",
            "common practice (identifiers are unique within the set they identify)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }
}
