package dev.mesolint.core.testing;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.ExerciseKind;
import dev.mesolint.core.catalogue.MovementPattern;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.catalogue.Skill;
import dev.mesolint.core.catalogue.Stability;
import dev.mesolint.core.source.Location;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** A small hand-built catalogue for tests: credits 1 for prime movers, 0.5 for synergists. */
public final class TestExercises {
    public static final Exercise BENCH_PRESS = compound("barbell-bench-press", MovementPattern.HORIZONTAL_PUSH,
            Map.of(Muscle.CHEST, 1.0, Muscle.TRICEPS, 0.5, Muscle.FRONT_DELTS, 0.5));
    public static final Exercise ROW = compound("barbell-row", MovementPattern.HORIZONTAL_PULL,
            Map.of(Muscle.UPPER_BACK, 1.0, Muscle.LATS, 0.5, Muscle.BICEPS, 0.5, Muscle.REAR_DELTS, 0.5));
    public static final Exercise CURL = isolation("dumbbell-curl", MovementPattern.ELBOW_FLEXION,
            Map.of(Muscle.BICEPS, 1.0));
    public static final Exercise SQUAT = compound("barbell-back-squat", MovementPattern.SQUAT,
            Map.of(Muscle.QUADRICEPS, 1.0, Muscle.GLUTES, 0.5, Muscle.ADDUCTORS, 0.5));
    public static final Exercise LEG_EXTENSION = isolation("leg-extension", MovementPattern.KNEE_EXTENSION,
            Map.of(Muscle.QUADRICEPS, 1.0));
    public static final Exercise ROMANIAN_DEADLIFT = compound("romanian-deadlift", MovementPattern.HINGE,
            ordered(Muscle.HAMSTRINGS, 1.0, Muscle.GLUTES, 1.0, Muscle.LOWER_BACK, 0.5));
    public static final Exercise PULLDOWN = compound("lat-pulldown", MovementPattern.VERTICAL_PULL,
            Map.of(Muscle.LATS, 1.0, Muscle.BICEPS, 0.5));
    public static final Exercise PUSHDOWN = isolation("triceps-pushdown", MovementPattern.ELBOW_EXTENSION,
            Map.of(Muscle.TRICEPS, 1.0));
    public static final Exercise FLY = isolation("cable-fly", MovementPattern.HORIZONTAL_PUSH,
            Map.of(Muscle.CHEST, 1.0, Muscle.FRONT_DELTS, 0.5));

    public static final Catalogue CATALOGUE = Catalogue.of(List.of(BENCH_PRESS, ROW, CURL, SQUAT, LEG_EXTENSION,
            ROMANIAN_DEADLIFT, PULLDOWN, PUSHDOWN, FLY));

    private TestExercises() {
    }

    public static Exercise compound(String id, MovementPattern pattern, Map<Muscle, Double> muscles) {
        return exercise(id, ExerciseKind.COMPOUND, pattern, muscles);
    }

    public static Exercise isolation(String id, MovementPattern pattern, Map<Muscle, Double> muscles) {
        return exercise(id, ExerciseKind.ISOLATION, pattern, muscles);
    }

    /** Credits in the order written: the first muscle with credit 1 is the prime mover. */
    static Map<Muscle, Double> ordered(Muscle m1, double c1, Muscle m2, double c2, Muscle m3, double c3) {
        Map<Muscle, Double> map = new java.util.LinkedHashMap<>();
        map.put(m1, c1);
        map.put(m2, c2);
        map.put(m3, c3);
        return map;
    }

    private static Exercise exercise(String id, ExerciseKind kind, MovementPattern pattern,
            Map<Muscle, Double> muscles) {
        return new Exercise(id, id.replace('-', ' '), kind, pattern, Stability.STABLE, Skill.MODERATE, muscles,
                Set.of(), "test", new Location(1, 1, "/exercises/" + id));
    }
}
