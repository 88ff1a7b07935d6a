package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.profile.ProfileSet;
import dev.mesolint.core.reference.RuleReference;
import dev.mesolint.core.report.RulePages;
import dev.mesolint.core.rule.RuleDefinition;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code mesolint explain RULE-ID}: a rule's reference page. */
@Command(name = "explain", mixinStandardHelpOptions = true,
        description = {"Prints a rule's reference page: what it checks, its severity and parameters in each built-in "
                + "profile, why, the source, and examples.", "The same pages are in docs/rules/ of the project."},
        footer = {"", "Caution: " + Mesolint.CAUTION})
final class ExplainCommand implements Callable<Integer> {
    @Parameters(paramLabel = "RULE-ID", description = "A rule id, e.g. short-rest-compound.")
    String ruleId;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        InstalledRules installed;
        try {
            installed = Installed.rules();
        } catch (ConfigProblem e) {
            return Installed.fail(e, spec.commandLine().getErr());
        }
        Optional<RuleDefinition> rule = installed.find(ruleId);
        if (rule.isEmpty()) {
            spec.commandLine().getErr().println("mesolint: no rule '" + ruleId + "'" + ConfigDocument.closest(ruleId,
                    installed.rules().stream().map(RuleDefinition::id).toList()).map(id -> "; did you mean '" + id
                            + "'?").orElse("") + " (list the rules with 'mesolint rules')");
            return MesolintCommand.EXIT_USAGE;
        }
        // Built-in rules have a generated page in the jar; a pack rule's page is built from its metadata.
        String page = RulePages.page(ruleId).orElseGet(() -> new RuleReference(installed.rules(),
                ProfileSet.builtIn(installed.rules())).page(rule.get(), Optional.empty()));
        spec.commandLine().getOut().print(page);
        spec.commandLine().getOut().flush();
        return 0;
    }
}
