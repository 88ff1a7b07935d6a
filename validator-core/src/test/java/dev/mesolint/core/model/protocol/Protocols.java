package dev.mesolint.core.model.protocol;

import static dev.mesolint.core.model.protocol.ProtocolProgramme.block;
import static dev.mesolint.core.model.protocol.ProtocolProgramme.ex;
import static dev.mesolint.core.model.protocol.ProtocolProgramme.onDays;
import static dev.mesolint.core.model.protocol.ProtocolProgramme.session;
import static dev.mesolint.core.model.protocol.ProtocolProgramme.superset;
import static dev.mesolint.core.model.protocol.ProtocolProgramme.weekly;

import dev.mesolint.core.catalogue.Muscle;
import java.util.List;

/**
 * The outcome studies the model is held to, each encoded as Harbourside programmes with its arms as published.
 * Every comparison is the ratio of the model's block stimulus (weekly stimulus added up over the weeks) of one arm
 * over the other, for the muscle the study measured. One set of parameters, the defaults, serves them all.
 *
 * <p>Bands: the published ratio with its interval where known; otherwise +-25% around the published ratio, or the
 * direction the study states. "From memory" marks figures recalled without the paper at hand: for those only the
 * direction or a wide band is used.
 */
final class Protocols {
    private static final double SIMILAR_LOW = 0.75;
    private static final double SIMILAR_HIGH = 1.25;
    private static final double OPEN = Double.POSITIVE_INFINITY;
    private static final int[] MON = {1};
    private static final int[] MON_THU = {1, 4};
    private static final int[] MON_WED_FRI = {1, 3, 5};

    private Protocols() {
    }

    static double ratio(ProtocolProgramme second, ProtocolProgramme first, Muscle muscle) {
        return second.blockStimulus(muscle) / first.blockStimulus(muscle);
    }

