package dev.mesolint.core.rules;

import dev.mesolint.core.rule.RuleDefinition;
import java.util.List;

/**
 * The built-in rules, in reference order: one explicit, immutable list. Team rules come from rule packs
 * ({@link dev.mesolint.core.rule.RulePack}), never from here.
 */
public final class BuiltInRules {
    private BuiltInRules() {
    }

    public static List<RuleDefinition> all() {
        return List.of(
                new YamlSyntaxRule(),
                new SchemaRule(),
                new UnknownExerciseRule(),
                new WeekSequenceRule(),
                new ShortRestCompoundRule(),
                new ShortRestIsolationRule(),
                new FatigueTechniqueRule(),
                new NoDeloadRule(),
                new UnstableSurfaceRule(),
                new SlowConcentricRule(),
                new ConstraintAvoidRule(),
                new UnusedWaiverRule(),
                new InternalErrorRule());
    }
}
