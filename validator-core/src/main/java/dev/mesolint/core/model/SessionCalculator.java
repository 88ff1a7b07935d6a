package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.value.LoadUnit;
import dev.mesolint.core.value.Tempo;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Runs one session set by set on a single clock: residual fatigue recovers during rests, set-ups and the other
 * exercises' sets, and each set's stimulus is read from the fatigue its muscles carry when it starts.
 */
final class SessionCalculator {
    private final ModelParameters params;
    private final SessionPlanner planner;
    private final EffortResolver resolver;
    private final TechniqueBouts techniques;
    private final StimulusModel stimulusModel;
    private final FatigueModel fatigueModel;
    private final DoseResponse dose;
    private final StrengthFigures strength;

    SessionCalculator(ModelParameters params) {
        this.params = params;
        this.planner = new SessionPlanner(params);
        this.resolver = new EffortResolver(params);
        this.techniques = new TechniqueBouts(params);
        this.stimulusModel = new StimulusModel(params);
        this.fatigueModel = new FatigueModel(params);
        this.dose = new DoseResponse(params);
        this.strength = new StrengthFigures(params);
    }

    SessionMetrics compute(Session session, Catalogue catalogue, Athlete athlete, LoadUnit units) {
        FatigueState state = FatigueState.FRESH;
        Map<Muscle, MuscleTally> tallies = new EnumMap<>(Muscle.class);
        List<SetMetrics> sets = new ArrayList<>();
        double seconds = 0;
        double recoveryBefore = 0;
        double volumeLoad = 0;

        for (PlannedSet planned : planner.plan(session)) {
            String id = planned.work().exerciseId();
            Optional<Exercise> exercise = catalogue.find(id);
            Effort effort = resolver.resolve(planned.set(), id, exercise.map(Exercise::ballistic).orElse(false),
                    athlete, units);
            // A hold or a carry counts as time only (docs/model.md): no stimulating reps, not a hard set.
            boolean holdOrCarry = planned.set().holdOrCarry();
            // The effort is unknown or the exercise is: the set takes time but adds no stimulus or fatigue.
            boolean modelled = effort.known() && exercise.isPresent() && !holdOrCarry;
            List<Bout> bouts = techniques.expand(effort.reps(), effort.rir().orElse(0), planned.set().technique());
            double repSeconds = holdOrCarry ? holdOrCarrySeconds(planned.set())
                    : planned.set().tempo().map(Tempo::secondsPerRep).orElse(params.defaultRepSeconds());

            state = state.recover(recoveryBefore + planned.setupSecondsBefore(), fatigueModel);
            seconds += planned.setupSecondsBefore();
            FatigueState atStart = state;
            Map<Muscle, Double> muscleStimulus = new EnumMap<>(Muscle.class);
            double stimulatingReps = 0;
            for (Bout bout : bouts) {
                state = state.recover(bout.pauseBeforeSeconds(), fatigueModel);
                double duration = bout.reps() * repSeconds;
                if (modelled) {
                    double sr = stimulusModel.stimulatingReps(bout.reps(), bout.rir());
                    stimulatingReps += sr;
                    for (Map.Entry<Muscle, Double> credit : exercise.get().muscles().entrySet()) {
                        // A mini-set goes on with the units the set has already recruited: its fatigue shortens
                        // it (fewer reps), it does not lower the recruitment its reps reach (docs/model.md).
                        double recruitment = 1 - atStart.of(credit.getKey());
                        muscleStimulus.merge(credit.getKey(),
                                credit.getValue() * stimulusModel.stimulus(sr, recruitment), Double::sum);
                    }
                    state = state.recover(duration, fatigueModel)
                            .after(exercise.get(), fatigueModel.fatigueOf(bout, exercise.get().isCompound()));
                } else {
                    state = state.recover(duration, fatigueModel);
                }
                seconds += bout.pauseBeforeSeconds() + duration;
            }
            seconds += planned.restAfterSeconds();
            recoveryBefore = planned.restAfterSeconds();

            if (exercise.isEmpty() || holdOrCarry) {
                continue;
            }
            OptionalDouble setVolume = volumeLoad(effort, bouts);
            volumeLoad += setVolume.orElse(0);
            boolean hard = effort.known() && effort.rir().getAsDouble() <= params.hardSetMaxRir();
            tally(tallies, exercise.get(), effort, hard, stimulatingReps, muscleStimulus);
            sets.add(metrics(planned, exercise.get(), effort, hard, stimulatingReps, bouts, atStart, muscleStimulus,
                    setVolume));
        }
        Map<Muscle, MuscleSession> muscles = new EnumMap<>(Muscle.class);
        tallies.forEach((muscle, tally) -> muscles.put(muscle, tally.toSession(dose)));
        return new SessionMetrics(session.day(), session.name(), session.location(), seconds / 60, muscles, sets,
                volumeLoad, strength.perSession(sets));
    }

