package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Skill;
import dev.mesolint.core.model.OneRepMaxRelation;
import dev.mesolint.core.programme.AthleteConstraint;
import dev.mesolint.core.programme.Level;
import dev.mesolint.core.rule.RuleContext;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The heaviest share of 1RM a fix may propose for an exercise without breaking another rule: the athlete's load caps
 * for the regions it loads (constraint-load), and for a novice on a high-skill lift the lightest load
 * novice-heavy-complex accepts by default (a 7-rep effort).
 */
final class LoadCeilings {
    /** novice-heavy-complex's default max-effort-reps (6) plus one: the lightest effort it leaves alone. */
    private static final int NOVICE_LIGHTEST_EFFORT = 7;

    private LoadCeilings() {
    }

    /** The ceiling, or empty when nothing limits the load. */
    static OptionalDouble of(RuleContext context, String exerciseId) {
        Optional<Exercise> exercise = context.exercise(exerciseId);
        if (exercise.isEmpty()) {
            return OptionalDouble.empty();
        }
        double ceiling = Double.MAX_VALUE;
        for (AthleteConstraint c : context.programme().athlete().constraints()) {
            if (c.region().isPresent() && c.maxLoad().isPresent()
                    && exercise.get().regions().contains(c.region().get())) {
                ceiling = Math.min(ceiling, c.maxLoad().get());
            }
        }
        if (context.programme().info().level() == Level.NOVICE && exercise.get().skill() == Skill.HIGH) {
            OneRepMaxRelation relation = context.metrics().parameters().oneRepMaxRelation();
            ceiling = Math.min(ceiling, Relations.shareFor(relation, NOVICE_LIGHTEST_EFFORT));
        }
        return ceiling == Double.MAX_VALUE ? OptionalDouble.empty() : OptionalDouble.of(ceiling);
    }

    /** True when {@code share} passes the ceiling (to a hundredth of a percent). */
    static boolean over(RuleContext context, String exerciseId, double share) {
        OptionalDouble ceiling = of(context, exerciseId);
        return ceiling.isPresent() && share > ceiling.getAsDouble() + 1e-4;
    }
}
