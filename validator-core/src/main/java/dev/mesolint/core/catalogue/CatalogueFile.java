package dev.mesolint.core.catalogue;

import dev.mesolint.core.source.Violation;
import java.util.List;

/** The entries of one catalogue file, or why it could not be read. */
public record CatalogueFile(String path, List<Exercise> entries, List<Violation> violations, String ruleId) {
    public CatalogueFile {
        entries = List.copyOf(entries);
        violations = List.copyOf(violations);
    }

    public boolean ok() {
        return violations.isEmpty();
    }
}
