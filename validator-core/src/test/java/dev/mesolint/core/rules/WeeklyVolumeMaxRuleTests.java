package dev.mesolint.core.rules;

import static dev.mesolint.core.rules.RuleRun.exercise;
import static dev.mesolint.core.rules.RuleRun.header;
import static dev.mesolint.core.rules.RuleRun.session;
import static dev.mesolint.core.rules.RuleRun.week;
import static dev.mesolint.core.rules.RuleRun.weeks;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.finding.Finding;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WeeklyVolumeMaxRuleTests {
    @TempDir
    Path dir;

    /** 22 hard chest sets and 24 hard lats sets over days 1, 3 and 5 (at most 8 per session each). */
    private static final String PROGRAMME = header("advanced", "strength", "90") + weeks(week(1, false,
            day(1, "barbell-bench-press"), day(3, "machine-chest-press"), day(5, "dumbbell-bench-press")));

    private static String day(int day, String press) {
        int chest = day == 5 ? 6 : 8;
        return session(day, exercise(press, "sets: " + chest + "\nreps: 8\nrir: 2\nrest: 2.5min"),
                exercise("cable-lat-pulldown", "sets: 4\nreps: 10\nrir: 2\nrest: 2min"),
                exercise("pull-up", "sets: 4\nreps: 8\nrir: 2\nrest: 2.5min"));
    }

    private List<String> muscles(RuleRun settings) {
        return settings.findings(dir, PROGRAMME, WeeklyVolumeMaxRule.ID).stream()
                .map(Finding::message).map(m -> m.substring(0, m.indexOf(','))).toList();
    }

    @Test
    void theCompetitionLiftsMusclesAreThePrimeMoversOfTheSquatBenchPressAndDeadlift() {
        Catalogue catalogue = new Checker(CheckRequest.of(List.of(), dir), BuiltInRules.all()).catalogue();
        Set<Muscle> primeMovers = EnumSet.noneOf(Muscle.class);
        for (String lift : List.of("barbell-back-squat", "barbell-bench-press", "barbell-deadlift")) {
            catalogue.find(lift).orElseThrow().muscles().forEach((muscle, credit) -> {
                if (credit >= Exercise.PRIME_MOVER) {
                    primeMovers.add(muscle);
                }
            });
        }
        assertEquals(primeMovers, WeeklyVolumeMaxRule.COMPETITION_PRIME_MOVERS);
    }

    @Test
    void theHypertrophyLimitIsTwentyForEveryMuscle() {
        // common practice, drawn from the weekly-set dose-response data (Schoenfeld, Ogborn & Krieger 2017,
        // J Sports Sci 35(11):1073-1082; Pelland et al. 2024): returns diminish well before 20 hard sets a week
        assertEquals(List.of("chest", "lats"), muscles(RuleRun.defaults()));
    }

    @Test
    void aHigherLimitForTheCompetitionLiftsLeavesTheOtherMusclesAtTheirOwn() {
        // What the strength profile sets: 25 for the squat, bench press and deadlift muscles.
        assertEquals(List.of("lats"), muscles(RuleRun.defaults().profile("strength")
                .param(WeeklyVolumeMaxRule.ID, "max-sets-competition-lifts", 25)));
    }
}
