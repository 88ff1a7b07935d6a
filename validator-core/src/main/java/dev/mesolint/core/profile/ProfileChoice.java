package dev.mesolint.core.profile;

import dev.mesolint.core.programme.Goal;
import dev.mesolint.core.programme.Programme;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Predicate;

/**
 * Which profile checks a file, by name, in this order: a forced profile (command line), the first folder rule that
 * matches the file's path, the profile set for the programme's goal, the repository's default profile, the built-in
 * profile named after the goal. A file that did not load skips the goal steps and falls back to {@code hypertrophy}.
 */
public record ProfileChoice(Optional<String> forced, List<FolderChoice> folders, Map<Goal, String> goals,
        Optional<String> fallback) {

    /** Files whose path the matcher accepts get {@code profile}. */
    public record FolderChoice(Predicate<String> matcher, String profile) {
    }

    /** No configuration: the goal picks the built-in profile. */
    public static final ProfileChoice BY_GOAL = new ProfileChoice(Optional.empty(), List.of(), Map.of(),
            Optional.empty());

    public ProfileChoice {
        folders = List.copyOf(folders);
        goals = Map.copyOf(goals);
    }

    /** Every file gets {@code profile}. */
    public static ProfileChoice always(String profile) {
        return new ProfileChoice(Optional.of(profile), List.of(), Map.of(), Optional.empty());
    }

    /** @param programme null when the file did not load */
    public String choose(String displayPath, Programme programme) {
        if (forced.isPresent()) {
            return forced.get();
        }
        for (FolderChoice f : folders) {
            if (f.matcher().test(displayPath)) {
                return f.profile();
            }
        }
        if (programme != null && goals.containsKey(programme.info().goal())) {
            return goals.get(programme.info().goal());
        }
        if (fallback.isPresent()) {
            return fallback.get();
        }
        return programme == null ? BuiltInProfiles.DEFAULT : programme.info().goal().yamlName();
    }
}
