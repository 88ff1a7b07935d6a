package dev.mesolint.core.testing;

import static dev.mesolint.core.testing.SetBuilder.reps;
import static dev.mesolint.core.testing.TestProgrammes.exercise;
import static dev.mesolint.core.testing.TestProgrammes.session;
import static dev.mesolint.core.testing.TestProgrammes.superset;
import static dev.mesolint.core.testing.TestProgrammes.week;

import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.Technique;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import java.util.List;
import java.util.Map;

/**
 * Invented demo data: a two-week upper/lower block of the fictional Harbourside Strength Club, using every kind of
 * set the model reads (RIR, RPE, %1RM, weights, AMRAP, unknown effort, supersets, drop sets, rest-pause).
 */
public final class HarbourDemo {
    private HarbourDemo() {
    }

    public static Programme programme() {
        Athlete athlete = new Athlete(Map.of(
                "barbell-bench-press", new Load.Absolute(100, LoadUnit.KG),
                "barbell-back-squat", new Load.Absolute(140, LoadUnit.KG)), List.of());
        return TestProgrammes.programme(athlete, LoadUnit.KG, block(1, false), block(2, true));
    }

    public static ProgrammeMetrics metrics() {
        return ProgrammeMetrics.compute(programme(), TestExercises.CATALOGUE, ModelParameters.defaults());
    }

    private static Week block(int number, boolean deload) {
        String benchLoad = deload ? "65%" : "75%";
        return week(number, deload,
                session(1, "Upper A",
                        exercise("barbell-bench-press", 2, reps("8").rir("2").load(benchLoad).rest("3min").line(31)
                                .times(3)),
                        superset("90s",
                                exercise("barbell-row", reps("10").rpe("8").load("60kg").line(40).times(3)),
                                exercise("dumbbell-curl", reps("12").rir("1-2").line(44).times(3))),
                        exercise("triceps-pushdown", List.of(
                                reps("12").rir("1").rest("60s").line(50).build(1),
                                reps("12").rir("0").technique(Technique.DROP_SET).line(51).build(2)))),
                session(4, "Lower A",
                        exercise("barbell-back-squat", 3, reps("5").load("100kg").rest("3min").line(60).times(3)),
                        exercise("romanian-deadlift", 1, reps("8-10").rir("2").tempo("3-0-1-0").line(66).times(3)),
                        exercise("leg-extension", List.of(
                                reps("15").line(70).build(1),
                                reps("amrap").technique(Technique.REST_PAUSE).line(71).build(2)))),
                session(6, null,
                        exercise("cable-fly", reps("15").rir("1").rest("45s").line(80).times(2)),
                        exercise("harbourside-unlisted-press", reps("10").rir("2").line(85).times(2))));
    }
}
