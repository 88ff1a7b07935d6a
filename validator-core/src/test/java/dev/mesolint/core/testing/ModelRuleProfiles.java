package dev.mesolint.core.testing;

import dev.mesolint.core.engine.RuleConfiguration;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import java.util.Map;
import java.util.Optional;

/**
 * A stand-in for the built-in profiles while they are written elsewhere: metadata defaults (the hypertrophy
 * profile), plus the values the strength and general-fitness profiles must set for the model rules. The profile is
 * the programme's goal, unless a test names one.
 */
public final class ModelRuleProfiles implements RuleConfiguration {
    /** profile -> rule id -> parameter -> value (base units). */
    public static final Map<String, Map<String, Map<String, Double>>> DIFFERENCES = Map.of(
            "strength", Map.of("weekly-volume-max", Map.of("max-sets-competition-lifts", 25.0)),
            "general-fitness", Map.of());

    private final Optional<String> profile;

    private ModelRuleProfiles(Optional<String> profile) {
        this.profile = profile;
    }

    /** The profile follows each programme's goal. */
    public static ModelRuleProfiles byGoal() {
        return new ModelRuleProfiles(Optional.empty());
    }

    /** Every programme is checked under {@code profile}. */
    public static ModelRuleProfiles fixed(String profile) {
        return new ModelRuleProfiles(Optional.of(profile));
    }

    @Override
    public String profileFor(String displayPath, Programme programme) {
        return profile.orElseGet(() -> RuleConfiguration.DEFAULTS.profileFor(displayPath, programme));
    }

    @Override
    public RuleSettings settingsFor(String profileName, RuleDefinition rule) {
        RuleSettings settings = RuleSettings.defaults(rule.metadata());
        for (Map.Entry<String, Double> e : DIFFERENCES.getOrDefault(profileName, Map.of())
                .getOrDefault(rule.id(), Map.of()).entrySet()) {
            settings = settings.with(e.getKey(), e.getValue());
        }
        return settings;
    }
}
