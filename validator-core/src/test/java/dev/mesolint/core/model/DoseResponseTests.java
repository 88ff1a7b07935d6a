package dev.mesolint.core.model;

import static dev.mesolint.core.testing.SetBuilder.reps;
import static dev.mesolint.core.testing.TestProgrammes.exercise;
import static dev.mesolint.core.testing.TestProgrammes.oneSession;
import static dev.mesolint.core.testing.TestProgrammes.programme;
import static dev.mesolint.core.testing.TestProgrammes.session;
import static dev.mesolint.core.testing.TestProgrammes.week;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.testing.TestExercises;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** Weekly dose-response: a per-session plateau, then a scale-free curve of the week's effective sets. */
class DoseResponseTests {
    private static final int[] DAYS = {1, 2, 3, 5, 6};

    private static WeekMetrics week1(WorkItem... work) {
        return ProgrammeMetrics.compute(oneSession(work), TestExercises.CATALOGUE, ModelParameters.defaults())
                .weeks().get(0);
    }

    private static double chestWeek(int sets, String reps, String rir, String rest) {
        return week1(exercise("barbell-bench-press", reps(reps).rir(rir).rest(rest).times(sets)))
                .muscles().get(Muscle.CHEST).stimulus();
    }

    /** The chest's weekly stimulus when each session on its own day does {@code setsPerSession[i]} bench sets. */
    private static double chestWeekSplit(int... setsPerSession) {
        List<Session> sessions = new ArrayList<>();
        for (int i = 0; i < setsPerSession.length; i++) {
            sessions.add(session(DAYS[i], "Press " + (i + 1), exercise("barbell-bench-press",
                    reps("8").rir("1").rest("3min").times(setsPerSession[i]))));
        }
        return ProgrammeMetrics.compute(programme(week(1, sessions.toArray(Session[]::new))), TestExercises.CATALOGUE,
                ModelParameters.defaults()).weeks().get(0).muscles().get(Muscle.CHEST).stimulus();
    }

    @Test
    void sixSetsOfEightAtRirOneWithThreeMinutesRestGiveAboutTwiceOneSetAtOneSessionAWeek() {
        // Brief check value from the dose-response data (Schoenfeld, Ogborn & Krieger 2017; Pelland et al. 2024):
        // doubling one hard set's growth takes about six sets in all (+-10%).
        double ratio = chestWeek(6, "8", "1", "3min") / chestWeek(1, "8", "1", "3min");
        assertTrue(ratio >= 1.8 && ratio <= 2.2, "six sets give " + ratio + " x one set");
    }

    @Test
    void sixSetsOfEightAtRirOneWithThreeMinutesRestGiveAboutTwiceOneSetAtThreeSessionsAWeek() {
        // The same check at three sessions a week (brief, section 4): 3 x 6 sets vs 3 x 1 set, +-10%.
        double ratio = chestWeekSplit(6, 6, 6) / chestWeekSplit(1, 1, 1);
        assertTrue(ratio >= 1.8 && ratio <= 2.2, "six sets a session give " + ratio + " x one set a session");
    }

    @ParameterizedTest(name = "{0} sets a week")
    @ValueSource(ints = {4, 6, 10})
    void theSameWeeklySetsSplitOverOneToFiveSessionsGiveAboutTheSameStimulus(int weekly) {
        // Volume-equated frequency meta-analyses (Schoenfeld, Grgic & Krieger 2019; Pelland et al. 2024): little or
        // no difference. Brief check value: within 15% of each other for up to ~10 sets a session.
        List<Double> stimuli = new ArrayList<>();
        for (int sessions = 1; sessions <= Math.min(5, weekly); sessions++) {
            int[] split = new int[sessions];
            for (int i = 0; i < weekly; i++) {
                split[i % sessions]++;
            }
            stimuli.add(chestWeekSplit(split));
        }
        double max = stimuli.stream().mapToDouble(Double::doubleValue).max().orElseThrow();
        double min = stimuli.stream().mapToDouble(Double::doubleValue).min().orElseThrow();
        assertTrue(max <= 1.15 * min, "1 to 5 sessions give " + stimuli);
    }

    @Test
    void twentySetsInOneSessionGiveClearlyLessThanTwoSessionsOfTen() {
        // Brief check value: very large single-session doses give less per set (a per-session plateau at roughly
        // ten sets, from memory): 20 sets in one session <= 0.85 x two sessions of 10 on other days.
        double one = chestWeekSplit(20);
        double two = chestWeekSplit(10, 10);
        assertTrue(one <= 0.85 * two, one + " vs " + two);
    }

    /** The weekly stimulus of {@code exercise}'s prime mover: two sessions of 3 x 10 at failure with {@code rest}. */
    private static double twiceWeekly(String exercise, Muscle muscle, String rest) {
        return ProgrammeMetrics.compute(programme(week(1,
                        session(1, "A", exercise(exercise, reps("10").rir("0").rest(rest).times(3))),
                        session(4, "B", exercise(exercise, reps("10").rir("0").rest(rest).times(3))))),
                TestExercises.CATALOGUE, ModelParameters.defaults()).weeks().get(0).muscles().get(muscle).stimulus();
    }