    static List<Comparison> all() {
        return List.of(
                // Schoenfeld, Grgic & Krieger 2019, J Sports Sci 37(11):1286-1295: with weekly volume equated,
                // training frequency made no significant difference to growth. Band: similar, +-25%.
                new Comparison("Schoenfeld, Grgic & Krieger 2019", "10 chest sets a week: 2 sessions of 5 vs 1 of 10",
                        "no difference when volume is equated", SIMILAR_LOW, SIMILAR_HIGH,
                        () -> ratio(chestSplit(2), chestSplit(1), Muscle.CHEST)),
                new Comparison("Schoenfeld, Grgic & Krieger 2019", "10 chest sets a week: 5 sessions of 2 vs 1 of 10",
                        "no difference when volume is equated", SIMILAR_LOW, SIMILAR_HIGH,
                        () -> ratio(chestSplit(5), chestSplit(1), Muscle.CHEST)),
                // Pelland et al. 2024 (SportRxiv preprint; from memory): frequency adds little or nothing to growth
                // once weekly sets are accounted for. Band: similar, +-25%.
                new Comparison("Pelland et al. 2024", "12 quadriceps sets a week: 4 sessions of 3 vs 2 of 6",
                        "little or no effect of frequency (from memory)", SIMILAR_LOW, SIMILAR_HIGH,
                        () -> ratio(quadSplit(4), quadSplit(2), Muscle.QUADRICEPS)),
                // Robinson et al. 2024, Sports Med (meta-regression): growth falls as estimated reps in reserve rise,
                // but stays above zero far from failure (direction; slope from memory).
                new Comparison("Robinson et al. 2024", "3 x 10 curls twice a week: RIR 4 vs RIR 0",
                        "less growth further from failure", 0, 1,
                        () -> ratio(curlsAt("4"), curlsAt("0"), Muscle.BICEPS)),
                new Comparison("Robinson et al. 2024", "3 x 10 curls twice a week: RIR 8 vs RIR 0",
                        "still some growth far from failure", 0.02, 1,
                        () -> ratio(curlsAt("8"), curlsAt("0"), Muscle.BICEPS)),
                // Refalo et al. 2023, Sports Med 53:649-665: failure and non-failure training grow muscle about
                // equally (a trivial, non-significant edge for failure; from memory). Band: similar, +-25%.
                new Comparison("Refalo et al. 2023", "3 x 10 bench press twice a week: RIR 2 vs failure",
                        "similar growth", SIMILAR_LOW, SIMILAR_HIGH,
                        () -> ratio(benchAt("2"), benchAt("0"), Muscle.CHEST)),
                // Refalo et al. 2024 (J Sports Sci; within-subject, quadriceps; from memory): 1-2 RIR and failure gave
                // similar growth over 8 weeks. Band: similar, +-25%.
                new Comparison("Refalo et al. 2024", "4 x 10 leg extension twice a week, 8 weeks: RIR 1-2 vs failure",
                        "similar growth", SIMILAR_LOW, SIMILAR_HIGH,
                        () -> ratio(legExtensionAt("1-2"), legExtensionAt("0"), Muscle.QUADRICEPS)),
                // Pareja-Blanco et al. 2017, Scand J Med Sci Sports 27(7):724-735: squat, 8 weeks, 70-85% 1RM, sets
                // stopped at 20% or 40% velocity loss; quadriceps CSA about +4.7% vs +7.7% (from memory): 0.61, +-25%.
                new Comparison("Pareja-Blanco et al. 2017", "squat 3 sets twice a week, 70 -> 85% 1RM: 20% vs 40% velocity loss",
                        "VL20 grew less, 0.61 of VL40 (from memory)", 0.46, 0.76,
                        () -> ratio(velocityLoss(new String[] {"5", "4", "3-4", "3"}),
                                velocityLoss(new String[] {"8", "7", "6", "5"}), Muscle.QUADRICEPS)),
                // Schoenfeld et al. 2016, JSCR 30(7):1805-1812: 3 min rest gave more anterior-thigh growth than
                // 1 min (not significant; figures from memory). Direction: 3 min ahead.
                new Comparison("Schoenfeld et al. 2016", "squat, leg press, leg extension 3 x 10 at failure, 3 a week: 3 min vs 1 min rest",
                        "more thigh growth with 3 min (direction)", 1, 2,
                        () -> ratio(restLegs("3min"), restLegs("1min"), Muscle.QUADRICEPS)),
                // Singer et al. 2024 (Bayesian meta-analysis; from memory): a small benefit of rests longer than
                // about 60-90 s. Band: ahead, by less than 25%.
                new Comparison("Singer et al. 2024", "3 x 10 bench press at RIR 1 twice a week: 2 min vs 1 min rest",
                        "small benefit of longer rest (from memory)", 1, SIMILAR_HIGH,
                        () -> ratio(benchRest("2min"), benchRest("1min"), Muscle.CHEST)),
                // Schoenfeld et al. 2014, JSCR 28(10):2909-2918: 7 x 3RM three times a week vs a 3 x 10RM split,
                // volume load equated; biceps thickness grew alike (figures from memory). Band: similar, +-25%.
                new Comparison("Schoenfeld et al. 2014", "pulls: 7 x 3RM 3 a week vs 3 exercises x 3 x 10RM once a week",
                        "similar biceps growth", SIMILAR_LOW, SIMILAR_HIGH,
                        () -> ratio(heavyPulls(), moderatePulls(), Muscle.BICEPS)),
                // Schoenfeld et al. 2015, JSCR 29(10):2954-2963: 25-35RM vs 8-12RM, 3 sets to failure, 3 a week;
                // growth alike in elbow flexors and quadriceps. Band: similar, +-25%.
                new Comparison("Schoenfeld et al. 2015", "3 x 30 vs 3 x 10 to failure, 3 a week: curls",
                        "similar growth", SIMILAR_LOW, SIMILAR_HIGH,
                        () -> ratio(loadArm("dumbbell-curl", "30"), loadArm("dumbbell-curl", "10"), Muscle.BICEPS)),
                new Comparison("Schoenfeld et al. 2015", "3 x 30 vs 3 x 10 to failure, 3 a week: leg press",
                        "similar growth", SIMILAR_LOW, SIMILAR_HIGH,
                        () -> ratio(loadArm("machine-leg-press", "30"), loadArm("machine-leg-press", "10"),
                                Muscle.QUADRICEPS)),
                // Fink et al. 2018, J Sports Med Phys Fitness 58(5):597-605: one 12RM set with two 20% drops vs
                // 3 x 12RM; triceps grew at least as much with the drop set (about +10% vs +5%, from memory).
                new Comparison("Fink et al. 2018", "pushdowns: one 12RM set + 2 drops vs 3 x 12RM",
                        "at least as much triceps growth", 1, OPEN,
                        () -> ratio(dropSet("cable-triceps-pushdown", "12"), straightSets("cable-triceps-pushdown", "12"),
                                Muscle.TRICEPS)),
                // Coleman et al. 2022 (meta-analysis): drop sets grow muscle about as well as traditional sets, in
                // less time. Band: similar, +-25%.
                new Comparison("Coleman et al. 2022", "curls: one set to failure + 2 drops vs 3 sets to failure",
                        "similar growth in less time", SIMILAR_LOW, SIMILAR_HIGH,
                        () -> ratio(dropSet("dumbbell-curl", "10"), straightSets("dumbbell-curl", "10"), Muscle.BICEPS)),
                // Krieger 2010, JSCR 24(4):1150-1159: effect sizes 1 : 1.42 : 1.83 for 1, 2-3 and 4-6 sets per
                // exercise per session. Bands: +-25% around each.
                new Comparison("Krieger 2010", "bench press 3 a week: 2-3 sets vs 1 set per session",
                        "1.42 x", 1.42 * 0.75, 1.42 * 1.25,
                        () -> (ratio(setsPerSession(2), setsPerSession(1), Muscle.CHEST)
                                + ratio(setsPerSession(3), setsPerSession(1), Muscle.CHEST)) / 2),
                new Comparison("Krieger 2010", "bench press 3 a week: 4-6 sets vs 1 set per session",
                        "1.83 x", 1.83 * 0.75, 1.83 * 1.25,
                        () -> (ratio(setsPerSession(4), setsPerSession(1), Muscle.CHEST)
                                + ratio(setsPerSession(5), setsPerSession(1), Muscle.CHEST)
                                + ratio(setsPerSession(6), setsPerSession(1), Muscle.CHEST)) / 3),
                // Schoenfeld, Ogborn & Krieger 2017, J Sports Sci 35(11):1073-1082: growth graded with weekly sets,
                // <5, 5-9 and 10+ (about 5.4%, 6.6%, 9.8%, from memory: 1 : 1.22 : 1.81). Bands: +-25%.
                new Comparison("Schoenfeld, Ogborn & Krieger 2017", "weekly chest sets over 2 sessions: 7 vs 4",
                        "1.22 x (from memory)", 1.22 * 0.75, 1.22 * 1.25,
                        () -> ratio(weeklySets(7), weeklySets(4), Muscle.CHEST)),
                new Comparison("Schoenfeld, Ogborn & Krieger 2017", "weekly chest sets over 2 sessions: 12 vs 4",
                        "1.81 x (from memory)", 1.81 * 0.75, 1.81 * 1.25,
                        () -> ratio(weeklySets(12), weeklySets(4), Muscle.CHEST)),
                // Schoenfeld et al. 2019, MSSE 51(1):94-103: 1, 3 or 5 sets per exercise, 3 a week, 8 weeks; growth
                // graded with sets (figures from memory). Direction: more sets, more growth.
                new Comparison("Schoenfeld et al. 2019", "squat, leg press, leg extension 3 a week: 3 vs 1 set each",
                        "graded: more with 3 sets", 1, OPEN,
                        () -> ratio(setsPerExercise(3), setsPerExercise(1), Muscle.QUADRICEPS)),
                new Comparison("Schoenfeld et al. 2019", "squat, leg press, leg extension 3 a week: 5 vs 3 sets each",
                        "graded: more with 5 sets", 1, OPEN,
                        () -> ratio(setsPerExercise(5), setsPerExercise(3), Muscle.QUADRICEPS)),
                // Paired (agonist-antagonist) sets vs traditional sets: similar growth in less time (from memory; no
                // single paper at hand). Band: similar, +-25%.
                new Comparison("paired-set studies (from memory)", "bench press + row: 3 paired rounds vs 3 + 3 straight sets",
                        "similar growth in less time (from memory)", SIMILAR_LOW, SIMILAR_HIGH,
                        () -> ratio(pairedSets(), traditionalPair(), Muscle.CHEST)));
    }

