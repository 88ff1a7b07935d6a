package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Muscle;
import java.util.Comparator;
import java.util.Map;
import java.util.Optional;

/**
 * What the model reads of a catalogue entry on every set, worked out once per exercise: its credited muscles as
 * parallel arrays (in the entry's order), the share of a prime mover's fatigue each one takes, and the muscle a set's
 * recruitment and stimulus refer to.
 */
final class ExerciseFigures {
    final Exercise exercise;
    final int[] ordinals;
    final double[] credits;
    /** min(1, credit): the share of the prime mover's fatigue a bout leaves in each muscle. */
    final double[] fatigueShares;
    /** The muscles with prime-mover credit, in the entry's order. */
    final Muscle[] primeMovers;
    final Optional<Muscle> reference;
    /** The reference muscle's ordinal and credit; -1 and 0 when the entry credits no muscle. */
    final int referenceOrdinal;
    final double referenceCredit;

    ExerciseFigures(Exercise exercise) {
        this.exercise = exercise;
        int n = exercise.muscles().size();
        ordinals = new int[n];
        credits = new double[n];
        fatigueShares = new double[n];
        int primes = 0;
        int k = 0;
        for (Map.Entry<Muscle, Double> credit : exercise.muscles().entrySet()) {
            ordinals[k] = credit.getKey().ordinal();
            credits[k] = credit.getValue();
            fatigueShares[k] = Math.min(1, credit.getValue());
            primes += credit.getValue() >= Exercise.PRIME_MOVER ? 1 : 0;
            k++;
        }
        primeMovers = new Muscle[primes];
        int p = 0;
        for (Map.Entry<Muscle, Double> credit : exercise.muscles().entrySet()) {
            if (credit.getValue() >= Exercise.PRIME_MOVER) {
                primeMovers[p++] = credit.getKey();
            }
        }
        reference = referenceMuscle(exercise);
        referenceOrdinal = reference.map(Muscle::ordinal).orElse(-1);
        referenceCredit = reference.map(exercise::credit).orElse(0.0);
    }

    /** The prime mover, else the most-credited muscle (first in muscle order on ties). */
    private static Optional<Muscle> referenceMuscle(Exercise exercise) {
        return exercise.primeMover().or(() -> exercise.muscles().entrySet().stream()
                .filter(e -> e.getValue() > 0)
                .max(Comparator.<Map.Entry<Muscle, Double>>comparingDouble(Map.Entry::getValue)
                        .thenComparing(Map.Entry::getKey, Comparator.reverseOrder()))
                .map(Map.Entry::getKey));
    }
}
