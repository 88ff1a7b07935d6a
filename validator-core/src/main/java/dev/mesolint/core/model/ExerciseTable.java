package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Catalogue;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.Map;

/**
 * The catalogue as one programme's computation reads it: each exercise looked up and worked out once, however many
 * sets do it. Confined to that computation.
 */
final class ExerciseTable {
    /** Stands for an id the catalogue does not know, so that misses are remembered too. */
    private static final Object UNKNOWN = new Object();

    private final Catalogue catalogue;
    private final Map<String, Object> byId = new HashMap<>();
    /** The same by the id string itself: sets share a few id strings, and references compare faster (FileIndex). */
    private final Map<String, Object> bySameId = new IdentityHashMap<>();

    ExerciseTable(Catalogue catalogue) {
        this.catalogue = catalogue;
    }

    /** The exercise's figures; null when the catalogue does not know it (its sets are left out). */
    ExerciseFigures find(String id) {
        Object known = bySameId.get(id);
        if (known == null) {
            known = byId.get(id);
            if (known == null) {
                known = catalogue.find(id).<Object>map(ExerciseFigures::new).orElse(UNKNOWN);
                byId.put(id, known);
            }
            bySameId.put(id, known);
        }
        return known == UNKNOWN ? null : (ExerciseFigures) known;
    }
}
