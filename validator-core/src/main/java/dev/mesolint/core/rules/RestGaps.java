package dev.mesolint.core.rules;

import dev.mesolint.core.rule.Edits;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Durations;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.BiFunction;

/**
 * The rests of a session that more work follows, and the check the two rest rules share.
 *
 * <p>Straight sets: the rest after each set, including the last set when another exercise follows. Supersets: the
 * rest an item gets before its next set is the superset's {@code rest} (after each round) plus the changeovers
 * written on the items (the {@code rest} of every item but the last); the time spent doing the other items is not
 * counted, so the figure errs short. A missing {@code rest} is unknown and never reported.
 */
final class RestGaps {
    private RestGaps() {
    }

    /** One rest after a set: of which exercise, which step, how long (empty = not written), where it was written. */
    record Gap(ExerciseWork work, Occurrences.Step step, Optional<Duration> rest, Location where, List<Waiver> waivers,
            boolean inSuperset, Duration changeovers) {
    }

    /** The limit a rule sets for an exercise: the parameter to read and the words for "after ... sets". */
    record Limit(String parameter, String after) {
    }

    /**
     * Reports every rest shorter than {@code limitFor} asks of an entry and its exercise; entries it maps to null are
     * not this rule's.
     */
    static void check(RuleContext context, BiFunction<ExerciseWork, Exercise, Limit> limitFor) {
        Occurrences found = new Occurrences();
        for (Week week : context.programme().weeks()) {
            for (Session session : week.sessions()) {
                for (Gap gap : of(session, context)) {
                    Optional<Exercise> exercise = context.exercise(gap.work().exerciseId());
                    Limit limit = exercise.map(e -> limitFor.apply(gap.work(), e)).orElse(null);
                    if (limit == null || gap.rest().isEmpty()) {
                        continue;
                    }
                    double rest = Durations.seconds(gap.rest().get());
                    double min = context.param(limit.parameter());
                    if (rest < min) {
                        String detail = "rest " + seconds(rest) + (gap.changeovers().isZero() ? ""
                                : " (" + seconds(rest - Durations.seconds(gap.changeovers())) + " after the round + "
                                        + seconds(Durations.seconds(gap.changeovers())) + " of changeovers)")
                                + ", the " + context.profileName() + " profile asks for at least " + seconds(min)
                                + " after " + limit.after();
                        String fix = "rest: " + context.shown(limit.parameter())
                                + (gap.inSuperset() ? " on the superset, the rest after each round" : "");
                        found.add(week, session, gap.work().exerciseId(), gap.where(), gap.waivers(), gap.step(),
                                detail, fix, Facts.NONE.measured(rest, min, "s").withEdit(Edits.set(gap.where(),
                                        "rest", context.shown(limit.parameter())).orElse(null)));
                    }
                }
            }
        }
        found.report(context);
    }

    static String seconds(double s) {
        return (s == Math.rint(s) ? Long.toString((long) s) : String.format(java.util.Locale.ROOT, "%.1f", s)) + " s";
    }

    static List<Gap> of(Session session, RuleContext context) {
        List<Gap> gaps = new ArrayList<>();
        List<WorkItem> work = session.work();
        for (int w = 0; w < work.size(); w++) {
            String next = w + 1 < work.size() ? name(work.get(w + 1)) : null;
            if (work.get(w) instanceof ExerciseWork e) {
                straight(e, next, context, gaps);
            } else {
                superset((Superset) work.get(w), next, context, gaps);
            }
        }
        return gaps;
    }

    private static void straight(ExerciseWork e, String next, RuleContext context, List<Gap> gaps) {
        List<SetPrescription> sets = e.sets();
        for (int i = 0; i < sets.size(); i++) {
            boolean last = i == sets.size() - 1;
            if (last && next == null) {
                break;
            }
            SetPrescription set = sets.get(i);
            String label = (i + 1) + " -> " + (last ? next : Integer.toString(i + 2));
            gaps.add(new Gap(e, new Occurrences.Step("set", label), set.rest(), context.fieldLocation(set, "rest"),
                    set.waivers(), false, Duration.ZERO));
        }
    }

    private static void superset(Superset s, String next, RuleContext context, List<Gap> gaps) {
        List<ExerciseWork> items = s.items();
        for (int round = 1; round <= s.rounds(); round++) {
            boolean last = round == s.rounds();
            if (last && next == null) {
                break;
            }
            Duration changeovers = Duration.ZERO;
            for (int i = 0; i < items.size() - 1; i++) {
                changeovers = changeovers.plus(items.get(i).sets().get(round - 1).rest().orElse(Duration.ZERO));
            }
            Optional<Duration> rest = s.rest().map(changeovers::plus);
            String label = round + " -> " + (last ? next : Integer.toString(round + 1));
            for (ExerciseWork item : items) {
                gaps.add(new Gap(item, new Occurrences.Step("round", label), rest, context.fieldLocation(s, "rest"),
                        item.sets().get(round - 1).waivers(), true, changeovers));
            }
        }
    }

    private static String name(WorkItem item) {
        if (item instanceof ExerciseWork e) {
            return e.exerciseId();
        }
        return "superset " + String.join(" + ", ((Superset) item).items().stream().map(ExerciseWork::exerciseId)
                .toList());
    }
}
