package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.MuscleWeek;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.rule.RuleSettings;
import dev.mesolint.core.rule.WeeklyVolumeLimit;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;

/** A muscle gets more hard sets in a week than it can recover from and grow on. */
public final class WeeklyVolumeMaxRule implements Rule, WeeklyVolumeLimit {
    public static final String ID = "weekly-volume-max";
    static final String MAX_SETS = "max-sets";
    static final String MAX_SETS_COMPETITION = "max-sets-competition-lifts";

    /**
     * The prime movers (credit 1) of the three competition lifts in the built-in catalogue: back squat (quadriceps,
     * glutes), bench press (chest) and deadlift (glutes, hamstrings, lower back).
     */
    static final Set<Muscle> COMPETITION_PRIME_MOVERS = EnumSet.of(Muscle.QUADRICEPS, Muscle.GLUTES, Muscle.CHEST,
            Muscle.HAMSTRINGS, Muscle.LOWER_BACK);

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "No muscle gets more than {max-sets} credited hard sets in a week ({max-sets-competition-lifts} for "
                    + "the prime movers of the squat, bench press and deadlift).", Severity.WARNING,
            RuleMetadata.Category.VOLUME,
            List.of(RuleParameter.number(MAX_SETS, 20, 8, 60,
                            "Most credited hard sets for one muscle in a week (prime mover 1, synergist 0.5)."),
                    RuleParameter.number(MAX_SETS_COMPETITION, 20, 8, 60,
                            "The limit instead for the prime movers of the squat, bench press and deadlift "
                                    + "(quadriceps, glutes, chest, hamstrings, lower-back); the strength profile "
                                    + "raises it.")),
            "Growth rises with weekly sets per muscle, but the dose-response meta-analyses find diminishing returns, "
                    + "and few studies go beyond about twenty sets a week; past that, recovery rather than volume "
                    + "becomes the limit for most lifters, and joints and tendons take the same load. The limit of 20 "
                    + "is common practice drawn from that literature, not a measured ceiling: some advanced lifters "
                    + "thrive on more for a while, so waive the finding with a reason where that is the plan. "
                    + "Strength blocks often give the squat, bench press and deadlift muscles more practice, so the "
                    + "limit for those muscles is a separate parameter.",
            "Schoenfeld, Ogborn & Krieger 2017, J Sports Sci 35(11):1073-1082; Pelland et al. 2024 (diminishing "
                    + "returns; fractional counting); the 20-set limit is common practice drawn from that "
                    + "dose-response literature");

    /** The weekly cap for {@code muscle} under {@code settings}: the competition lifts' prime movers have their own. */
    public static double cap(RuleSettings settings, Muscle muscle) {
        return settings.value(COMPETITION_PRIME_MOVERS.contains(muscle) ? MAX_SETS_COMPETITION : MAX_SETS);
    }

    @Override
    public OptionalDouble weeklyCap(RuleSettings settings, Muscle muscle) {
        return OptionalDouble.of(cap(settings, muscle));
    }

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        for (WeekMetrics week : context.metrics().weeks()) {
            for (Map.Entry<Muscle, MuscleWeek> e : week.muscles().entrySet()) {
                Muscle muscle = e.getKey();
                String limit = COMPETITION_PRIME_MOVERS.contains(muscle) ? MAX_SETS_COMPETITION : MAX_SETS;
                double max = context.param(limit);
                double sets = e.getValue().hardSets();
                if (sets <= max) {
                    continue;
                }
                Map<String, Double> credited = Contributions.of(context, week.sessions(), muscle);
                Places.reportWeek(context, week, Texts.muscle(muscle) + ", week " + week.number() + ": "
                        + Texts.sets(sets) + " (" + Contributions.text(credited) + "), over the "
                        + context.shown(limit) + " a week the " + context.profileName() + " profile allows",
                        "cut " + Texts.num(Math.ceil(sets - max)) + " " + Texts.muscle(muscle)
                                + " sets from the week, e.g. from " + Contributions.largest(credited),
                        Facts.about(Subject.muscle(Texts.muscle(muscle))).measured(sets, max, "sets"));
            }
        }
    }
}
