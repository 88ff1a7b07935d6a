package dev.mesolint.core.model;

import java.util.List;

/**
 * One muscle's figures for one week.
 *
 * @param hardSets          credited hard sets (1 per prime-mover set, 0.5 per synergist set)
 * @param stimulatingReps   credited stimulating reps of all working sets
 * @param stimulus          the weekly dose-response of the sessions' effective sets, (sum)^p, in units of one
 *                          fresh hard set a week
 * @param hardSessions      sessions with at least {@code hardSessionMinSets} credited hard sets for the muscle
 * @param gapsHours         hours between consecutive hard sessions within the week (24 per day; the wrap to the
 *                          next week is not counted)
 * @param unknownEffortSets credited sets whose effort nothing states
 */
public record MuscleWeek(double hardSets, double stimulatingReps, double stimulus, int hardSessions,
        List<Double> gapsHours, double unknownEffortSets) {

    public MuscleWeek {
        gapsHours = List.copyOf(gapsHours);
    }
}
