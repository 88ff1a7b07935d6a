package dev.mesolint.core.engine;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RulePack;
import dev.mesolint.core.rules.BuiltInRules;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;

/**
 * The rules of a run: the built-in list, then the rules of every {@link RulePack} on the class path, with the pack
 * that supplied each pack rule.
 */
public record InstalledRules(List<RuleDefinition> rules, Map<String, String> packOf) {

    public InstalledRules {
        rules = List.copyOf(rules);
        packOf = Map.copyOf(packOf);
    }

    /** The built-in rules alone. */
    public static InstalledRules builtIn() {
        return new InstalledRules(BuiltInRules.all(), Map.of());
    }

    /** Built-in rules plus the packs that {@code loader} can see, in a stable order (by pack name). */
    public static InstalledRules discover(ClassLoader loader) throws ConfigProblem {
        List<RulePack> packs = new ArrayList<>();
        try {
            ServiceLoader.load(RulePack.class, loader).forEach(packs::add);
        } catch (ServiceConfigurationError e) {
            throw new ConfigProblem("rule packs on the class path", null, "a rule pack could not be loaded: "
                    + e.getMessage(), "check the pack's META-INF/services entry and that its class has a public "
                            + "no-argument constructor");
        }
        packs.sort(java.util.Comparator.comparing(RulePack::name));
        Map<String, String> owner = new LinkedHashMap<>();
        List<RuleDefinition> all = new ArrayList<>();
        for (RuleDefinition r : BuiltInRules.all()) {
            owner.put(r.id(), "the built-in rules");
            all.add(r);
        }
        Map<String, String> packOf = new LinkedHashMap<>();
        for (RulePack pack : packs) {
            for (Rule r : pack.rules()) {
                String earlier = owner.putIfAbsent(r.id(), "rule pack " + pack.name());
                if (earlier != null) {
                    throw new ConfigProblem("rule pack " + pack.name(), null, "rule id '" + r.id()
                            + "' is already defined by " + earlier, "give the pack's rule an id of its own, e.g. "
                                    + "prefixed with the team's name");
                }
                all.add(r);
                packOf.put(r.id(), pack.name());
            }
        }
        return new InstalledRules(all, packOf);
    }

    public Optional<RuleDefinition> find(String id) {
        return rules.stream().filter(r -> r.id().equals(id)).findFirst();
    }

    /** The pack that supplied a rule; empty for a built-in rule. */
    public Optional<String> pack(String id) {
        return Optional.ofNullable(packOf.get(id));
    }
}
