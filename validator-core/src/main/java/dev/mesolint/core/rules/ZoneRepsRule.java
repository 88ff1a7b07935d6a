package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Role;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.IntensityZone;
import dev.mesolint.core.model.LiftSession;
import dev.mesolint.core.model.PrilepinTable;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * A lift's reps in one intensity zone in one session pass the upper total of Prilepin's table for that zone (and, when
 * a team asks, fall under its lower total). One finding per lift and direction, naming each zone, its range and the
 * sessions.
 */
public final class ZoneRepsRule implements Rule {
    public static final String ID = "zone-reps";
    private static final int ZONES = 4;
    /** Shares of 1RM on a zone bound count in the zone above, as the model's figures count them. */
    private static final double EPSILON = 1e-9;
    static final String UNDER_TOTALS = "under-totals";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "A main lift's reps per session in each intensity zone of 1RM stay within the upper totals of "
                    + "Prilepin's table for that zone: {zone1-max-reps} in the lowest zone to {zone4-max-reps} in the "
                    + "highest.",
            Severity.INFO, RuleMetadata.Category.VOLUME, parameters(),
            "Prilepin's table summarises how many reps a session elite weightlifters did at each intensity in the "
                    + "competition lifts: far more than the upper total at a zone tends to mean too much heavy work "
                    + "in one session, far fewer that the zone is touched rather than trained. Only the upper totals "
                    + "are read by default: sessions under a lower total are normal in sound programmes (a novice's "
                    + "one set of five deadlifts, a peak's heavy singles, a technique day), and asking for more sets "
                    + "there would be advice coaches reject; a team that wants them read sets under-totals to 1. "
                    + "The table describes those "
                    + "lifters, not every lifter, and its published versions differ, so the rule is an info, is on "
                    + "only under the strength profile, and its zone bounds (the model's intensityZone1From to "
                    + "intensityZone4From) and totals are parameters. Only main lifts are read (role: main, written or the "
                    + "catalogue's default), as the table is about competition lifts, not assistance work. The reps "
                    + "are counted per lift and session "
                    + "from the sets whose share of 1RM is known (stated, or a weight against the 1RM in force); "
                    + "a zone the session does not train, the zone under 55% and deload weeks are not judged.",
            "Prilepin's table as docs/model.md states the version used (from memory: the version most often "
                    + "reproduced in English; 55-65% 18-30 reps, 70-80% 12-24, 80-90% 10-20, 90% and over 4-10)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    private static List<RuleParameter> parameters() {
        List<RuleParameter> all = new ArrayList<>();
        all.add(RuleParameter.integer(UNDER_TOTALS, 0, 0, 1,
                "1 also reports sessions under a zone's lower total; 0 (the default) reads the upper totals only."));
        for (int zone = 1; zone <= ZONES; zone++) {
            String name = "zone " + zone + " (from intensityZone" + zone + "From)";
            all.add(RuleParameter.integer(minName(zone), PrilepinTable.minReps(zone), 0, 100,
                    "Fewest reps a session in " + name + "."));
            all.add(RuleParameter.integer(maxName(zone), PrilepinTable.maxReps(zone), 1, 200,
                    "Most reps a session in " + name + "."));
        }
        return List.copyOf(all);
    }

    private static String minName(int zone) {
        return "zone" + zone + "-min-reps";
    }

    private static String maxName(int zone) {
        return "zone" + zone + "-max-reps";
    }

    /** One session's reps in a zone outside its range. */
    private record Hit(int week, SessionMetrics session, SetMetrics first, double reps) {
    }

    @Override
    public void check(RuleContext context) {
        // By lift and side (under or over), then by zone: one finding per lift and side keeps a block quiet.
        Map<List<Object>, Map<Integer, List<Hit>>> byLift = new LinkedHashMap<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            if (week.deload()) {
                continue;
            }
            for (SessionMetrics session : week.sessions()) {
                for (LiftSession lift : session.lifts()) {
                    if (!mainLift(context, session, lift.exerciseId())) {
                        continue;
                    }
                    for (int zone = 1; zone <= ZONES && zone < lift.zones().size(); zone++) {
                        IntensityZone z = lift.zones().get(zone);
                        int side = side(context, zone, z.reps());
                        if (side != 0) {
                            byLift.computeIfAbsent(List.of(lift.exerciseId(), side), k -> new TreeMap<>())
                                    .computeIfAbsent(zone, k -> new ArrayList<>())
                                    .add(new Hit(week.number(), session, firstSet(session, lift.exerciseId(), z),
                                            z.reps()));
                        }
                    }
                }
            }
        }
        Occurrences found = new Occurrences();
        byLift.forEach((key, zones) -> report(context, found, (String) key.get(0), (Integer) key.get(1) < 0, zones));
        found.report(context);
    }

    /** The table describes competition lifts: a lift's sets count where its entry's role is main. */
    private static boolean mainLift(RuleContext context, SessionMetrics session, String lift) {
        for (SetMetrics s : session.sets()) {
            if (s.exerciseId().equals(lift)) {
                Exercise exercise = context.exerciseOrNull(lift);
                return exercise != null && s.work().role(exercise) == Role.MAIN;
            }
        }
        return false;
    }

    /** -1 under the zone's range, 1 over it, 0 within it or not trained. */
    private static int side(RuleContext context, int zone, double reps) {
        if (reps <= 0) {
            return 0;
        }
        if (reps < context.param(minName(zone))) {
            return context.param(UNDER_TOTALS) >= 1 ? -1 : 0;
        }
        return reps > context.param(maxName(zone)) ? 1 : 0;
    }

    private static SetMetrics firstSet(SessionMetrics session, String lift, IntensityZone zone) {
        return session.sets().stream()
                .filter(s -> s.exerciseId().equals(lift) && inZone(s.effort().loadFraction(), zone))
                .findFirst().orElseThrow();
    }

    private static boolean inZone(OptionalDouble fraction, IntensityZone zone) {
        return fraction.isPresent() && fraction.getAsDouble() + EPSILON >= zone.from()
                && (zone.below().isEmpty() || fraction.getAsDouble() + EPSILON < zone.below().getAsDouble());
    }

    private static void report(RuleContext context, Occurrences found, String lift, boolean under,
            Map<Integer, List<Hit>> zones) {
        List<String> parts = new ArrayList<>();
        TreeSet<Integer> weeks = new TreeSet<>();
        Hit first = null;
        for (Map.Entry<Integer, List<Hit>> e : zones.entrySet()) {
            List<Hit> hits = e.getValue();
            first = first == null || earlier(hits.get(0), first) ? hits.get(0) : first;
            hits.forEach(h -> weeks.add(h.week()));
            parts.add(zone(context, lift, e.getKey(), under, hits));
        }
        String message = lift + ", " + Occurrences.WEEKS + ": " + (under ? "fewer" : "more") + " reps a session than "
                + "Prilepin's table gives for " + (zones.size() == 1 ? "the zone" : "each zone") + ": "
                + String.join("; ", parts);
        String fix = under
                ? "add sets in " + (zones.size() == 1 ? "that zone" : "those zones") + " up to the table's lower total, "
                        + "or leave it if the zone is touched on purpose (openers, back-off sets): the table "
                        + "describes elite weightlifters' competition lifts"
                : "cut the reps in " + (zones.size() == 1 ? "that zone" : "those zones") + " to the table's upper "
                        + "total, or spread them over more sessions";
        for (int week : weeks) {
            found.add(week, context.fieldLocation(first.first().prescription(), "load"),
                    first.first().prescription().waivers(), context.severity(), message, fix);
        }
    }

    private static boolean earlier(Hit a, Hit b) {
        return a.week() < b.week() || (a.week() == b.week() && a.session().day() < b.session().day());
    }

    /**
     * {@code 80-90% of 1RM (10-20): 9 reps in week 1 day 1 (Heavy)}, or for several sessions
     * {@code 6 to 9 reps in 6 sessions, weeks 1-3 (fewest: 6 in week 1 day 5 (Bench))}.
     */
    private static String zone(RuleContext context, String lift, int zone, boolean under, List<Hit> hits) {
        IntensityZone z = hits.get(0).session().lift(lift).orElseThrow().zones().get(zone);
        String range = Texts.num(context.param(minName(zone))) + "-" + Texts.num(context.param(maxName(zone)));
        // The session furthest outside the range: the fewest reps under it, the most over it (first on ties).
        Comparator<Hit> byReps = Comparator.comparingDouble(Hit::reps);
        Hit extreme = (under ? hits.stream().min(byReps) : hits.stream().max(byReps)).orElseThrow();
        String at = "week " + extreme.week() + " " + Places.day(extreme.session());
        String head = zoneName(z) + " (" + range + "): ";
        if (hits.size() == 1) {
            return head + Texts.num(extreme.reps()) + " reps in " + at;
        }
        TreeSet<Double> reps = new TreeSet<>(hits.stream().map(Hit::reps).toList());
        String spread = reps.size() == 1 ? Texts.num(reps.first()) + " reps in each of "
                : Texts.num(reps.first()) + " to " + Texts.num(reps.last()) + " reps in ";
        return head + spread + hits.size() + " sessions, " + Texts.weeks(hits.stream().map(Hit::week).toList())
                + (reps.size() == 1 ? "" : " (" + (under ? "fewest " : "most ") + Texts.num(extreme.reps()) + " in "
                        + at + ")");
    }

    /** {@code 70-80% of 1RM}, {@code 90% of 1RM and over}. */
    private static String zoneName(IntensityZone z) {
        return z.below().isPresent()
                ? Texts.num(z.from() * 100) + "-" + Texts.num(z.below().getAsDouble() * 100) + "% of 1RM"
                : Texts.num(z.from() * 100) + "% of 1RM and over";
    }
}
