package dev.mesolint.core.rules;

import dev.mesolint.core.rule.RuleDefinition;
import java.util.List;

/** The built-in rules, in reference order: one explicit, immutable list. */
public final class BuiltInRules {
    private BuiltInRules() {
    }

    public static List<RuleDefinition> all() {
        return List.of(
                new YamlSyntaxRule(),
                new SchemaRule(),
                new UnknownExerciseRule(),
                new WeekSequenceRule(),
                new EffortMissingRule(),
                new EffortConflictRule(),
                new FarFromFailureRule(),
                new HighRepFatigueRule(),
                new LowYieldSetRule(),
                new SessionMuscleVolumeRule(),
                new WeeklyVolumeMaxRule(),
                new WeeklyVolumeMinRule(),
                new VolumeSpikeRule(),
                new RecoveryGapRule(),
                new SessionTimeRule(),
                new NoviceHeavyComplexRule(),
                new ConstraintLoadRule(),
                new UnusedWaiverRule());
    }
}
