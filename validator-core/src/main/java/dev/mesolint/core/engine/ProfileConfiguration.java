package dev.mesolint.core.engine;

import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.profile.ProfileChoice;
import dev.mesolint.core.profile.ProfileSet;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import java.util.List;

/** Rule settings from resolved profiles; which profile checks a file is the {@link ProfileChoice}'s decision. */
public final class ProfileConfiguration implements RuleConfiguration {
    private final ProfileSet profiles;
    private final ProfileChoice choice;

    public ProfileConfiguration(ProfileSet profiles, ProfileChoice choice) {
        this.profiles = profiles;
        this.choice = choice;
    }

    /** The built-in profiles, chosen by each programme's goal. */
    public static ProfileConfiguration builtIn(List<? extends RuleDefinition> rules) {
        return new ProfileConfiguration(ProfileSet.builtIn(rules), ProfileChoice.BY_GOAL);
    }

    public ProfileSet profiles() {
        return profiles;
    }

    @Override
    public String profileFor(String displayPath, Programme programme) {
        return choice.choose(displayPath, programme);
    }

    @Override
    public RuleSettings settingsFor(String profile, RuleDefinition rule) {
        return profiles.get(profile).settings(rule);
    }

    @Override
    public ModelParameters modelParameters(String profile) {
        return profiles.get(profile).model();
    }
}
