package dev.mesolint.core.engine;

import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Located;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.rule.FileScope;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import java.util.Collections;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;

/** Reports waivers that accepted no finding: stale, misspelt, or for a rule that is off. */
final class WaiverAudit {
    private final List<RuleDefinition> rules;
    private final RuleConfiguration configuration;

    WaiverAudit(List<RuleDefinition> rules, RuleConfiguration configuration) {
        this.rules = rules;
        this.configuration = configuration;
    }

    void report(FileScope scope) {
        RuleDefinition audit = rules.stream().filter(r -> r.id().equals(FrameworkRules.UNUSED_WAIVER)).findFirst()
                .orElse(null);
        if (audit == null) {
            return;
        }
        RuleSettings settings = configuration.settingsFor(scope.profileName(), audit);
        if (settings.severity() == Severity.OFF) {
            return;
        }
        RuleContext context = new RuleContext(scope, audit.metadata(), settings);
        for (Waiver w : allWaivers(scope)) {
            if (scope.used(w)) {
                continue;
            }
            RuleDefinition named = rules.stream().filter(r -> r.id().equals(w.ruleId())).findFirst().orElse(null);
            String why;
            String fix = "remove the waiver, or correct the rule id (see 'mesolint rules')";
            if (named == null) {
                why = "names no known rule";
                Optional<String> near = ConfigDocument.closest(w.ruleId(), rules.stream().map(RuleDefinition::id)
                        .toList());
                if (near.isPresent()) {
                    fix = "did you mean '" + near.get() + "'? correct the rule id, or remove the waiver";
                }
            } else if (configuration.settingsFor(scope.profileName(), named).severity() == Severity.OFF) {
                why = "names " + w.ruleId() + ", which is off in the " + scope.profileName() + " profile";
            } else {
                why = "accepted no " + w.ruleId() + " finding";
            }
            context.report(w.location(), List.of(), "waiver for '" + w.ruleId() + "' " + why + " (reason given: "
                    + w.reason() + ")", fix);
        }
    }

    /** Every distinct waiver written in the file, in order of appearance. */
    private static List<Waiver> allWaivers(FileScope scope) {
        Set<Waiver> seen = Collections.newSetFromMap(new IdentityHashMap<>());
        var programme = scope.programme();
        Stream<Located> nodes = programme.weeks().stream().flatMap(w -> Stream.concat(Stream.of(w),
                w.sessions().stream().flatMap(s -> Stream.concat(Stream.of(s), s.work().stream().flatMap(i -> Stream
                        .concat(Stream.of(i), items(i)))))));
        Stream<Waiver> all = Stream.concat(programme.fileWaivers().stream(), nodes.flatMap(n -> n.waivers().stream()));
        return all.filter(seen::add)
                .sorted(java.util.Comparator.comparingInt((Waiver w) -> w.location().line())).toList();
    }

    private static Stream<Located> items(dev.mesolint.core.programme.WorkItem item) {
        if (item instanceof dev.mesolint.core.programme.Superset s) {
            return s.items().stream().flatMap(e -> Stream.concat(Stream.of(e), e.sets().stream()));
        }
        return ((dev.mesolint.core.programme.ExerciseWork) item).sets().stream().map(x -> x);
    }
}
