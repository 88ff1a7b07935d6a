package dev.mesolint.core.profile;

import dev.mesolint.core.config.ProfileRef;
import java.util.Map;
import java.util.Optional;

/**
 * A profile file as written: its name, the profile it extends, the rules it changes and the training-model
 * parameters it sets. Resolved against its parent chain by {@link ProfileSet}.
 *
 * @param source where it was read from: {@code built-in} or the file as shown to the user
 */
public record Profile(String name, Optional<ProfileRef> parent, String description, Map<String, RuleOverride> rules,
        ModelOverride model, String source) {

    public Profile {
        rules = Map.copyOf(rules);
    }
}