    // ---- the arms: 8 weeks unless the study ran otherwise ----

    private static ProtocolProgramme chestSplit(int sessions) {
        int[][] sets = {{10}, {5, 5}, {4, 3, 3}, {3, 3, 2, 2}, {2, 2, 2, 2, 2}};
        int[] days = {1, 2, 3, 5, 6};
        return block(8, w -> {
            List<String> s = new java.util.ArrayList<>();
            for (int i = 0; i < sessions; i++) {
                s.add(session(days[i], ex("barbell-bench-press", sets[sessions - 1][i], "reps: 10, rir: 1, rest: 2min")));
            }
            return s;
        });
    }

    private static ProtocolProgramme quadSplit(int sessions) {
        if (sessions == 2) {
            return weekly(8, onDays(MON_THU, ex("barbell-back-squat", 3, "reps: 8, rir: 2, rest: 3min"),
                    ex("machine-leg-extension", 3, "reps: 12, rir: 1, rest: 90s")).toArray(String[]::new));
        }
        return weekly(8,
                session(1, ex("barbell-back-squat", 3, "reps: 8, rir: 2, rest: 3min")),
                session(3, ex("machine-leg-extension", 3, "reps: 12, rir: 1, rest: 90s")),
                session(5, ex("barbell-back-squat", 3, "reps: 8, rir: 2, rest: 3min")),
                session(7, ex("machine-leg-extension", 3, "reps: 12, rir: 1, rest: 90s")));
    }

