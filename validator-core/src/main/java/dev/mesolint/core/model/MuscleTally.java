package dev.mesolint.core.model;

/** Running credited totals for one muscle while a session is computed; confined to that computation. */
final class MuscleTally {
    double hardSets;
    double stimulatingReps;
    double rawStimulus;
    double unknownEffortSets;

    MuscleSession toSession(DoseResponse dose) {
        return new MuscleSession(hardSets, stimulatingReps, rawStimulus, dose.sessionEffective(rawStimulus),
                unknownEffortSets);
    }
}
