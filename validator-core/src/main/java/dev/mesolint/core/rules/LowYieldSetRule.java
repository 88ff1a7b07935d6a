package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.value.Durations;
import java.time.Duration;
import java.util.List;
import java.util.function.DoubleFunction;
import java.util.function.ToDoubleFunction;

/** Sets that fatigue leaves with little of the stimulus they would give fresh, with the cause. */
public final class LowYieldSetRule implements Rule {
    public static final String ID = "low-yield-set";
    static final String MIN_SHARE = "min-share";
    /** Rest at which a short-rest fix stops being the likely cure. */
    private static final double LONG_REST_SECONDS = 180;

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Sets whose fatigue-adjusted stimulus is under {min-share} of what the same set gives fresh, with the cause "
                    + "(earlier sets, short rest).",
            Severity.INFO, RuleMetadata.Category.FATIGUE,
            List.of(RuleParameter.percent(MIN_SHARE, 0.30, 0.05, 0.9,
                    "Share of its fresh stimulus below which a set is reported.")),
            "Fatigue from the sets before lowers how much of a muscle a set can still reach, so each further set of "
                    + "the same muscle in a session adds less, the more so the shorter the rests. The model follows "
                    + "the muscle's residual fatigue set by set; a set that keeps under 30% of the stimulus it would "
                    + "give fresh costs time and recovery for little return. Longer rests (3 min rather than 1 min "
                    + "gave more growth in trained men), fewer sets in a row, or moving the set to another day keep "
                    + "more of it. The figure is a model estimate, so this is information, not a verdict.",
            "Schoenfeld et al. 2016, JSCR 30(7):1805-1812 (longer rests); Pelland et al. 2024 (diminishing returns "
                    + "of sets per session); the model's fatigue figures (docs/model.md, section 3)");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    /** A low-yield set: its share of the fresh stimulus, its prime mover's fatigue and what came before. */
    private record Hit(double share, double fatigue, int earlierSets, double restBefore) {
    }

    @Override
    public void check(RuleContext context) {
        double minShare = context.param(MIN_SHARE);
        double ceiling = context.metrics().parameters().stimulatingRepsCeiling();
        Occurrences.SetHits<Hit> groups = new Occurrences.SetHits<>();
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                List<SetMetrics> sets = session.sets();
                for (int i = 0; i < sets.size(); i++) {
                    SetMetrics set = sets.get(i);
                    if (set.primeMover().isEmpty() || !(set.stimulatingReps() > 0)) {
                        continue;
                    }
                    // In units of one fresh hard set: the same set done fresh gives stimulating reps / K.
                    double share = set.stimulus() / (set.stimulatingReps() / ceiling);
                    if (share < minShare) {
                        Muscle muscle = set.primeMover().get();
                        groups.add(week, session, set, set.location(), week.number(),
                                new Hit(share, 1 - set.recruitment(), earlier(context, sets, i, muscle),
                                        i == 0 ? 0 : sets.get(i - 1).restAfterSeconds()));
                    }
                }
            }
        }
        // Grouped per week (the figures differ from week to week), then merged where a week reads the same.
        Occurrences found = new Occurrences();
        for (Occurrences.Group<Hit> group : groups.groups()) {
            add(context, found, group);
        }
        found.report(context);
    }

    private static int earlier(RuleContext context, List<SetMetrics> sets, int index, Muscle muscle) {
        int count = 0;
        for (int i = 0; i < index; i++) {
            Exercise exercise = context.exerciseOrNull(sets.get(i).exerciseId());
            if (exercise != null && exercise.credit(muscle) > 0) {
                count++;
            }
        }
        return count;
    }

    private static void add(RuleContext context, Occurrences found, Occurrences.Group<Hit> group) {
        SetMetrics set = group.first();
        String muscle = Texts.muscle(set.primeMover().orElseThrow());
        List<Hit> hits = group.values();
        String restBefore = hits.stream().allMatch(h -> h.restBefore() == 0) ? "no rest"
                : span(hits, Hit::restBefore, LowYieldSetRule::seconds) + " rest";
        String message = group.label() + ": stimulus " + span(hits, Hit::share, LowYieldSetRule::percent)
                + " of what the same set gives fresh (the " + context.profileName() + " profile reports under "
                + context.shown(MIN_SHARE) + "): the " + muscle + " starts " + (hits.size() == 1 ? "it " : "them ")
                + span(hits, Hit::fatigue, LowYieldSetRule::percent) + " fatigued, after "
                + span(hits, h -> h.earlierSets(), Texts::num) + " earlier "
                + (hits.get(hits.size() - 1).earlierSets() == 1 ? "set" : "sets")
                + " that train it this session, with " + restBefore + " before " + (hits.size() == 1 ? "it" : "each");
        int firstSet = group.numbers().get(0);
        double shortestRest = hits.stream().mapToDouble(Hit::restBefore).min().orElse(0);
        String exercise = set.exerciseId();
        String fix;
        if (set.round() > 0) {
            fix = "pair " + exercise + " with an exercise for another muscle in this superset, or rest: 2min "
                    + "after each round";
        } else if (firstSet > 1 && shortestRest < LONG_REST_SECONDS) {
            fix = "rest: 3min between these sets, or stop " + exercise + " after set " + (firstSet - 1);
        } else if (firstSet > 1) {
            fix = "stop " + exercise + " after set " + (firstSet - 1) + " and move the other sets to another day";
        } else {
            fix = "do " + exercise + " earlier in the session, before the exercises that tire the " + muscle
                    + ", or rest longer before it";
        }
        group.add(found, context.severity(), message, fix);
    }

    /** The figure of the first and last hit: {@code 24%}, or {@code 27% to 12%}. */
    private static String span(List<Hit> hits, ToDoubleFunction<Hit> figure, DoubleFunction<String> format) {
        String first = format.apply(figure.applyAsDouble(hits.get(0)));
        String last = format.apply(figure.applyAsDouble(hits.get(hits.size() - 1)));
        return first.equals(last) ? first : first + " to " + last;
    }

    private static String percent(double share) {
        return Math.round(share * 100) + "%";
    }

    private static String seconds(double seconds) {
        return Durations.format(Duration.ofMillis(Math.round(seconds * 1000)));
    }
}
