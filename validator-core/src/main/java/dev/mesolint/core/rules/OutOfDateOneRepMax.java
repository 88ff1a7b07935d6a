package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.OneRepMaxRelation;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.programme.Level;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.source.Location;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The effort-conflict findings "1RM out of date": absolute loads past the stated 1RM that a plausible rise explains.
 * One info per lift and 1RM in force, at the first set that passes it, naming every week it happens in and the
 * highest e1RM implied, so a whole progression past a stale 1RM reads as one finding.
 */
final class OutOfDateOneRepMax {
    private record Hit(int week, SessionMetrics session, SetMetrics set, Location where,
            RisingOneRepMax.Reading reading) {
    }

    private final RuleContext context;
    private final OneRepMaxRelation relation;
    private final Map<List<Object>, List<Hit>> byLift = new LinkedHashMap<>();

    OutOfDateOneRepMax(RuleContext context, OneRepMaxRelation relation) {
        this.context = context;
        this.relation = relation;
    }

    void add(WeekMetrics week, SessionMetrics session, SetMetrics set, Location where,
            RisingOneRepMax.Reading reading) {
        byLift.computeIfAbsent(List.of(set.exerciseId(), reading.statedWeek(), reading.statedDay()),
                k -> new ArrayList<>()).add(new Hit(week.number(), session, set, where, reading));
    }

    void addTo(Occurrences found) {
        for (List<Hit> hits : byLift.values()) {
            Hit first = hits.get(0);
            Hit highest = hits.stream().max((a, b) -> Double.compare(a.reading().implied(), b.reading().implied()))
                    .orElseThrow();
            RisingOneRepMax.Reading r = highest.reading();
            String lift = first.set().exerciseId();
            String message = lift + ", " + Occurrences.WEEKS + ": 1RM out of date: the loads pass what the "
                    + load(r.inForce()) + " 1RM in force since " + since(r) + " allows for their reps; "
                    + EffortText.prescription(highest.set().prescription()) + " in week " + highest.week() + " "
                    + Places.day(highest.session()) + " implies an e1RM of about " + load(r.implied()) + " ("
                    + Relations.name(relation) + "), " + rise(r) + ", within what " + level() + " gains (up to "
                    + Texts.percent(r.bound()) + " a week)";
            String fix = "state the 1RM as it rises, e.g. under athlete: one-rep-max: " + lift + ": [{from-week: "
                    + r.statedWeek() + ", load: " + written(r.inForce()) + "}, {from-week: " + first.week()
                    + ", load: " + written(first.reading().implied()) + "}], or add a set with test: 1rm before week "
                    + first.week();
            for (int week : hits.stream().map(Hit::week).distinct().toList()) {
                found.add(week, first.where(), first.set().prescription().waivers(), Severity.INFO, message, fix);
            }
        }
    }

    /** The words an error adds when even a risen 1RM cannot explain the load. */
    static String implausible(RuleContext context, RisingOneRepMax.Reading r, OneRepMaxRelation relation) {
        String units = context.metrics().units().symbol();
        String in = Texts.num(r.inForce()) + " " + units;
        if (r.weeks() == 0) {
            return "it would take an e1RM of about " + Texts.num(r.implied()) + " " + units + " ("
                    + Relations.name(relation) + "), above the " + in + " stated for this very session";
        }
        return "read as a 1RM that rose, it would take an e1RM of about " + Texts.num(r.implied()) + " " + units
                + " (" + Relations.name(relation) + ") from the " + in + " in force since " + since(r) + ": "
                + rise(r) + ", more than " + level(context) + " gains "
                + "(up to " + Texts.percent(r.bound()) + " a week)";
    }

    /** {@code +28.1% in 5.6 weeks, about 5% a week}. */
    private static String rise(RisingOneRepMax.Reading r) {
        return "+" + Texts.percent(r.gain()) + " in " + Texts.num(r.weeks())
                + (Texts.num(r.weeks()).equals("1") ? " week" : " weeks") + ", about "
                + Texts.percent(r.gainPerWeek()) + " a week";
    }

    private static String since(RisingOneRepMax.Reading r) {
        return "week " + r.statedWeek() + (r.statedDay() == 1 ? "" : " day " + r.statedDay());
    }

    private String load(double amount) {
        return Texts.num(amount) + " " + context.metrics().units().symbol();
    }

    /** A 1RM as a coach writes it: rounded down to 2.5 of the unit. */
    private String written(double amount) {
        double step = Math.floor(amount / 2.5) * 2.5;
        return Texts.num(step) + context.metrics().units().symbol();
    }

    private String level() {
        return level(context);
    }

    private static String level(RuleContext context) {
        Level level = context.programme().info().level();
        return (level == Level.NOVICE ? "a " : "an ") + level.name().toLowerCase(Locale.ROOT) + " lifter";
    }
}
