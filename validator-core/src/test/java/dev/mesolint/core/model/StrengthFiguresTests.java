package dev.mesolint.core.model;

import static dev.mesolint.core.testing.SetBuilder.reps;
import static dev.mesolint.core.testing.TestProgrammes.exercise;
import static dev.mesolint.core.testing.TestProgrammes.programme;
import static dev.mesolint.core.testing.TestProgrammes.session;
import static dev.mesolint.core.testing.TestProgrammes.week;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.testing.SetBuilder;
import dev.mesolint.core.testing.TestExercises;
import dev.mesolint.core.testing.TestProgrammes;
import dev.mesolint.core.value.LoadUnit;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Per-lift strength figures: top set, mean intensity, volume load, heavy reps and intensity zones, worked by hand. */
class StrengthFiguresTests {
    private static final String SQUAT = "barbell-back-squat";
    private static final Athlete SQUAT_150 = TestProgrammes.athleteWithOneRepMax(SQUAT, 150, LoadUnit.KG);

    /** Sets written one group after another, numbered 1, 2, ... as a programme would number them. */
    private static List<SetPrescription> sets(Object... countsAndBuilders) {
        List<SetPrescription> sets = new ArrayList<>();
        for (int i = 0; i < countsAndBuilders.length; i += 2) {
            int count = (Integer) countsAndBuilders[i];
            SetBuilder builder = (SetBuilder) countsAndBuilders[i + 1];
            for (int k = 0; k < count; k++) {
                sets.add(builder.build(sets.size() + 1));
            }
        }
        return sets;
    }

    private static ProgrammeMetrics metrics(Athlete athlete, ModelParameters params, Week... weeks) {
        Programme p = programme(athlete, LoadUnit.KG, weeks);
        return ProgrammeMetrics.compute(p, TestExercises.CATALOGUE, params);
    }

    /** A heavy single, three working triples and two back-off sets of eight. */
    private static Week squatWeek(int number) {
        return week(number, session(1, "Lower", exercise(SQUAT, sets(
                1, reps("1").rpe("8").load("90%"),
                3, reps("3").rir("2").load("80%"),
                2, reps("8").rir("3").load("65%")))));
    }

    @Test
    void aWeeksTopSetMeanIntensityVolumeLoadAndHeavyRepsAreWorkedOutPerLift() {
        LiftWeek lift = metrics(SQUAT_150, ModelParameters.defaults(), squatWeek(1)).weeks().get(0)
                .lift(SQUAT).orElseThrow();
        assertEquals(6, lift.sets());
        assertEquals(1 + 9 + 16, lift.reps(), 1e-9);
        assertEquals(0.90, lift.topSetFraction().getAsDouble(), 1e-9);
        assertEquals(135, lift.topSetLoad().getAsDouble(), 1e-9);
        // Mean intensity weighted by reps: (1 x 0.90 + 9 x 0.80 + 16 x 0.65) / 26 = 18.5 / 26.
        assertEquals(18.5 / 26, lift.meanIntensity().getAsDouble(), 1e-9);
        // Volume load = reps x weight, summed over sets (NSCA, Haff & Triplett 2016, ch. 17; common practice):
        // 1 x 135 + 9 x 120 + 16 x 97.5 = 135 + 1080 + 1560 = 2775 kg.
        assertEquals(2775, lift.volumeLoad().getAsDouble(), 1e-9);
        // Reps at or above 80% of 1RM: the single and the three triples.
        assertEquals(10, lift.heavyReps(), 1e-9);
        assertEquals(0, lift.unknownIntensitySets());
    }

    @Test
    void eachSessionCountsALiftsRepsPerIntensityZone() {
        LiftSession lift = metrics(SQUAT_150, ModelParameters.defaults(), squatWeek(1)).weeks().get(0).sessions()
                .get(0).lift(SQUAT).orElseThrow();
        // Zones after Prilepin's table as usually reproduced, 55-65 / 70-80 / 80-90 / 90+ % of 1RM (from memory),
        // made contiguous: under 55, 55-70, 70-80, 80-90, 90 and over.
        assertEquals(List.of(0.0, 16.0, 0.0, 9.0, 1.0), lift.zones().stream().map(IntensityZone::reps).toList());
        assertEquals(List.of(0, 2, 0, 3, 1), lift.zones().stream().map(IntensityZone::sets).toList());
        assertEquals(0.80, lift.zones().get(3).from(), 1e-9);
        assertEquals(0.90, lift.zones().get(3).below().getAsDouble(), 1e-9);
        assertTrue(lift.zones().get(4).below().isEmpty(), "the top zone is open");
    }

    @Test
    void aPrilepinStyleSessionOfDoublesLandsInItsZone() {
        // Prilepin's table, 80-90% row: 2-4 reps a set, 10-20 reps in all, about 15 best (from memory).
        // Five doubles at 85% are ten reps, the low end of that row.
        Week w = week(1, session(1, "Heavy", exercise(SQUAT, reps("2").rpe("8").load("85%").times(5))));
        LiftSession lift = metrics(SQUAT_150, ModelParameters.defaults(), w).weeks().get(0).sessions().get(0)
                .lift(SQUAT).orElseThrow();
        assertEquals(10, lift.reps(3), 1e-9);
        assertEquals(5, lift.zones().get(3).sets());
    }

