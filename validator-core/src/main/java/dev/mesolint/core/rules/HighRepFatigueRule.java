package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.source.Location;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * Long sets (reps + reserve at or over a threshold) taken close to failure: one finding per exercise for the block,
 * quoting its longest such set.
 *
 * <p>Two severities and two thresholds: on compound lifts the rule's configured severity ({@code warning}) from 15
 * reps to failure; on isolation lifts at most {@code info}, or the configured severity when a profile sets it lower,
 * from 20.
 */
public final class HighRepFatigueRule implements Rule {
    public static final String ID = "high-rep-fatigue";
    static final String MIN_EFFORT_REPS = "min-effort-reps";
    static final String MIN_EFFORT_REPS_ISOLATION = "min-effort-reps-isolation";
    static final String MAX_RIR = "max-rir";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Sets taken to RIR {max-rir} or closer with reps + RIR of {min-effort-reps} or more on compound lifts "
                    + "(warning) or {min-effort-reps-isolation} or more on isolation lifts (info); one finding per "
                    + "exercise.",
            Severity.WARNING, RuleMetadata.Category.FATIGUE,
            List.of(RuleParameter.integer(MIN_EFFORT_REPS, 15, 8, 40,
                            "Reps plus reps in reserve (the set's reps to failure) from which a set of a compound "
                                    + "lift is long."),
                    RuleParameter.integer(MIN_EFFORT_REPS_ISOLATION, 20, 8, 60,
                            "Reps plus reps in reserve from which a set of an isolation lift is long."),
                    RuleParameter.number(MAX_RIR, 2, 0, 5,
                            "Most reps in reserve at which a long set counts as taken close to failure.")),
            "Past about fifteen reps, a set of a squat, deadlift or other compound lift taken close to failure piles "
                    + "up fatigue (breathing, metabolites, concentration) and costs technique faster than it adds "
                    + "growth stimulus, and it lowers the quality of the sets that follow, so the rule warns. On "
                    + "isolation lifts a long set costs neither technique nor much systemic fatigue, and loads from "
                    + "about 30-40% of 1RM up grow muscle alike when sets end near failure (Schoenfeld et al. 2015: "
                    + "25-35 reps as good as 8-12; Lasevicius et al. 2018: 40% to 80% alike); a 12-15 rep isolation "
                    + "set at RIR 2 (a 15-16 RM load, about 65% of 1RM) is a sound hypertrophy choice and is not "
                    + "reported. From 20 reps to failure, past the 15-20 RM end of the ACSM 2009 hypertrophy and "
                    + "endurance loading, the set takes notably more time and discomfort for the same growth, so the "
                    + "rule informs. Heavier loads for fewer reps, or stopping further from failure, keep most of the "
                    + "stimulus for less fatigue. Each exercise is one finding for the block, quoting its longest set.",
            "Haff & Triplett 2016, NSCA Essentials 4th ed., Ch. 17 (Table 17.7, %1RM and reps); Refalo et al. 2023, "
                    + "Sports Med 53(3):649-665; Schoenfeld et al. 2015, J Strength Cond Res 29(10):2954-2963; "
                    + "Lasevicius et al. 2018, Eur J Sport Sci 18(6):772-780; ACSM 2009 position stand (Ratamess et "
                    + "al., MSSE 41(3):687-708); the 15- and 20-rep thresholds are common practice");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    /** The long sets of one exercise under one set of waivers, across the block. */
    private static final class Hits {
        final Location where;
        final TreeSet<Integer> weeks = new TreeSet<>();
        final Map<Integer, String> days = new TreeMap<>();
        /** The set numbers hit, per week and written session. */
        final Map<List<Object>, Set<Integer>> setsBySession = new LinkedHashMap<>();
        final Set<Double> efforts = new TreeSet<>();
        SetMetrics longest;
        double longestEffort;

        Hits(Location where) {
            this.where = where;
        }
    }

    @Override
    public void check(RuleContext context) {
        double maxRir = context.param(MAX_RIR);
        Map<List<Object>, Hits> byExercise = new LinkedHashMap<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                for (SetMetrics set : session.sets()) {
                    if (!set.effortKnown() || set.rir().getAsDouble() > maxRir) {
                        continue;
                    }
                    double effort = set.reps() + set.rir().getAsDouble();
                    if (effort < context.param(compound(context, set) ? MIN_EFFORT_REPS : MIN_EFFORT_REPS_ISOLATION)) {
                        continue;
                    }
                    Hits hits = byExercise.computeIfAbsent(List.of(set.exerciseId(),
                            List.copyOf(set.prescription().waivers())),
                            k -> new Hits(context.fieldLocation(set.prescription(), "reps")));
                    hits.weeks.add(week.number());
                    hits.days.putIfAbsent(session.day(), Places.day(session));
                    hits.setsBySession.computeIfAbsent(List.of(week.number(), session.day(),
                            session.location().pointer()), k -> new LinkedHashSet<>()).add(set.setNumber());
                    hits.efforts.add(effort);
                    if (hits.longest == null || effort > hits.longestEffort) {
                        hits.longest = set;
                        hits.longestEffort = effort;
                    }
                }
            }
        }
        Occurrences found = new Occurrences();
        byExercise.values().forEach(hits -> add(context, found, hits, maxRir));
        found.report(context);
    }

    private static boolean compound(RuleContext context, SetMetrics set) {
        Exercise exercise = context.exerciseOrNull(set.exerciseId());
        return exercise != null && exercise.isCompound();
    }

    private static void add(RuleContext context, Occurrences found, Hits hits, double maxRir) {
        SetMetrics set = hits.longest;
        boolean compound = compound(context, set);
        Severity severity = compound ? context.severity() : Severities.atMost(context.severity(), Severity.INFO);
        String threshold = compound ? MIN_EFFORT_REPS : MIN_EFFORT_REPS_ISOLATION;
        String days = hits.days.size() == 1 ? hits.days.values().iterator().next()
                : "days " + String.join(", ", hits.days.keySet().stream().map(String::valueOf).toList());
        Set<Set<Integer>> setLists = new LinkedHashSet<>(hits.setsBySession.values());
        String sets = setLists.size() == 1 ? ", " + Texts.sets(setLists.iterator().next()) : "";
        String message = set.exerciseId() + ", " + Occurrences.WEEKS + " " + days + sets + ": "
                + (hits.efforts.size() > 1 ? "the longest, " + EffortText.prescription(set.prescription()) + ", is "
                        : EffortText.prescription(set.prescription()) + " is ") + Texts.effort(hits.longestEffort)
                + " taken close to failure on " + (compound ? "a compound" : "an isolation") + " lift; the "
                + context.profileName() + " profile flags " + (compound ? "compound" : "isolation") + " sets of "
                + context.shown(threshold) + " or more reps to failure taken to RIR " + context.shown(MAX_RIR)
                + " or closer";
        String fix = "reps: " + (compound ? "8-12" : "12-15") + " with a heavier load, or rir: "
                + ((int) Math.floor(maxRir) + 1) + " (stop further from failure)";
        Facts facts = Facts.about(Subject.exercise(set.exerciseId()))
                .measured(hits.longestEffort, context.param(threshold), "reps to failure");
        hits.weeks.forEach(week -> found.add(week, hits.where, set.prescription().waivers(), severity, message, fix,
                facts));
    }
}
