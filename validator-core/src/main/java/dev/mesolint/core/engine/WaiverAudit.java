package dev.mesolint.core.engine;

import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.rule.FileScope;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/** Reports waivers that accepted no finding: stale, misspelt, or for a rule that is off. Built once per run. */
final class WaiverAudit {
    private final List<RuleDefinition> rules;
    private final RuleConfiguration configuration;
    private final RuleDefinition audit;
    private final Map<String, RuleDefinition> byId = new HashMap<>();

    WaiverAudit(List<RuleDefinition> rules, RuleConfiguration configuration) {
        this.rules = rules;
        this.configuration = configuration;
        for (RuleDefinition r : rules) {
            byId.putIfAbsent(r.id(), r);
        }
        this.audit = byId.get(FrameworkRules.UNUSED_WAIVER);
    }

    void report(FileScope scope) {
        if (audit == null) {
            return;
        }
        List<Waiver> waivers = allWaivers(scope);
        if (waivers.isEmpty()) {
            return;
        }
        RuleSettings settings = configuration.settingsFor(scope.profileName(), audit);
        if (settings.severity() == Severity.OFF) {
            return;
        }
        RuleContext context = new RuleContext(scope, audit.metadata(), settings);
        for (Waiver w : waivers) {
            if (scope.used(w)) {
                continue;
            }
            RuleDefinition named = byId.get(w.ruleId());
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

    /** Every distinct waiver written in the file, in order of appearance (by line; ties in the order written). */
    private static List<Waiver> allWaivers(FileScope scope) {
        Set<Waiver> seen = Collections.newSetFromMap(new IdentityHashMap<>());
        List<Waiver> all = new ArrayList<>();
        Programme programme = scope.programme();
        collect(programme.fileWaivers(), seen, all);
        for (Week week : programme.weeks()) {
            collect(week.waivers(), seen, all);
            for (Session session : week.sessions()) {
                collect(session.waivers(), seen, all);
                for (WorkItem item : session.work()) {
                    collect(item.waivers(), seen, all);
                    if (item instanceof Superset superset) {
                        for (ExerciseWork e : superset.items()) {
                            collect(e.waivers(), seen, all);
                            sets(e, seen, all);
                        }
                    } else {
                        sets((ExerciseWork) item, seen, all);
                    }
                }
            }
        }
        if (all.size() > 1) {
            all.sort(Comparator.comparingInt((Waiver w) -> w.location().line()));
        }
        return all;
    }

    private static void sets(ExerciseWork work, Set<Waiver> seen, List<Waiver> all) {
        for (SetPrescription set : work.sets()) {
            collect(set.waivers(), seen, all);
        }
    }

    private static void collect(List<Waiver> waivers, Set<Waiver> seen, List<Waiver> all) {
        if (waivers.isEmpty()) {
            return; // nearly every list: and an empty list's iterator is still an allocation per set
        }
        for (Waiver w : waivers) {
            if (seen.add(w)) {
                all.add(w);
            }
        }
    }
}
