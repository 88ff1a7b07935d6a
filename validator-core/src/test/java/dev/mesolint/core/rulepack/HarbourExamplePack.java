package dev.mesolint.core.rulepack;

import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RulePack;
import java.util.List;

/** The example rule pack that the tests load through {@code META-INF/services}. */
public final class HarbourExamplePack implements RulePack {
    @Override
    public String name() {
        return "harbourside-example";
    }

    @Override
    public List<Rule> rules() {
        return List.of(new ExerciseCountRule());
    }
}
