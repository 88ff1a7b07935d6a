package dev.mesolint.core.rules;

import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import java.util.List;

/** The file follows the programme format: the published JSON Schema, then value checks the schema cannot express. */
public final class SchemaRule implements RuleDefinition {
    public static final String ID = FrameworkRules.SCHEMA;

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "The file follows the programme format (keys, types, allowed values and value forms).", Severity.ERROR,
            RuleMetadata.Category.STRUCTURE, List.of(),
            "The format is the contract between authors, the checks and every report: a misspelt key is silently "
                    + "ignored by people but not by a machine, and a rest of '90' could mean seconds or minutes. The "
                    + "JSON Schema in docs/schema/programme.schema.json is the single source of the structure; editors "
                    + "use it for completion.",
            "JSON Schema draft 2020-12; the mesolint programme format (docs/format.md)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }
}
