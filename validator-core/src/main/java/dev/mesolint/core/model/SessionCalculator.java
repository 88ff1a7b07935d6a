package dev.mesolint.core.model;

import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.value.Durations;
import dev.mesolint.core.value.LoadUnit;
import java.util.ArrayList;
import java.util.List;
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
    private final double[] recoveryTimeConstants;

    SessionCalculator(ModelParameters params) {
        this.params = params;
        this.planner = new SessionPlanner(params);
        this.resolver = new EffortResolver(params);
        this.techniques = new TechniqueBouts(params);
        this.stimulusModel = new StimulusModel(params);
        this.fatigueModel = new FatigueModel(params);
        this.dose = new DoseResponse(params);
        this.strength = new StrengthFigures(params);
        this.recoveryTimeConstants = FatigueState.timeConstants(fatigueModel);
    }

    SessionMetrics compute(Session session, ExerciseTable catalogue, Athlete athlete, LoadUnit units) {
        FatigueState state = new FatigueState(recoveryTimeConstants);
        MuscleTallies tallies = new MuscleTallies();
        List<PlannedSet> plan = planner.plan(session);
        List<SetMetrics> sets = new ArrayList<>(plan.size());
        double seconds = 0;
        double recoveryBefore = 0;
        double volumeLoad = 0;

        ExerciseWork work = null;
        ExerciseFigures exercise = null;
        SetPrescription previous = null;
        SetWork setWork = null;
        for (PlannedSet planned : plan) {
            SetPrescription set = planned.set();
            if (planned.work() != work) { // an entry's sets follow each other: look its exercise up once
                work = planned.work();
                exercise = catalogue.find(work.exerciseId());
                previous = null;
            }
            if (previous == null || !SamePrescription.effortAndTechnique(previous, set)) {
                setWork = resolve(set, work.exerciseId(), exercise, athlete, units);
            }
            previous = set;
            Effort effort = setWork.effort;
            // A hold or a carry counts as time only (docs/model.md): no stimulating reps, not a hard set.
            boolean holdOrCarry = set.holdOrCarry();
            // The effort is unknown or the exercise is: the set takes time but adds no stimulus or fatigue.
            boolean modelled = effort.known() && exercise != null && !holdOrCarry;
            boolean counted = exercise != null && !holdOrCarry;
            double repSeconds = holdOrCarry ? holdOrCarrySeconds(set)
                    : set.tempo().isPresent() ? set.tempo().get().secondsPerRep() : params.defaultRepSeconds();

            state.recover(recoveryBefore + planned.setupSecondsBefore());
            seconds += planned.setupSecondsBefore();
            MuscleValues atStart = counted ? state.snapshot() : null;
            double[] stimulusByOrdinal = modelled ? new double[MuscleValues.muscleCount()] : null;
            long stimulated = 0;
            List<Bout> bouts = setWork.bouts;
            for (int b = 0; b < bouts.size(); b++) {
                Bout bout = bouts.get(b);
                state.recover(bout.pauseBeforeSeconds());
                double duration = bout.reps() * repSeconds;
                if (modelled) {
                    double sr = setWork.stimulatingReps[b];
                    for (int k = 0; k < exercise.ordinals.length; k++) {
                        int i = exercise.ordinals[k];
                        // A mini-set goes on with the units the set has already recruited: its fatigue shortens
                        // it (fewer reps), it does not lower the recruitment its reps reach (docs/model.md).
                        double recruitment = 1 - atStart.at(i);
                        double added = exercise.credits[k] * stimulusModel.stimulus(sr, recruitment);
                        long bit = MuscleValues.bit(i);
                        stimulusByOrdinal[i] = (stimulated & bit) != 0 ? stimulusByOrdinal[i] + added : added;
                        stimulated |= bit;
                    }
                    state.recover(duration);
                    state.add(exercise, setWork.fatigue[b]);
                } else {
                    state.recover(duration);
                }
                seconds += bout.pauseBeforeSeconds() + duration;
            }
            seconds += planned.restAfterSeconds();
            recoveryBefore = planned.restAfterSeconds();

            if (!counted) {
                continue;
            }
            MuscleValues muscleStimulus = new MuscleValues(stimulusByOrdinal, stimulated);
            double stimulatingReps = modelled ? setWork.totalStimulatingReps : 0;
            volumeLoad += setWork.volumeLoad.orElse(0);
            tallies.add(exercise, effort.known(), setWork.hard, stimulatingReps, muscleStimulus);
            sets.add(metrics(planned, exercise, setWork, stimulatingReps, atStart, muscleStimulus));
        }
        List<SetMetrics> done = List.copyOf(sets);
        // Only the strength profile's rule and the reports read the per-lift figures: worked out when first read.
        return new SessionMetrics(session.day(), session.name(), session.location(), seconds / 60,
                tallies.toSessions(dose), done, volumeLoad, new WorkedOutList<>(() -> strength.perSession(done)));
    }

    /** A loaded carry is walked at about 1 m/s (from memory; a brisk walk under load). */
    private static final double CARRY_METRES_PER_SECOND = 1.0;

    /** The duration of a hold, or a carry's distance at walking pace: the set is one effort of this length. */
    private static double holdOrCarrySeconds(SetPrescription set) {
        return set.hold().isPresent() ? Durations.seconds(set.hold().get())
                : set.distance().orElseThrow().metres() / CARRY_METRES_PER_SECOND;
    }

    /** The set's effort, resolved from what it states, and what that alone decides. */
    private SetWork resolve(SetPrescription set, String exerciseId, ExerciseFigures exercise, Athlete athlete,
            LoadUnit units) {
        Effort effort = resolver.resolve(set, exerciseId, exercise != null && exercise.exercise.ballistic(), athlete,
                units);
        List<Bout> bouts = techniques.expand(effort.reps(), effort.known() ? effort.rir().getAsDouble() : 0,
                set.technique());
        return new SetWork(effort, bouts, exercise != null && exercise.exercise.isCompound(), params, stimulusModel,
                fatigueModel);
    }

    private SetMetrics metrics(PlannedSet planned, ExerciseFigures exercise, SetWork setWork, double stimulatingReps,
            MuscleValues atStart, MuscleValues muscleStimulus) {
        boolean referenced = exercise.reference.isPresent();
        double recruitment = referenced ? 1 - atStart.at(exercise.referenceOrdinal) : 1.0;
        double stimulus = referenced ? muscleStimulus.at(exercise.referenceOrdinal) / exercise.referenceCredit : 0.0;
        return new SetMetrics(exercise.exercise.id(), planned.set().number(), planned.round(), planned.set().location(),
                planned.set(), planned.work(), exercise.reference, setWork.effort, setWork.hard, stimulatingReps,
                setWork.extraReps, recruitment, stimulus, muscleStimulus, atStart, planned.restAfterSeconds(),
                setWork.volumeLoad);
    }
}
