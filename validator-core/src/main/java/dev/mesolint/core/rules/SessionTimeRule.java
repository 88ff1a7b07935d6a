package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.List;
import java.util.Optional;

/** A session takes longer than the time the programme has for it. */
public final class SessionTimeRule implements Rule {
    public static final String ID = "session-time";
    static final String SESSION_MINUTES = "session-minutes";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "The estimated length of each session stays within the programme's session-minutes "
                    + "({session-minutes} minutes when it states none).", Severity.WARNING,
            RuleMetadata.Category.TIME,
            List.of(RuleParameter.integer(SESSION_MINUTES, 90, 10, 300,
                    "The time budget per session when the programme states no session-minutes of its own.")),
            "A session that does not fit the time the lifter has gets cut short on the day, and what is dropped is "
                    + "usually the last exercises, not the least useful ones. The estimate adds up the reps (4 s each "
                    + "without a tempo), the rests, the warm-up sets (1.5 min each) and a minute to set up each "
                    + "exercise, as described in docs/model.md; it is an estimate, so a session a minute or two over "
                    + "may still fit. The budget is the programme's session-minutes, else this rule's parameter.",
            "common practice; the session estimate of docs/model.md (section 5)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        Optional<Double> stated = context.programme().info().sessionMinutes();
        double budget = stated.orElse(context.param(SESSION_MINUTES));
        String whose = stated.isPresent() ? "the programme's session-minutes: " + Texts.num(budget)
                : "the " + context.profileName() + " profile's " + context.shown(SESSION_MINUTES) + " minutes (the "
                        + "programme states no session-minutes)";
        Occurrences found = new Occurrences();
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                double minutes = session.minutes();
                if (minutes <= budget) {
                    continue;
                }
                int sets = session.sets().size();
                double perSet = sets == 0 ? 0 : minutes / sets;
                long cut = perSet == 0 ? 0 : (long) Math.ceil((minutes - budget) / perSet);
                Places.addSession(context, found, week, session, Places.session(session) + ": about "
                        + Math.round(minutes) + " min estimated (" + sets + " working sets with rests, warm-ups and "
                        + "set-ups), over " + whose,
                        (cut > 0 ? "cut about " + cut + " working " + (cut == 1 ? "set" : "sets") + " or shorten "
                                + "the longest rests" : "shorten the rests or warm-ups")
                                + ", or raise session-minutes to " + (long) Math.ceil(minutes));
            }
        }
        found.report(context);
    }
}
