package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.rule.ExerciseCredits;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.rule.RuleSettings;
import dev.mesolint.core.rule.WeeklyVolumeLimit;
import dev.mesolint.core.source.Location;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeMap;

/**
 * A muscle the programme trains directly gets too few counted sets in a week to be worth its time: one finding per
 * muscle for all the weeks it falls short in (the cause, the direct work's volume, is the same), not one a week.
 */
public final class WeeklyVolumeMinRule implements Rule, WeeklyVolumeLimit {
    public static final String ID = "weekly-volume-min";
    static final String MIN_SETS = "min-sets";
    static final String MAX_RIR = "max-rir";
    private static final int MUSCLES = Muscle.values().length;

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "A muscle the programme trains directly (a prime mover of one of its exercises) gets at least "
                    + "{min-sets} credited sets a week done at RIR {max-rir} or closer; deload weeks are skipped, and "
                    + "the weeks a muscle falls short in are one finding.",
            Severity.INFO, RuleMetadata.Category.VOLUME,
            parameters(),
            "Weekly sets per muscle drive growth, and the dose-response meta-analyses find small effects at the "
                    + "lowest volumes (fewer than 5 weekly sets still grew muscle, though less than 10 or more did: "
                    + "Schoenfeld, Ogborn & Krieger 2017). When a programme gives a muscle an exercise of its own but fewer than "
                    + "about four hard sets in the week, the exercise costs a place in the session for little "
                    + "return: add sets, or drop the direct work and let the compound lifts cover the muscle. "
                    + "Muscles only ever trained as synergists are not checked (the programme does not aim at them), "
                    + "nor are deload weeks; a muscle short in several weeks is one finding naming them. The "
                    + "general-fitness profile asks 2 sets a week counted at any effort up to 10 reps in reserve: "
                    + "the ACSM position stands find one set per exercise of 8-12 reps at a moderate load (60-70% of "
                    + "1RM, about 10 reps in reserve at 60% by the Epley relation), 2-3 days a week, effective for "
                    + "novices and general fitness. The strength profile turns the rule off: its floor is a growth "
                    + "dose, while 1RM strength rises on single sets done 2-3 times a week (Androulakis-Korakakis, "
                    + "Fisher & Steele 2020) and heavy strength sets are far from failure by design, so they are not "
                    + "hard sets. The 4-set threshold is common practice drawn from the dose-response literature. Sets that "
                    + "reps in reserve do not describe count as well, at their credit: ballistic and Olympic lifts "
                    + "always, and under the general-fitness profile strength-purpose sets (at most 6 reps at 60% of "
                    + "1RM or more), which stay far from failure on purpose; the message then says \"hard and "
                    + "strength sets\".",
            "Schoenfeld, Ogborn & Krieger 2017, J Sports Sci 35(11):1073-1082; Pelland et al. 2024; ACSM 2009 "
                    + "position stand (Ratamess et al., MSSE 41(3):687-708) and Garber et al. 2011, MSSE "
                    + "43(7):1334-1359 (general fitness: 1 set of 8-12 reps, 2-3 days a week); "
                    + "Androulakis-Korakakis, Fisher & Steele 2020, Sports Med 50(4):751-765 (strength); the 4-set "
                    + "threshold is common practice drawn from that dose-response literature");

    private static List<RuleParameter> parameters() {
        List<RuleParameter> all = new ArrayList<>();
        all.add(RuleParameter.number(MIN_SETS, 4, 1, 20,
                "Fewest credited sets a week for a muscle the programme trains directly."));
        all.add(RuleParameter.number(MAX_RIR, 3, 0, 30,
                "Most reps in reserve a set may leave and still count; 3 counts the model's hard sets."));
        all.addAll(StrengthSets.parameters());
        return List.copyOf(all);
    }

    /** The weekly floor under {@code settings}. */
    public static double floor(RuleSettings settings) {
        return settings.value(MIN_SETS);
    }

    @Override
    public OptionalDouble weeklyFloor(RuleSettings settings, Muscle muscle) {
        return OptionalDouble.of(floor(settings));
    }

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        double min = context.param(MIN_SETS);
        double maxRir = context.param(MAX_RIR);
        Map<Muscle, String> trained = context.metrics().directlyTrained();
        if (trained.isEmpty()) {
            return;
        }
        List<WeekMetrics> weeks = context.metrics().weeks();
        List<Counted> counts = new ArrayList<>(weeks.size());
        for (WeekMetrics week : weeks) {
            counts.add(counted(context, week, maxRir));
        }
        Occurrences found = new Occurrences();
        trained.forEach((muscle, exercise) -> {
            // Weeks short of the floor, split by the waivers written on each week, so a waiver keeps to its week.
            Map<List<Waiver>, TreeMap<Integer, Double>> shortWeeks = new LinkedHashMap<>();
            boolean strength = false;
            for (int i = 0; i < weeks.size(); i++) {
                WeekMetrics week = weeks.get(i);
                double sets = counts.get(i).close[muscle.ordinal()];
                double strengthSets = counts.get(i).strength[muscle.ordinal()];
                strength |= strengthSets > 0;
                sets += strengthSets;
                if (!week.deload() && sets < min) {
                    Week written = context.index().week(week.number());
                    List<Waiver> waivers = written == null ? List.of() : written.waivers();
                    shortWeeks.computeIfAbsent(waivers, w -> new TreeMap<>()).put(week.number(), sets);
                }
            }
            boolean anyStrength = strength;
            shortWeeks.forEach((waivers, weeksShort) -> add(context, found, muscle, exercise, waivers, weeksShort, min,
                    maxRir, anyStrength));
        });
        found.report(context);
    }

    private static void add(RuleContext context, Occurrences found, Muscle muscle, String exercise,
            List<Waiver> waivers, TreeMap<Integer, Double> weeks, double min, double maxRir, boolean strength) {
        double fewest = weeks.values().stream().mapToDouble(Double::doubleValue).min().orElseThrow();
        double most = weeks.values().stream().mapToDouble(Double::doubleValue).max().orElseThrow();
        boolean hard = maxRir == context.metrics().parameters().hardSetMaxRir();
        String noun = hard ? (strength ? "hard and strength sets" : "hard sets")
                : "sets at RIR " + Texts.num(maxRir) + " or closer" + (strength ? " or for strength" : "");
        String counted = fewest == most ? Texts.num(fewest) : Texts.num(fewest) + "-" + Texts.num(most);
        double missing = Math.ceil(min - fewest);
        String name = Texts.muscle(muscle);
        Location at = weekLocation(context, weeks.firstKey());
        String message = name + ", " + Occurrences.WEEKS + ": " + counted + " " + (fewest == 1 && most == 1
                ? singular(noun) : noun) + " a week, under the "
                + context.shown(MIN_SETS) + " the " + context.profileName()
                + " profile asks for a muscle the programme trains directly (" + exercise + ")";
        String fix = "add " + Texts.num(missing) + " " + (missing == 1 ? singular(noun) : noun)
                + " a week for the " + name + " (e.g. on " + exercise + "), or drop the direct work";
        Facts facts = Facts.about(Subject.muscle(name)).measured(fewest, min, "sets");
        weeks.keySet().forEach(week -> found.add(week, at, waivers, context.severity(), message, fix, facts));
    }

    /** {@code hard set} for {@code hard sets}. */
    private static String singular(String noun) {
        int at = noun.indexOf("sets"); // the first only, as the words are built
        return at < 0 ? noun : noun.substring(0, at) + "set" + noun.substring(at + "sets".length());
    }

    /** The week as written ({@code - week: 2}), where the finding points. */
    private static Location weekLocation(RuleContext context, int number) {
        Optional<Week> written = Places.week(context, number);
        return written.map(Week::location).orElseGet(() -> context.metrics().week(number).orElseThrow().location());
    }

    /** One week's credited sets per muscle (by ordinal): those close to failure, and the strength sets besides. */
    private record Counted(double[] close, double[] strength) {
    }

    /**
     * Credited sets per muscle (1 a prime-mover set, 0.5 a synergist set, the way the model credits hard sets), in
     * one walk of the week: {@code close} those leaving at most {@code maxRir} in reserve (sets of unknown effort do
     * not count); {@code strength} the others that are strength-purpose or ballistic.
     */
    private static Counted counted(RuleContext context, WeekMetrics week, double maxRir) {
        Counted counted = new Counted(new double[MUSCLES], new double[MUSCLES]);
        for (SessionMetrics session : week.sessions()) {
            for (SetMetrics set : session.sets()) {
                ExerciseCredits credits = context.index().credits(set.exerciseId());
                if (credits == null) {
                    continue;
                }
                boolean close = set.effortKnown() && set.rir().getAsDouble() <= maxRir;
                double[] into = close ? counted.close : StrengthSets.notJudged(context, set) ? counted.strength : null;
                if (into != null) {
                    for (int k = 0; k < credits.size(); k++) {
                        into[credits.ordinal(k)] += credits.credit(k);
                    }
                }
            }
        }
        return counted;
    }
}
