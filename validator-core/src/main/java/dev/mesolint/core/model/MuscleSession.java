package dev.mesolint.core.model;

/**
 * One muscle's figures for one session, each set credited 1 (prime mover) or 0.5 (synergist).
 *
 * @param hardSets          credited hard sets
 * @param stimulatingReps   credited stimulating reps of all working sets
 * @param rawStimulus       credited, fatigue-adjusted stimulus summed over the sets, before diminishing returns
 * @param stimulus          the session's effective sets: {@code rawStimulus} levelled off towards the per-session
 *                          plateau (about {@code rawStimulus} up to some eight sets); the week adds these up
 * @param unknownEffortSets credited sets whose effort nothing states
 */
public record MuscleSession(double hardSets, double stimulatingReps, double rawStimulus, double stimulus,
        double unknownEffortSets) {
}
