package dev.mesolint.core.catalogue;

import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apache.commons.text.similarity.LevenshteinDistance;

/**
 * Exercises by id. Immutable; layers (built-in, repository files, a programme's own entries) are combined with
 * {@link #overlay}, later layers replacing earlier entries with the same id.
 */
public final class Catalogue {
    private static final LevenshteinDistance DISTANCE = LevenshteinDistance.getDefaultInstance();

    private final Map<String, Exercise> byId;

    private Catalogue(Map<String, Exercise> byId) {
        this.byId = byId;
    }

    public static Catalogue of(Collection<Exercise> entries) {
        Map<String, Exercise> map = new LinkedHashMap<>();
        entries.forEach(e -> map.put(e.id(), e));
        return new Catalogue(Map.copyOf(map));
    }

    /** This catalogue with {@code entries} added, replacing any entry with the same id. */
    public Catalogue overlay(Collection<Exercise> entries) {
        if (entries.isEmpty()) {
            return this;
        }
        Map<String, Exercise> map = new LinkedHashMap<>(byId);
        entries.forEach(e -> map.put(e.id(), e));
        return new Catalogue(Map.copyOf(map));
    }

    public Optional<Exercise> find(String id) {
        return Optional.ofNullable(byId.get(id));
    }

    public Collection<Exercise> entries() {
        return byId.values();
    }

    public int size() {
        return byId.size();
    }

    /**
     * The ids nearest to {@code id}: by edit distance, then by shared words, so {@code barbel-bench-press}
     * suggests {@code barbell-bench-press} and {@code bench-press} suggests the bench press variants.
     */
    public List<String> closest(String id, int max) {
        return byId.keySet().stream()
                .map(candidate -> Map.entry(candidate, score(id, candidate)))
                .filter(e -> e.getValue() < 0.6)
                .sorted(Comparator.comparingDouble((Map.Entry<String, Double> e) -> e.getValue())
                        .thenComparing(Map.Entry::getKey))
                .limit(max)
                .map(Map.Entry::getKey)
                .toList();
    }

    /** 0 = identical, 1 = nothing in common. */
    private static double score(String wanted, String candidate) {
        double edit = (double) DISTANCE.apply(wanted, candidate) / Math.max(wanted.length(), candidate.length());
        List<String> words = List.of(wanted.split("-"));
        long shared = words.stream().filter(w -> !w.isEmpty() && List.of(candidate.split("-")).contains(w)).count();
        double wordScore = 1.0 - (double) shared / words.size();
        return Math.min(edit, wordScore * 0.9);
    }
}
