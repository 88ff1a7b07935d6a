package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.source.Location;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Reports a rule's findings once per written place: a repeated week copies the sessions it repeats, so the same
 * finding would otherwise come back once per week. Findings at the same place, with the same waivers, severity,
 * message and fix are reported once, with {@link #WEEKS} in the message replaced by every week they occur in
 * ({@code week 2}, {@code weeks 1-4}). Used by one rule for one file; not shared.
 */
final class WeekMerge {
    /** Stands for the weeks in a message until the findings are reported. */
    static final String WEEKS = "{weeks}";

    private record Finding(Location where, List<Waiver> waivers, Severity severity, String message, String fix) {
    }

    private final Map<Finding, TreeSet<Integer>> weeks = new LinkedHashMap<>();

    void add(int week, Location where, List<Waiver> waivers, Severity severity, String message, String fix) {
        // Location equality includes the line: the same written place. Waivers compare by identity.
        weeks.computeIfAbsent(new Finding(where, List.copyOf(waivers), severity, message, fix), f -> new TreeSet<>())
                .add(week);
    }

    void report(RuleContext context) {
        weeks.forEach((f, numbers) -> context.report(f.where(), f.waivers(), f.severity(),
                f.message().replace(WEEKS, Texts.weeks(numbers)), f.fix()));
    }
}
