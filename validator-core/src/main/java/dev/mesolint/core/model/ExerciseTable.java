package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.ExerciseLookups;

/**
 * The catalogue as one programme's computation reads it: each exercise looked up and worked out once, however many
 * sets do it. Confined to that computation.
 */
final class ExerciseTable {
    private final ExerciseLookups<ExerciseFigures> figures;

    ExerciseTable(Catalogue catalogue) {
        this.figures = new ExerciseLookups<>(id -> catalogue.find(id).map(ExerciseFigures::new).orElse(null),
                f -> f.exercise.id());
    }

    /** The exercise's figures; null when the catalogue does not know it (its sets are left out). */
    ExerciseFigures find(String id) {
        return figures.get(id);
    }
}
