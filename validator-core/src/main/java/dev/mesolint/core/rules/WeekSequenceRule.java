package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.yaml.Pointers;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Weeks are numbered 1..N without gaps or repeats, and each day holds at most one session per week. */
public final class WeekSequenceRule implements Rule {
    public static final String ID = "week-sequence";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Weeks are numbered 1..N in order, without gaps or repeats; days are unique within a week.",
            Severity.ERROR, RuleMetadata.Category.STRUCTURE, List.of(),
            "Week numbers drive the week-to-week checks (volume spikes, deload spacing) and days fix the hours "
                    + "between sessions that train the same muscle. A missing week, a repeated number or two sessions "
                    + "on one day make those figures wrong, so they are errors.",
            "common practice");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        Map<Integer, Week> seen = new HashMap<>();
        int expected = 1;
        for (Week week : context.programme().weeks()) {
            Week earlier = seen.putIfAbsent(week.number(), week);
            if (earlier != null) {
                context.report(week.numberLocation(), week.waivers(), "week " + week.number()
                        + " is written twice (first as " + Pointers.readable(earlier.location().pointer()) + ")",
                        "renumber it week: " + expected + ", or merge the two");
            } else if (week.number() != expected) {
                String problem = week.number() > expected
                        ? "week " + week.number() + " follows week " + (expected - 1) + ": week " + expected
                                + " is missing"
                        : "week " + week.number() + " comes after week " + (expected - 1) + ": weeks are out of order";
                context.report(week.numberLocation(), week.waivers(), problem, "number this week: " + expected
                        + " (weeks run 1, 2, 3... in order)");
                expected = Math.max(expected, week.number()) + 1;
            } else {
                expected++;
            }
            checkDays(context, week);
        }
    }

    private static void checkDays(RuleContext context, Week week) {
        Map<Integer, Session> days = new HashMap<>();
        // A clash copied into a repeating week is reported once, on the week that wrote it.
        String written = week.location().pointer() + "/";
        for (Session session : week.sessions()) {
            Session earlier = days.putIfAbsent(session.day(), session);
            if (earlier != null && session.dayLocation().pointer().startsWith(written)) {
                context.report(session.dayLocation(), session.waivers(), "week " + week.number()
                        + " has two sessions on day "
                        + session.day() + " (the other is " + Pointers.readable(earlier.location().pointer()) + ")",
                        "move one to a free day, or merge them into one session");
            }
        }
    }
}
