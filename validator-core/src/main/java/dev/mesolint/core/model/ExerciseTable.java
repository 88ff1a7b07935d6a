package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.ExerciseLookups;
import dev.mesolint.core.catalogue.PerEntry;

/**
 * The catalogue as one programme's computation reads it: each exercise looked up and worked out once, however many
 * sets do it. Confined to that computation.
 */
final class ExerciseTable {
    /** Each entry's figures, shared by every programme of the run. */
    private static final PerEntry<ExerciseFigures> FIGURES = new PerEntry<>(ExerciseFigures::new, f -> f.exercise);

    private final ExerciseLookups<ExerciseFigures> figures;

    ExerciseTable(Catalogue catalogue) {
        this.figures = new ExerciseLookups<>(id -> catalogue.find(id).map(FIGURES::of).orElse(null),
                f -> f.exercise.id());
    }

    /** The exercise's figures; null when the catalogue does not know it (its sets are left out). */
    ExerciseFigures find(String id) {
        return figures.get(id);
    }
}
