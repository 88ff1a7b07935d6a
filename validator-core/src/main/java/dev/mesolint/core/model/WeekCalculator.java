package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.value.LoadUnit;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Adds a week's sessions up per muscle; trend figures across weeks come later from {@link TrendCalculator}. */
final class WeekCalculator {
    private static final double HOURS_PER_DAY = 24;

    private final ModelParameters params;
    private final SessionCalculator sessions;
    private final StrengthFigures strength;
    private final DoseResponse dose;

    WeekCalculator(ModelParameters params) {
        this.params = params;
        this.sessions = new SessionCalculator(params);
        this.strength = new StrengthFigures(params);
        this.dose = new DoseResponse(params);
    }

    WeekMetrics compute(Week week, ExerciseTable catalogue, Athlete athlete, LoadUnit units) {
        List<Session> inOrder = new ArrayList<>(week.sessions());
        inOrder.sort(Comparator.comparingInt(Session::day));
        List<SessionMetrics> computed = new ArrayList<>(inOrder.size());
        for (Session s : inOrder) {
            // each session sees the 1RMs in force for it (stated per week, or unknown after a test)
            computed.add(sessions.compute(s, catalogue, athlete.atSession(week.number(), s.day()), units));
        }
        Set<Muscle> trained = EnumSet.noneOf(Muscle.class);
        computed.forEach(s -> trained.addAll(s.muscles().keySet()));
        Map<Muscle, MuscleWeek> muscles = new EnumMap<>(Muscle.class);
        for (Muscle muscle : trained) {
            muscles.put(muscle, muscleWeek(muscle, computed));
        }
        double volumeLoad = computed.stream().mapToDouble(SessionMetrics::volumeLoad).sum();
        List<SessionMetrics> done = List.copyOf(computed);
        return new WeekMetrics(week.number(), week.deload(), week.location(), muscles, done, volumeLoad, Map.of(),
                Map.of(), new WorkedOutList<>(() -> strength.perWeek(week.number(), done)));
    }

    private MuscleWeek muscleWeek(Muscle muscle, List<SessionMetrics> computed) {
        double hardSets = 0;
        double stimulatingReps = 0;
        double effectiveSets = 0;
        double unknown = 0;
        List<Integer> hardDays = new ArrayList<>();
        for (SessionMetrics session : computed) {
            MuscleSession m = session.muscles().get(muscle);
            if (m == null) {
                continue;
            }
            hardSets += m.hardSets();
            stimulatingReps += m.stimulatingReps();
            effectiveSets += m.stimulus();
            unknown += m.unknownEffortSets();
            if (m.hardSets() >= params.hardSessionMinSets()) {
                hardDays.add(session.day());
            }
        }
        List<Double> gaps = new ArrayList<>();
        for (int i = 1; i < hardDays.size(); i++) {
            gaps.add((hardDays.get(i) - hardDays.get(i - 1)) * HOURS_PER_DAY);
        }
        return new MuscleWeek(hardSets, stimulatingReps, dose.weeklyStimulus(effectiveSets), hardDays.size(), gaps,
                unknown);
    }
}
