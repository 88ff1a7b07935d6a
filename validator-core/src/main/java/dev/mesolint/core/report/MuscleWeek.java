package dev.mesolint.core.report;

/**
 * What one muscle received in one week.
 *
 * @param hardSets        credited hard sets (fractional when an exercise credits a muscle partly)
 * @param stimulatingReps the reps close enough to failure to count
 * @param stimulus        the model's stimulus figure for the week
 */
public record MuscleWeek(double hardSets, double stimulatingReps, double stimulus) {
}