    private static ProtocolProgramme curlsAt(String rir) {
        return weekly(8, onDays(MON_THU, ex("dumbbell-curl", 3, "reps: 10, rir: " + rir + ", rest: 2min"))
                .toArray(String[]::new));
    }

    private static ProtocolProgramme benchAt(String rir) {
        return weekly(8, onDays(MON_THU, ex("barbell-bench-press", 3, "reps: 10, rir: " + rir + ", rest: 2min"))
                .toArray(String[]::new));
    }

    private static ProtocolProgramme legExtensionAt(String rir) {
        return weekly(8, onDays(MON_THU, ex("machine-leg-extension", 4, "reps: 10, rir: " + rir + ", rest: 2min"))
                .toArray(String[]::new));
    }

    /** Two weeks at each of 70, 75, 80 and 85% of 1RM; reps per set stop at the velocity-loss cut-off. */
    private static ProtocolProgramme velocityLoss(String[] repsPerStage) {
        String[] loads = {"70%", "75%", "80%", "85%"};
        return block(8, w -> onDays(MON_THU, ex("barbell-back-squat", 3,
                "reps: " + repsPerStage[(w - 1) / 2] + ", load: " + loads[(w - 1) / 2] + ", rest: 4min")));
    }

    private static ProtocolProgramme restLegs(String rest) {
        String fields = "reps: 10, rir: 0, rest: " + rest;
        return weekly(8, onDays(MON_WED_FRI, ex("barbell-back-squat", 3, fields), ex("machine-leg-press", 3, fields),
                ex("machine-leg-extension", 3, fields)).toArray(String[]::new));
    }

    private static ProtocolProgramme benchRest(String rest) {
        return weekly(8, onDays(MON_THU, ex("barbell-bench-press", 3, "reps: 10, rir: 1, rest: " + rest))
                .toArray(String[]::new));
    }

    private static ProtocolProgramme heavyPulls() {
        return weekly(8, onDays(MON_WED_FRI, ex("cable-lat-pulldown", 7, "reps: 3, rir: 0, rest: 3min"))
                .toArray(String[]::new));
    }

    private static ProtocolProgramme moderatePulls() {
        String fields = "reps: 10, rir: 0, rest: 90s";
        return weekly(8, session(1, ex("cable-lat-pulldown", 3, fields), ex("seated-cable-row", 3, fields),
                ex("machine-chest-supported-row", 3, fields)));
    }

    private static ProtocolProgramme loadArm(String exercise, String reps) {
        return weekly(8, onDays(MON_WED_FRI, ex(exercise, 3, "reps: " + reps + ", rir: 0, rest: 90s"))
                .toArray(String[]::new));
    }

    private static ProtocolProgramme dropSet(String exercise, String reps) {
        return weekly(8, onDays(MON_THU, ex(exercise, 1, "reps: " + reps + ", rir: 0, technique: drop-set"))
                .toArray(String[]::new));
    }

    private static ProtocolProgramme straightSets(String exercise, String reps) {
        return weekly(8, onDays(MON_THU, ex(exercise, 3, "reps: " + reps + ", rir: 0, rest: 90s"))
                .toArray(String[]::new));
    }

    private static ProtocolProgramme setsPerSession(int sets) {
        return weekly(8, onDays(MON_WED_FRI, ex("barbell-bench-press", sets, "reps: 10, rir: 1, rest: 2min"))
                .toArray(String[]::new));
    }

    private static ProtocolProgramme weeklySets(int sets) {
        int first = (sets + 1) / 2;
        return weekly(8, session(1, ex("barbell-bench-press", first, "reps: 10, rir: 1, rest: 2min")),
                session(4, ex("barbell-bench-press", sets - first, "reps: 10, rir: 1, rest: 2min")));
    }

    private static ProtocolProgramme setsPerExercise(int sets) {
        String fields = "reps: 10, rir: 0, rest: 90s";
        return weekly(8, onDays(MON_WED_FRI, ex("barbell-back-squat", sets, fields), ex("machine-leg-press", sets, fields),
                ex("machine-leg-extension", sets, fields)).toArray(String[]::new));
    }

    private static ProtocolProgramme pairedSets() {
        return weekly(8, onDays(MON_THU, superset(3, "2min", "exercise: barbell-bench-press, reps: 10, rir: 1",
                "exercise: seated-cable-row, reps: 10, rir: 1")).toArray(String[]::new));
    }

    private static ProtocolProgramme traditionalPair() {
        return weekly(8, onDays(MON_THU, ex("barbell-bench-press", 3, "reps: 10, rir: 1, rest: 2min"),
                ex("seated-cable-row", 3, "reps: 10, rir: 1, rest: 2min")).toArray(String[]::new));
    }
}
