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
                new EffortMissingRule(),
                new EffortConflictRule(),
                new FarFromFailureRule(),
                new ShortRestCompoundRule(),
                new ShortRestIsolationRule(),
                new HighRepFatigueRule(),
                new FatigueTechniqueRule(),
                new LowYieldSetRule(),
                new SessionMuscleVolumeRule(),
                new WeeklyVolumeMaxRule(),
                new WeeklyVolumeMinRule(),
                new RecoveryGapRule(),
                new SessionTimeRule(),
                new VolumeSpikeRule(),
                new IntensityJumpRule(),
                new ZoneRepsRule(),
                new NoDeloadRule(),
                new UnstableSurfaceRule(),
                new NoviceHeavyComplexRule(),
                new SlowConcentricRule(),
                new ConstraintAvoidRule(),
                new ConstraintLoadRule(),
                new UnusedWaiverRule(),
                new UnusedBaselineEntryRule(),
                new DuplicateProgrammeIdRule(),
                new InternalErrorRule());
    }
}
