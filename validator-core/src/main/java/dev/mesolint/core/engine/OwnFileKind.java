package dev.mesolint.core.engine;

import java.nio.file.Path;
import java.util.Optional;
import tools.jackson.databind.JsonNode;

/**
 * mesolint's own kinds of file, when one turns up among the programmes: checked as what it is (its problems are
 * findings on it), never as a programme, and never in effect from there, which the run says.
 */
public enum OwnFileKind {
    CATALOGUE("an exercise catalogue", "name it under catalogues: in .mesolint.yaml to use its exercises"),
    PROFILE("a team profile", "name it in .mesolint.yaml (profile:, goals: or folders:) to use it"),
    CONFIGURATION("a repository configuration", "only the nearest .mesolint.yaml at or above the folders checked "
            + "applies; move its settings there");

    private final String label;
    private final String hint;

    OwnFileKind(String label, String hint) {
        this.label = label;
        this.hint = hint;
    }

    /**
     * What {@code file} is when it is not a programme: by name for the configuration, else by its top-level keys (a
     * programme has {@code programme} or {@code weeks}; a profile has {@code profile}; a catalogue {@code exercises}).
     */
    static Optional<OwnFileKind> of(Path file, JsonNode root) {
        if (file.getFileName() != null && file.getFileName().toString().equalsIgnoreCase(ProgrammeFiles.CONFIGURATION)) {
            return Optional.of(CONFIGURATION);
        }
        if (root == null || !root.isObject() || root.has("programme") || root.has("weeks")) {
            return Optional.empty();
        }
        if (root.has("profile")) {
            return Optional.of(PROFILE);
        }
        return root.has("exercises") ? Optional.of(CATALOGUE) : Optional.empty();
    }

    /** The line a front end prints about a file of this kind found among the programmes. */
    public String notice(String shown) {
        return shown + " was checked as " + label + ", not as a programme; it is not in effect in this run (" + hint
                + ")";
    }
}
