package dev.mesolint.core.rulepack;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.List;

/** Example team rule: the club keeps sessions to a few exercises so classes finish on time. */
public final class ExerciseCountRule implements Rule {
    public static final String ID = "club-exercise-count";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "A session lists more exercises than the club's class format allows.", Severity.WARNING,
            RuleMetadata.Category.TIME,
            List.of(RuleParameter.integer("max-exercises", 6, 1, 20, "Most exercises (supersets count as one) "
                    + "in one session.")),
            "The Harbourside Strength Club runs coached classes in fixed time slots; more than a handful of "
                    + "exercises does not fit the slot with proper warm-ups.",
            "common practice (club policy)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        int max = (int) context.param("max-exercises");
        for (Week week : context.programme().weeks()) {
            for (Session s : week.sessions()) {
                if (s.work().size() > max) {
                    context.report(s.dayLocation(), s.waivers(), "week " + week.number() + " " + s.label() + ": "
                            + s.work().size() + " exercises, the " + context.profileName() + " profile allows "
                            + max, "move " + (s.work().size() - max) + " exercise(s) to another day");
                }
            }
        }
    }
}