    @Test
    void theZoneBoundsAreParameters() {
        ModelParameters bounds = ModelParameters.defaults().toBuilder().intensityZone3From(0.85).build();
        LiftSession lift = metrics(SQUAT_150, bounds, squatWeek(1)).weeks().get(0).sessions().get(0)
                .lift(SQUAT).orElseThrow();
        // With the third zone starting at 85%, the triples at 80% fall in the second zone.
        assertEquals(9, lift.reps(2), 1e-9);
        assertEquals(0, lift.reps(3), 1e-9);
        assertThrows(IllegalArgumentException.class,
                () -> ModelParameters.defaults().toBuilder().intensityZone2From(0.95).build());
    }

    @Test
    void aWeightOverAOneRepMaxInAnotherUnitGivesItsShare() {
        // 1 lb = 0.45359237 kg (international yard and pound agreement, 1959): 110.23 kg of a 330.69 lb 1RM is a third.
        Athlete pounds = TestProgrammes.athleteWithOneRepMax(SQUAT, 150 / 0.45359237, LoadUnit.LB);
        Week w = week(1, session(1, "Lower", exercise(SQUAT, reps("5").rir("2").load("120kg").times(3))));
        LiftWeek lift = metrics(pounds, ModelParameters.defaults(), w).weeks().get(0).lift(SQUAT).orElseThrow();
        assertEquals(0.80, lift.topSetFraction().getAsDouble(), 1e-9);
        assertEquals(15, lift.heavyReps(), 1e-9);
        assertEquals(1800, lift.volumeLoad().getAsDouble(), 1e-9);
    }

    @Test
    void aWeightWithoutAOneRepMaxHasALoadButNoIntensity() {
        Week w = week(1, session(1, "Lower", exercise(SQUAT, reps("5").rir("2").load("100kg").times(3))));
        LiftWeek lift = metrics(Athlete.NONE, ModelParameters.defaults(), w).weeks().get(0).lift(SQUAT).orElseThrow();
        assertTrue(lift.topSetFraction().isEmpty());
        assertTrue(lift.meanIntensity().isEmpty());
        assertEquals(100, lift.topSetLoad().getAsDouble(), 1e-9);
        assertEquals(1500, lift.volumeLoad().getAsDouble(), 1e-9);
        assertEquals(3, lift.unknownIntensitySets());
        LiftSession zones = metrics(Athlete.NONE, ModelParameters.defaults(), w).weeks().get(0).sessions().get(0)
                .lift(SQUAT).orElseThrow();
        assertEquals(15, zones.unknownIntensityReps(), 1e-9);
        assertEquals(0, zones.zones().stream().mapToDouble(IntensityZone::reps).sum(), 1e-9);
    }

    @Test
    void aLiftCanBeFollowedAcrossWeeks() {
        ProgrammeMetrics m = metrics(SQUAT_150, ModelParameters.defaults(), squatWeek(1), week(2, session(1, "Lower",
                exercise(SQUAT, reps("2").rpe("8").load("87.5%").times(3)))));
        List<LiftWeek> squat = m.liftWeeks(SQUAT);
        assertEquals(List.of(1, 2), squat.stream().map(LiftWeek::week).toList());
        assertEquals(0.875, squat.get(1).topSetFraction().getAsDouble(), 1e-9);
        assertTrue(m.liftWeeks("dumbbell-curl").isEmpty());
    }

    @Test
    void eachWeeksIntensityReadsTheOneRepMaxInForceThatWeek() throws Exception {
        // The 1RM restated from week 3 (docs/format.md, a rising 1RM): the same 100 kg is 80% of 125 kg, then 62.5% of
        // 160 kg. Volume load does not change with the 1RM (reps x weight).
        String yaml = dev.mesolint.core.testing.Programmes.HEADER + """
                athlete:
                  one-rep-max:
                    barbell-back-squat:
                      - {from-week: 1, load: 125kg}
                      - {from-week: 3, load: 160kg}
                weeks:
                  - week: 1
                    sessions:
                      - day: 1
                        work:
                          - {exercise: barbell-back-squat, sets: 3, reps: 5, load: 100kg, rest: 3min}
                  - {week: 2, repeat: 1}
                  - {week: 3, repeat: 1}
                  - {week: 4, repeat: 1}
                """;
        dev.mesolint.core.format.ProgrammeBinder.Result bound = new dev.mesolint.core.format.ProgrammeBinder()
                .bind(new dev.mesolint.core.yaml.LocatedYamlReader(dev.mesolint.core.yaml.YamlLimits.DEFAULTS)
                        .read(yaml));
        assertEquals(List.of(), bound.violations());
        List<LiftWeek> squat = ProgrammeMetrics.compute(bound.programme().orElseThrow(), TestExercises.CATALOGUE)
                .liftWeeks(SQUAT);
        assertEquals(List.of(0.8, 0.8, 0.625, 0.625),
                squat.stream().map(l -> Math.round(l.topSetFraction().getAsDouble() * 1000) / 1000.0).toList());
        assertEquals(List.of(15.0, 15.0, 0.0, 0.0), squat.stream().map(LiftWeek::heavyReps).toList());
        squat.forEach(l -> assertEquals(1500, l.volumeLoad().getAsDouble(), 1e-9));
    }
}
