package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.List;
import java.util.Map;

/** A muscle's weekly hard sets jump well above what the weeks before got it used to. */
public final class VolumeSpikeRule implements Rule {
    public static final String ID = "volume-spike";
    static final String MAX_RATIO = "max-ratio";
    static final String MIN_ADDED_SETS = "min-added-sets";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "A muscle's weekly hard sets stay within 1.5 x the mean of the up to four weeks before.",
            Severity.WARNING, RuleMetadata.Category.VOLUME,
            List.of(RuleParameter.number(MAX_RATIO, 1.5, 1.1, 4,
                            "Largest ratio of a week's hard sets to the mean of the weeks before (the model's "
                                    + "acute:chronic figure; the number of weeks is the model's acuteChronicWeeks)."),
                    RuleParameter.number(MIN_ADDED_SETS, 3, 0, 20,
                            "Fewest hard sets above that mean that make a jump worth reporting, so that small muscles "
                                    + "going from 1 to 2 sets are not called a spike.")),
            "Gabbett's acute:chronic workload ratio compares a week's load with the rolling mean of the four weeks "
                    + "before; in team sports, weeks well above about 1.5 times that mean went with more injuries. "
                    + "Applied to weekly hard sets per muscle, it asks that volume rise in steps the body has been "
                    + "prepared for. The ratio has been criticised: it couples the two figures mathematically "
                    + "(Lolli et al. 2019), rests on observational data, and its thresholds should not be read as "
                    + "injury predictions (Impellizzeri et al. 2020, 2021). mesolint uses it only as a plain flag for "
                    + "sudden jumps, and not before there is a week to compare with: the first week, and muscles not "
                    + "trained in the weeks before, are not checked.",
            "Gabbett 2016, Br J Sports Med 50(5):273-280; critiques: Lolli et al. 2019; "
                    + "Impellizzeri et al. 2020 and 2021");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        double maxRatio = context.param(MAX_RATIO);
        double minAdded = context.param(MIN_ADDED_SETS);
        int window = context.metrics().parameters().acuteChronicWeeks();
        List<WeekMetrics> weeks = context.metrics().weeks();
        for (int i = 1; i < weeks.size(); i++) {
            WeekMetrics week = weeks.get(i);
            for (Map.Entry<Muscle, Double> e : week.acuteChronic().entrySet()) {
                double ratio = e.getValue();
                double sets = week.hardSets(e.getKey());
                double chronic = sets / ratio;
                if (ratio <= maxRatio || sets - chronic < minAdded) {
                    continue;
                }
                WeekMetrics from = weeks.get(Math.max(0, i - window));
                WeekMetrics to = weeks.get(i - 1);
                String before = from == to ? "week " + to.number() : "weeks " + from.number() + "-" + to.number();
                String muscle = Texts.muscle(e.getKey());
                Places.reportWeek(context, week, muscle + ", week " + week.number() + ": " + Texts.sets(sets)
                        + ", " + Texts.num(ratio) + " x the mean of " + before + " (" + Texts.num(chronic)
                        + "); the " + context.profileName() + " profile flags weeks over " + context.shown(MAX_RATIO)
                        + " x that mean",
                        "raise " + muscle + " volume in steps: at most " + Texts.num(Math.floor(chronic * maxRatio))
                                + " hard sets this week",
                        Facts.about(Subject.muscle(muscle)).measured(ratio, maxRatio, "ratio"));
            }
        }
    }
}
