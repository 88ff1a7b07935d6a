package dev.mesolint.core.rule;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Muscle;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * A catalogue entry's credited muscles as arrays by muscle ordinal, in the order the entry writes them, for the rules
 * that add credits up set by set (weekly sets per muscle): made once per catalogue entry for the run
 * ({@link FileIndex}), so that a rule's walk over thousands of sets reads arrays instead of the entry's map.
 */
public final class ExerciseCredits {
    private final Exercise exercise;
    private final int[] ordinals;
    private final double[] credits;
    private final int[] primeMoverOrdinals;
    private final List<Muscle> primeMovers;

    ExerciseCredits(Exercise exercise) {
        this.exercise = exercise;
        Map<Muscle, Double> muscles = exercise.muscles();
        ordinals = new int[muscles.size()];
        credits = new double[muscles.size()];
        List<Muscle> movers = new ArrayList<>();
        int k = 0;
        for (Map.Entry<Muscle, Double> credit : muscles.entrySet()) {
            ordinals[k] = credit.getKey().ordinal();
            credits[k] = credit.getValue();
            if (credit.getValue() >= Exercise.PRIME_MOVER) {
                movers.add(credit.getKey());
            }
            k++;
        }
        primeMovers = List.copyOf(movers);
        primeMoverOrdinals = new int[movers.size()];
        for (int p = 0; p < primeMoverOrdinals.length; p++) {
            primeMoverOrdinals[p] = movers.get(p).ordinal();
        }
    }

    public Exercise exercise() {
        return exercise;
    }

    /** How many muscles the entry credits. */
    public int size() {
        return ordinals.length;
    }

    /** The ordinal of the {@code k}-th credited muscle. */
    public int ordinal(int k) {
        return ordinals[k];
    }

    /** The credit of the {@code k}-th credited muscle (1 a prime mover, 0.5 a synergist). */
    public double credit(int k) {
        return credits[k];
    }

    /** How many muscles the entry credits as prime mover (credit 1 or more). */
    public int primeMoverCount() {
        return primeMoverOrdinals.length;
    }

    /** The muscles credited as prime mover, in the order the entry writes them. */
    public List<Muscle> primeMovers() {
        return primeMovers;
    }

    /** The ordinal of the {@code p}-th prime mover. */
    public int primeMoverOrdinal(int p) {
        return primeMoverOrdinals[p];
    }
}
