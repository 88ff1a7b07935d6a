package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.rule.RuleSettings;
import dev.mesolint.core.rule.WeeklyVolumeLimit;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

/** A muscle the programme trains directly gets too few hard sets in a week to be worth its time. */
public final class WeeklyVolumeMinRule implements Rule, WeeklyVolumeLimit {
    public static final String ID = "weekly-volume-min";
    static final String MIN_SETS = "min-sets";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "A muscle the programme trains directly (a prime mover of one of its exercises) gets at least 4 credited "
                    + "hard sets a week; deload weeks are skipped.",
            Severity.INFO, RuleMetadata.Category.VOLUME,
            parameters(),
            "Weekly sets per muscle drive growth, and the dose-response meta-analyses find small effects at the "
                    + "lowest volumes. When a programme gives a muscle an exercise of its own but fewer than about "
                    + "four hard sets in the week, the exercise costs a place in the session for little return: add "
                    + "sets, or drop the direct work and let the compound lifts cover the muscle. Muscles only ever "
                    + "trained as synergists are not checked (the programme does not aim at them), nor are deload "
                    + "weeks. The threshold is common practice drawn from that literature. Sets that reps in "
                    + "reserve do not describe count as well, at their credit: ballistic and Olympic lifts always, "
                    + "and under the strength and general-fitness profiles strength-purpose sets (at most 6 reps at "
                    + "60% of 1RM or more), which stay far from failure on purpose; the message then says "
                    + "\"hard and strength sets\".",
            "Schoenfeld, Ogborn & Krieger 2017, J Sports Sci 35(11):1073-1082; Pelland et al. 2024; ACSM 2009 "
                    + "position stand (Ratamess et al., MSSE 41(3):687-708); the 4-set threshold is common practice "
                    + "drawn from that dose-response literature");

    private static List<RuleParameter> parameters() {
        List<RuleParameter> all = new ArrayList<>();
        all.add(RuleParameter.number(MIN_SETS, 4, 1, 20,
                "Fewest credited hard sets a week for a muscle the programme trains directly."));
        all.addAll(StrengthSets.parameters());
        return List.copyOf(all);
    }

    /** The weekly floor under {@code settings}. */
    public static double floor(RuleSettings settings) {
        return settings.value(MIN_SETS);
    }

    @Override
    public OptionalDouble weeklyFloor(RuleSettings settings, Muscle muscle) {
        return OptionalDouble.of(floor(settings));
    }

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        double min = context.param(MIN_SETS);
        Map<Muscle, String> direct = context.metrics().directlyTrained();
        for (WeekMetrics week : context.metrics().weeks()) {
            if (week.deload()) {
                continue;
            }
            direct.forEach((muscle, exercise) -> {
                double strength = strengthSets(context, week, muscle);
                double sets = week.hardSets(muscle) + strength;
                if (sets >= min) {
                    return;
                }
                double missing = Math.ceil(min - sets);
                Places.reportWeek(context, week, Texts.muscle(muscle) + ", week " + week.number() + ": "
                        + (strength > 0 ? Texts.num(sets) + " hard and strength sets" : Texts.sets(sets))
                        + ", under the " + context.shown(MIN_SETS) + " a week the "
                        + context.profileName() + " profile asks for a muscle the programme trains directly ("
                        + exercise + ")",
                        "add " + Texts.num(missing) + " hard " + (missing == 1 ? "set" : "sets") + " for the "
                                + Texts.muscle(muscle) + " (e.g. on " + exercise + "), or drop the direct work",
                        Facts.about(Subject.muscle(Texts.muscle(muscle))).measured(sets, min, "sets"));
            });
        }
    }

    /** Credited sets of the muscle that are not hard sets but strength-purpose or ballistic ones. */
    private static double strengthSets(RuleContext context, WeekMetrics week, Muscle muscle) {
        double credited = 0;
        for (SessionMetrics session : week.sessions()) {
            for (SetMetrics set : session.sets()) {
                if (!set.hard() && StrengthSets.notJudged(context, set)) {
                    credited += context.exercise(set.exerciseId()).map(e -> e.credit(muscle)).orElse(0.0);
                }
            }
        }
        return credited;
    }

}
