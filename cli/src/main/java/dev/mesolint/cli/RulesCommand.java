package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.model.NamedModelParameters;
import dev.mesolint.core.profile.ResolvedProfile;
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

/** {@code mesolint rules}: the rules with their severity in a profile. */
@Command(name = "rules", mixinStandardHelpOptions = true,
        description = {"Lists every rule with its severity in a profile (off = not checked) and what it checks.",
            "The profile is --profile, else the configuration's default profile, else hypertrophy; each rule with "
                    + "parameters shows their values in it (and the default where the profile changes one).",
            "See 'mesolint explain RULE-ID' for a rule's parameters, rationale and examples."},
        footer = {"", ConfigOptions.PRECEDENCE, "", "Caution: " + Mesolint.CAUTION})
final class RulesCommand implements Callable<Integer> {

    @Mixin
    ConfigOptions options;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        try {
            InstalledRules installed = Installed.rules();
            Workspace workspace = Workspace.open(options.toRunOptions(List.of(), List.of(), Optional.empty(), Optional.empty()),
                    installed.rules());
            ResolvedProfile profile = workspace.profiles().get(workspace.defaultProfile());
            out.println("Rules in the " + profile.name() + " profile"
                    + (profile.chain().size() > 1 ? " (extends " + String.join(" -> ",
                            profile.chain().subList(1, profile.chain().size())) + ")" : "") + ":");
            out.println();
            out.printf("%-22s %-8s %s%n", "RULE", "SEVERITY", "CHECKS");
            for (RuleDefinition rule : installed.rules()) {
                RuleSettings s = profile.settings(rule);
                String pack = installed.pack(rule.id()).map(p -> " [rule pack " + p + "]").orElse("");
                out.printf("%-22s %-8s %s%s%n", rule.id(), s.severity().label(),
                        Thresholds.summary(rule.metadata(), s), pack);
                String thresholds = Thresholds.line(rule.metadata(), s);
                if (!thresholds.isEmpty()) {
                    out.printf("%-22s %-8s in this profile: %s%n", "", "", thresholds);
                }
            }
            List<String> model = changedModelParameters(profile.model());
            if (!model.isEmpty()) {
                out.println();
                out.println("Training-model parameters in this profile (docs/model.md): " + String.join(", ", model));
            }
            out.println();
            out.println("Caution: " + Mesolint.CAUTION);
            out.flush();
            return 0;
        } catch (ConfigProblem e) {
            return Installed.fail(e, spec.commandLine().getErr());
        }
    }

    /** {@code hardSetMaxRir 4 (default 3)} for each model parameter the profile (or one it extends) changes. */
    private static List<String> changedModelParameters(ModelParameters model) {
        ModelParameters defaults = ModelParameters.defaults();
        return NamedModelParameters.names().stream()
                .filter(n -> !NamedModelParameters.value(model, n).equals(NamedModelParameters.value(defaults, n)))
                .map(n -> n + " " + shown(NamedModelParameters.value(model, n)) + " (default "
                        + shown(NamedModelParameters.value(defaults, n)) + ")")
                .toList();
    }

    private static String shown(Object value) {
        return value instanceof Double d && d == Math.rint(d) ? Long.toString(d.longValue())
                : String.valueOf(value).toLowerCase(java.util.Locale.ROOT);
    }
}
