package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/** A muscle trained hard in two sessions too close together to recover between them. */
public final class RecoveryGapRule implements Rule {
    public static final String ID = "recovery-gap";
    static final String MIN_HOURS = "min-hours";
    static final String MIN_SETS = "min-sets";
    private static final int HOURS_PER_DAY = 24;
    private static final int DAYS_PER_WEEK = 7;

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "A muscle trained with {min-sets} or more hard sets in two sessions is given at least {min-hours} h between them.",
            Severity.WARNING, RuleMetadata.Category.RECOVERY,
            List.of(RuleParameter.integer(MIN_HOURS, 48, 12, 168,
                            "Fewest hours between two sessions that both train a muscle hard (24 h per day)."),
                    RuleParameter.number(MIN_SETS, 4, 1, 20,
                            "Credited hard sets that make a session train a muscle hard for this rule.")),
            "A muscle trained hard needs time before it is trained hard again: the position stands ask for at least "
                    + "48 hours between sessions that stress the same muscles, and the NSCA for at least one rest day "
                    + "(but no more than three) between them. Two sessions that each give a muscle four or more hard "
                    + "sets a day apart leave the second one starting on tired muscle, so it counts for less and "
                    + "raises the risk of overuse. Hours come from the session days, 24 per day, including the step "
                    + "from the last session of one week to the first of the next. A few easy sets for the same "
                    + "muscle on the next day are not reported.",
            "Garber et al. 2011, MSSE 43(7):1334-1359 (at least 48 h); Haff & Triplett 2016, NSCA Essentials 4th ed., "
                    + "Ch. 17 (at least 1 but no more than 3 rest days between sessions stressing the same muscles); "
                    + "ACSM 2009 position stand (Ratamess et al., MSSE 41(3):687-708)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    /** A session on the block's timeline. */
    private record Visit(WeekMetrics week, SessionMetrics session, int blockDay) {
    }

    @Override
    public void check(RuleContext context) {
        double minHours = context.param(MIN_HOURS);
        double minSets = context.param(MIN_SETS);
        List<Visit> timeline = new ArrayList<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                timeline.add(new Visit(week, session, (week.number() - 1) * DAYS_PER_WEEK + session.day()));
            }
        }
        // The last session that trained each muscle hard, so far along the timeline.
        Map<Muscle, Visit> last = new EnumMap<>(Muscle.class);
        Occurrences found = new Occurrences();
        for (Visit visit : timeline) {
            for (Muscle muscle : visit.session().muscles().keySet()) {
                if (visit.session().hardSets(muscle) < minSets) {
                    continue;
                }
                Visit before = last.put(muscle, visit);
                if (before == null) {
                    continue;
                }
                double hours = (double) (visit.blockDay() - before.blockDay()) * HOURS_PER_DAY;
                if (hours < minHours) {
                    add(context, found, muscle, before, visit, hours);
                }
            }
        }
        found.report(context);
    }

    private static void add(RuleContext context, Occurrences found, Muscle muscle, Visit before, Visit visit,
            double hours) {
        String name = Texts.muscle(muscle);
        boolean sameWeek = before.week().number() == visit.week().number();
        String earlier = "the " + Texts.num(before.session().hardSets(muscle)) + " on " + Places.day(before.session())
                + (sameWeek ? "" : " of the week before");
        int earliestDay = before.blockDay() + (int) Math.ceil(context.param(MIN_HOURS) / HOURS_PER_DAY)
                - (visit.week().number() - 1) * DAYS_PER_WEEK;
        String move = earliestDay <= DAYS_PER_WEEK
                ? "move " + Places.day(visit.session()) + " to day " + earliestDay + " or later"
                : "move " + Places.day(before.session()) + " earlier";
        Places.addSession(context, found, visit.week(), visit.session(), name + ", " + Places.session(visit.session())
                + ": " + Texts.sets(visit.session().hardSets(muscle)) + ", " + Texts.num(hours) + " h after "
                + earlier + "; the " + context.profileName() + " profile asks for at least "
                + context.shown(MIN_HOURS) + " h between sessions that each give a muscle " + context.shown(MIN_SETS)
                + " or more hard sets",
                move + ", or keep the " + name + " under " + context.shown(MIN_SETS) + " hard sets in one of them",
                Facts.about(Subject.muscle(name)).measured(hours, context.param(MIN_HOURS), "h"));
    }
}