    /** A loaded carry is walked at about 1 m/s (from memory; a brisk walk under load). */
    private static final double CARRY_METRES_PER_SECOND = 1.0;

    /** The duration of a hold, or a carry's distance at walking pace: the set is one effort of this length. */
    private static double holdOrCarrySeconds(dev.mesolint.core.programme.SetPrescription set) {
        return set.hold().map(dev.mesolint.core.value.Durations::seconds)
                .orElseGet(() -> set.distance().orElseThrow().metres() / CARRY_METRES_PER_SECOND);
    }

    private static void tally(Map<Muscle, MuscleTally> tallies, Exercise exercise, Effort effort, boolean hard,
            double stimulatingReps, Map<Muscle, Double> muscleStimulus) {
        exercise.muscles().forEach((muscle, credit) -> {
            MuscleTally t = tallies.computeIfAbsent(muscle, m -> new MuscleTally());
            t.hardSets += hard ? credit : 0;
            t.stimulatingReps += credit * stimulatingReps;
            t.rawStimulus += muscleStimulus.getOrDefault(muscle, 0.0);
            t.unknownEffortSets += effort.known() ? 0 : credit;
        });
    }

    private SetMetrics metrics(PlannedSet planned, Exercise exercise, Effort effort, boolean hard,
            double stimulatingReps, List<Bout> bouts, FatigueState atStart, Map<Muscle, Double> muscleStimulus,
            OptionalDouble volumeLoad) {
        Optional<Muscle> reference = referenceMuscle(exercise);
        double recruitment = reference.map(m -> 1 - atStart.of(m)).orElse(1.0);
        double stimulus = reference
                .map(m -> muscleStimulus.getOrDefault(m, 0.0) / exercise.credit(m))
                .orElse(0.0);
        double extraReps = bouts.stream().skip(1).mapToDouble(Bout::reps).sum();
        return new SetMetrics(exercise.id(), planned.set().number(), planned.round(), planned.set().location(),
                planned.set(), planned.work(), reference, effort, hard, stimulatingReps, extraReps, recruitment,
                stimulus, muscleStimulus, atStart.levels(), planned.restAfterSeconds(), volumeLoad);
    }

    /** The prime mover, else the most-credited muscle (first in muscle order on ties). */
    private static Optional<Muscle> referenceMuscle(Exercise exercise) {
        return exercise.primeMover().or(() -> exercise.muscles().entrySet().stream()
                .filter(e -> e.getValue() > 0)
                .max(Comparator.<Map.Entry<Muscle, Double>>comparingDouble(Map.Entry::getValue)
                        .thenComparing(Map.Entry::getKey, Comparator.reverseOrder()))
                .map(Map.Entry::getKey));
    }

    private static OptionalDouble volumeLoad(Effort effort, List<Bout> bouts) {
        if (effort.absoluteLoad().isEmpty()) {
            return OptionalDouble.empty();
        }
        double weight = effort.absoluteLoad().getAsDouble();
        return OptionalDouble.of(bouts.stream().mapToDouble(b -> b.reps() * b.loadFactor() * weight).sum());
    }
}