    @Test
    void longerRestGivesASmallWeeklyGainLargerOnLowerBodyCompoundWork() {
        // Schoenfeld et al. 2016 (JSCR 30(7):1805-1812): 3 min beat 1 min, most clearly in the thigh; Singer et al.
        // 2024 (meta-analysis): a small benefit of rests over about 60-90 s. Small: under 25% a week.
        double squat = twiceWeekly("barbell-back-squat", Muscle.QUADRICEPS, "3min")
                / twiceWeekly("barbell-back-squat", Muscle.QUADRICEPS, "1min");
        double bench = twiceWeekly("barbell-bench-press", Muscle.CHEST, "3min")
                / twiceWeekly("barbell-bench-press", Muscle.CHEST, "1min");
        double curl = twiceWeekly("dumbbell-curl", Muscle.BICEPS, "3min")
                / twiceWeekly("dumbbell-curl", Muscle.BICEPS, "1min");
        assertTrue(squat > 1.02 && squat < 1.25, "squat " + squat);
        assertTrue(curl > 1.0 && curl < 1.25, "curl " + curl);
        assertTrue(squat > bench && bench > curl, "squat " + squat + ", bench " + bench + ", curl " + curl);
    }

    @Test
    void twoOrThreeSetsGiveRoughlyFortyPercentMoreThanOne() {
        // Krieger 2010, JSCR 24(4):1150-1159: multiple sets ~40% larger effect size than one set (2-3 sets).
        double one = chestWeek(1, "10", "1", "2min");
        double two = chestWeek(2, "10", "1", "2min") / one;
        double three = chestWeek(3, "10", "1", "2min") / one;
        assertTrue(two >= 1.2 && two <= 1.6, "two sets: " + two);
        assertTrue(three >= 1.3 && three <= 1.8, "three sets: " + three);
    }

    @Test
    void sixFreshHardSetsAWeekAreExactlyTwoUnits() {
        // Brief calibration: doubling the growth of one fresh hard set takes five more (six in all), at any
        // number of sessions: W = x^p with p = ln 2 / ln 6.
        DoseResponse dose = new DoseResponse(ModelParameters.defaults());
        assertEquals(1.0, dose.weeklyStimulus(1), 1e-12);
        assertEquals(2.0, dose.weeklyStimulus(6), 1e-12);
        assertEquals(4.0, dose.weeklyStimulus(36), 1e-12);
        assertEquals(0.0, dose.weeklyStimulus(0), 1e-12);
    }

    @Test
    void aSessionsEffectiveSetsFollowItsSetsAtFirstAndLevelOffBeyondAboutTen() {
        // Per-session plateau at roughly ten sets (brief, from memory): a few sets count about in full, twice ten
        // sets count well under twice, and no session counts more than the plateau.
        DoseResponse dose = new DoseResponse(ModelParameters.defaults());
        double plateau = ModelParameters.defaults().sessionPlateauSets();
        assertTrue(dose.sessionEffective(2) >= 0.98 * 2, "2 -> " + dose.sessionEffective(2));
        assertTrue(dose.sessionEffective(20) <= 1.4 * dose.sessionEffective(10), "20 -> " + dose.sessionEffective(20));
        assertTrue(dose.sessionEffective(1000) < plateau);
    }

    // Property over set counts, rests, reps and reserve: appending a set never lowers the weekly stimulus.
    @ParameterizedTest(name = "{0} reps @ RIR {1}, rest {2}")
    @CsvSource({"5, 0, 30s", "5, 2, 3min", "8, 1, 60s", "8, 1, 3min", "10, 3, 90s", "12, 0, 45s", "15, 1, 2min",
            "20, 0, 30s", "20, 0, 5min", "30, 0, 15s", "6, 4, 2min", "10, 7, 2min"})
    void addingASetNeverLowersTheWeeklyStimulus(String reps, String rir, String rest) {
        double previous = 0;
        for (int sets = 1; sets <= 25; sets++) {
            double stimulus = chestWeek(sets, reps, rir, rest);
            assertTrue(stimulus >= previous - 1e-12, sets + " sets: " + stimulus + " < " + previous);
            previous = stimulus;
        }
    }

    @Test
    void addingASetOfAnotherExerciseAtTheEndNeverLowersTheWeeklyStimulus() {
        List<WorkItem> work = new ArrayList<>();
        work.add(exercise("barbell-bench-press", reps("8").rir("1").rest("2min").times(4)));
        double previous = week1(work.toArray(WorkItem[]::new)).muscles().get(Muscle.CHEST).stimulus();
        for (int sets = 1; sets <= 10; sets++) {
            List<WorkItem> more = new ArrayList<>(work);
            more.add(exercise("cable-fly", reps("15").rir("0").rest("45s").times(sets)));
            double stimulus = week1(more.toArray(WorkItem[]::new)).muscles().get(Muscle.CHEST).stimulus();
            assertTrue(stimulus >= previous - 1e-12, sets + " fly sets: " + stimulus + " < " + previous);
            previous = stimulus;
        }
    }
}
