package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.ExerciseCredits;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.ArrayList;
import java.util.List;

/**
 * A muscle's weekly working sets jump well above what the weeks before got it used to.
 *
 * <p>It counts sets, never effort or load: a heavier load (which turns more sets "hard" and raises volume load) is
 * not more volume. Intensity jumps are {@link IntensityJumpRule}'s.
 */
public final class VolumeSpikeRule implements Rule {
    public static final String ID = "volume-spike";
    private static final Muscle[] MUSCLES = Muscle.values();
    static final String MAX_RATIO = "max-ratio";
    static final String MIN_ADDED_SETS = "min-added-sets";
    static final String MIN_BASELINE_WEEKS = "min-baseline-weeks";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "A muscle's weekly working sets stay within {max-ratio} x the mean of the non-deload weeks before (at "
                    + "least {min-baseline-weeks} of them; rises of fewer than {min-added-sets} sets are not "
                    + "reported), for muscles the programme trains directly.",
            Severity.WARNING, RuleMetadata.Category.VOLUME,
            List.of(RuleParameter.number(MAX_RATIO, 1.5, 1.1, 4,
                            "Largest ratio of a week's working sets for a muscle to the mean of the non-deload weeks "
                                    + "before (up to the model's acuteChronicWeeks, 4)."),
                    RuleParameter.number(MIN_ADDED_SETS, 3, 0, 20,
                            "Fewest working sets above that mean that make a jump worth reporting, so that small "
                                    + "muscles going from 1 to 2 sets are not called a spike."),
                    RuleParameter.integer(MIN_BASELINE_WEEKS, 2, 1, 8,
                            "Fewest non-deload weeks before a week that make a mean to compare it with: one week "
                                    + "alone swings with A/B session rotations.")),
            "Gabbett's acute:chronic workload ratio compares a week's load with the rolling mean of the four weeks "
                    + "before; in team sports, weeks well above about 1.5 times that mean went with more injuries. "
                    + "Applied to a muscle's weekly working sets, it asks that volume rise in steps the body has been "
                    + "prepared for. The rule counts working sets of exercises whose prime mover the muscle is "
                    + "(warm-ups and technique mini-sets are not sets); it never reads effort, load or volume load, "
                    + "so adding weight to the bar, which turns more sets hard and raises volume load, is never a "
                    + "spike (a jump in intensity is the intensity-jump rule's). Deload weeks are left out of the "
                    + "mean, so the first week after a deload is compared with the training weeks before it. The "
                    + "ratio has been criticised: it couples the two figures mathematically (Lolli et al. 2019), "
                    + "rests on observational data, and its thresholds should not be read as injury predictions "
                    + "(Impellizzeri et al. 2020, 2021). mesolint uses it only as a plain flag for sudden jumps, and "
                    + "not before there are two training weeks to compare with: a programme that alternates A and B "
                    + "sessions over three days a week does one session's lifts twice one week and once the next, "
                    + "so a single week before is no baseline (common practice). The first weeks, and muscles not "
                    + "trained directly in the weeks before, are not checked.",
            "Gabbett 2016, Br J Sports Med 50(5):273-280; critiques: Lolli et al. 2019; "
                    + "Impellizzeri et al. 2020 and 2021; sets, not load, as the volume measure for hypertrophy: "
                    + "Schoenfeld et al. 2017, J Sports Sci 35(11):1073-1082");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        double maxRatio = context.param(MAX_RATIO);
        double minAdded = context.param(MIN_ADDED_SETS);
        int window = context.metrics().parameters().acuteChronicWeeks();
        int minWeeks = (int) context.param(MIN_BASELINE_WEEKS);
        List<WeekMetrics> weeks = context.metrics().weeks();
        List<int[]> sets = new ArrayList<>(weeks.size());
        for (WeekMetrics week : weeks) {
            sets.add(directSets(context, week));
        }
        for (int i = 1; i < weeks.size(); i++) {
            WeekMetrics week = weeks.get(i);
            List<Integer> before = baseline(weeks, i, window);
            if (week.deload() || before.size() < Math.min(minWeeks, window)) {
                continue;
            }
            int[] now = sets.get(i);
            for (Muscle muscle : MUSCLES) {
                if (now[muscle.ordinal()] > 0) {
                    check(context, weeks, sets, week, before, muscle, now[muscle.ordinal()], maxRatio, minAdded);
                }
            }
        }
    }

    private static void check(RuleContext context, List<WeekMetrics> weeks, List<int[]> sets, WeekMetrics week,
            List<Integer> before, Muscle muscle, double now, double maxRatio, double minAdded) {
        double chronic = mean(sets, before, muscle);
        if (chronic == 0 || now / chronic <= maxRatio || now - chronic < minAdded) {
            return;
        }
        String name = Texts.muscle(muscle);
        Places.reportWeek(context, week, name + ", week " + week.number() + ": " + Texts.num(now)
                + " working sets with " + name + " as prime mover, " + Texts.num(now / chronic)
                + " x the mean of " + Texts.weeks(before.stream().map(b -> weeks.get(b).number()).toList()) + " ("
                + Texts.num(chronic) + "); the " + context.profileName() + " profile flags weeks over "
                + context.shown(MAX_RATIO) + " x that mean",
                "raise " + name + " volume in steps: at most " + Texts.num(Math.floor(chronic * maxRatio))
                        + " working sets this week",
                Facts.about(Subject.muscle(name)).measured(now, Math.floor(chronic * maxRatio), "sets"));
    }

    /** The mean working sets of {@code muscle} over the baseline weeks; 0 for no weeks. */
    private static double mean(List<int[]> sets, List<Integer> weeks, Muscle muscle) {
        if (weeks.isEmpty()) {
            return 0;
        }
        long sum = 0;
        for (int b : weeks) {
            sum += sets.get(b)[muscle.ordinal()];
        }
        return (double) sum / weeks.size();
    }

    /** Indexes of up to {@code window} non-deload weeks before week {@code i}, nearest last. */
    private static List<Integer> baseline(List<WeekMetrics> weeks, int i, int window) {
        List<Integer> before = new ArrayList<>();
        for (int b = i - 1; b >= 0 && before.size() < window; b--) {
            if (!weeks.get(b).deload()) {
                before.add(0, b);
            }
        }
        return before;
    }

    /**
     * Working sets per muscle (by ordinal) in the week, counting each set for the muscles its exercise has as prime
     * movers.
     */
    private static int[] directSets(RuleContext context, WeekMetrics week) {
        int[] sets = new int[MUSCLES.length];
        for (SessionMetrics session : week.sessions()) {
            for (SetMetrics set : session.sets()) {
                ExerciseCredits credits = context.index().credits(set.exerciseId());
                if (credits != null) {
                    for (int p = 0; p < credits.primeMoverCount(); p++) {
                        sets[credits.primeMoverOrdinal(p)]++;
                    }
                }
            }
        }
        return sets;
    }
}
