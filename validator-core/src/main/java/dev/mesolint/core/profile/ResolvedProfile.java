package dev.mesolint.core.profile;

import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import java.util.List;
import java.util.Map;

/**
 * A profile with its whole chain applied: every known rule's severity and parameter values, and the training
 * model's parameters. Immutable.
 *
 * @param chain    the profile names from this one up to the root of its {@code extends} chain
 * @param settings per rule id, for every rule known when the profile was resolved
 * @param model    the model's parameters: the defaults with the chain's {@code model:} values applied
 */
public record ResolvedProfile(String name, String description, String source, List<String> chain,
        Map<String, RuleSettings> settings, ModelParameters model) {

    public ResolvedProfile {
        chain = List.copyOf(chain);
        settings = Map.copyOf(settings);
    }

    /** The rule's settings; metadata defaults for a rule this profile was not resolved with. */
    public RuleSettings settings(RuleDefinition rule) {
        RuleSettings s = settings.get(rule.id());
        return s != null ? s : RuleSettings.defaults(rule.metadata());
    }
}
