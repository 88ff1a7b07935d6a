package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.profile.ProfileSet;
import dev.mesolint.core.profile.ResolvedProfile;
import dev.mesolint.core.reference.RuleReference;
import dev.mesolint.core.report.RulePages;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import dev.mesolint.core.rule.Thresholds;
import java.io.PrintWriter;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

/** {@code mesolint explain RULE-ID}: a rule's reference page. */
@Command(name = "explain", mixinStandardHelpOptions = true,
        description = {"Prints a rule's reference page: what it checks, its severity and parameters in each built-in "
                + "profile, why, the source, and examples.", "With --profile (or a default profile in the "
                + "configuration), first the rule's severity and thresholds in that profile, team profiles included.",
            "The same pages are in docs/rules/ of the project."},
        footer = {"", "Caution: " + Mesolint.CAUTION})
final class ExplainCommand implements Callable<Integer> {
    @Parameters(paramLabel = "RULE-ID", description = "A rule id, e.g. short-rest-compound.")
    String ruleId;

    @Mixin
    ConfigOptions options;

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
        PrintWriter out = spec.commandLine().getOut();
        try {
            Workspace workspace = Workspace.open(options.toRunOptions(List.of(), List.of(), Optional.empty(),
                    Optional.empty()), installed.rules());
            ResolvedProfile profile = workspace.profiles().get(workspace.defaultProfile());
            RuleSettings settings = profile.settings(rule.get());
            String thresholds = Thresholds.line(rule.get().metadata(), settings);
            out.println("In the " + profile.name() + " profile: " + settings.severity().label()
                    + (thresholds.isEmpty() ? "" : "; " + thresholds));
            out.println();
            // The page's summary reads the defaults; under a profile it reads that profile's thresholds.
            page = page.replace(rule.get().metadata().summary(), Thresholds.summary(rule.get().metadata(), settings));
        } catch (ConfigProblem e) {
            return Installed.fail(e, spec.commandLine().getErr());
        }
        // The page is read in a terminal: plain text, without the note for contributors that heads the file.
        out.print(TerminalPage.render(page));
        spec.commandLine().getOut().flush();
        return 0;
    }
}
