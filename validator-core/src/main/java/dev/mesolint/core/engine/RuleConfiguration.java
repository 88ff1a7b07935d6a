package dev.mesolint.core.engine;

import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;

/** Decides which profile applies to a programme, and each rule's severity and parameters under it. */
public interface RuleConfiguration {

    /** The profile name for {@code programme}, or for a file that did not load when {@code programme} is null. */
    String profileFor(String displayPath, Programme programme);

    RuleSettings settingsFor(String profile, RuleDefinition rule);

    /** The training-model parameters under {@code profile}; the documented defaults unless a profile sets them. */
    default ModelParameters modelParameters(String profile) {
        return ModelParameters.defaults();
    }

    /** Metadata defaults everywhere; the profile is named after the programme's goal. */
    RuleConfiguration DEFAULTS = new RuleConfiguration() {
        @Override
        public String profileFor(String displayPath, Programme programme) {
            return programme == null ? "hypertrophy" : programme.info().goal().yamlName();
        }

        @Override
        public RuleSettings settingsFor(String profile, RuleDefinition rule) {
            return RuleSettings.defaults(rule.metadata());
        }
    };
}
