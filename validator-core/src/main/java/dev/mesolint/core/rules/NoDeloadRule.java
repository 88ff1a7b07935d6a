package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Level;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.List;

/** Long runs of weeks without a deload, for intermediate and advanced lifters. */
public final class NoDeloadRule implements Rule {
    public static final String ID = "no-deload";
    static final String MAX_WEEKS = "max-weeks";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "More than {max-weeks} weeks in a row without a deload week, for intermediate and advanced lifters.", Severity.INFO,
            RuleMetadata.Category.RECOVERY,
            List.of(RuleParameter.integer(MAX_WEEKS, 6, 2, 16,
                    "Most weeks in a row without a week marked deload: true.")),
            "Fatigue builds over weeks of hard training faster than fitness shows it; a planned lighter week lets it "
                    + "clear before it costs performance or motivation. Trained lifters, who work closer to their "
                    + "limits, usually plan one every 4 to 8 weeks. Novices recover between sessions and progress "
                    + "without planned deloads, so their programmes are not checked. Only weeks marked "
                    + "deload: true count as deloads.",
            "common practice (periodised programmes for trained lifters plan a lighter week every 4-8 weeks)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        // Only intermediate and advanced lifters are checked (both read "an ... lifter" in the message).
        if (context.programme().info().level() == Level.NOVICE) {
            return;
        }
        int max = (int) context.param(MAX_WEEKS);
        List<Week> weeks = context.programme().weeks();
        int start = 0;
        for (int i = 0; i <= weeks.size(); i++) {
            if (i == weeks.size() || weeks.get(i).deload()) {
                int run = i - start;
                if (run > max) {
                    report(context, weeks.subList(start, i), max);
                }
                start = i + 1;
            }
        }
    }

    private static void report(RuleContext context, List<Week> run, int max) {
        Week first = run.get(0);
        Week over = run.get(max);
        Week last = run.get(run.size() - 1);
        context.report(over.numberLocation(), over.waivers(), "weeks " + first.number() + "-" + last.number() + ": "
                + run.size() + " weeks in a row without a deload week, more than the " + max + " the "
                + context.profileName() + " profile allows for an " + context.programme().info().level().yamlName()
                + " lifter", "add deload: true to week " + over.number() + " (or an earlier one), with fewer sets "
                        + "or more reps in reserve in it");
    }
}
