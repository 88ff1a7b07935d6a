package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.model.RestGap;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.rule.Edits;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Durations;
import java.util.function.BiFunction;

/**
 * The check the two rest rules share: every rest the model's session plan gives (planned once per file by the rule framework) against the
 * limit a rule sets. A rest the programme does not write is unknown and never reported.
 */
final class RestCheck {
    private RestCheck() {
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
                if (!mayRestTooShort(context, session, limitFor)) {
                    continue;
                }
                for (RestGap gap : context.index().rests(session)) {
                    if (gap.seconds().isEmpty()) {
                        continue;
                    }
                    Exercise exercise = context.exerciseOrNull(gap.work().exerciseId());
                    Limit limit = exercise == null ? null : limitFor.apply(gap.work(), exercise);
                    if (limit == null) {
                        continue;
                    }
                    double rest = gap.seconds().getAsDouble();
                    double min = context.param(limit.parameter());
                    if (rest < min) {
                        report(context, found, week, session, gap, limit, rest, min);
                    }
                }
            }
        }
        found.report(context);
    }

    /**
     * False when no rest of the session can be under its limit, so the session need not be planned. A rest is judged
     * only where it is written, and is never shorter than what is written: a straight set's rest is its own
     * {@code rest}; a superset round's is the superset's {@code rest} plus the changeovers between its items.
     */
    private static boolean mayRestTooShort(RuleContext context, Session session,
            BiFunction<ExerciseWork, Exercise, Limit> limitFor) {
        for (WorkItem item : session.work()) {
            if (item instanceof Superset superset) {
                if (superset.rest().isPresent()) {
                    double rest = Durations.seconds(superset.rest().get());
                    for (ExerciseWork work : superset.items()) {
                        if (rest < limit(context, work, limitFor)) {
                            return true;
                        }
                    }
                }
            } else {
                ExerciseWork work = (ExerciseWork) item;
                double limit = limit(context, work, limitFor);
                for (SetPrescription set : work.sets()) {
                    if (set.rest().isPresent() && Durations.seconds(set.rest().get()) < limit) {
                        return true;
                    }
                }
            }
        }
        return false;
    }

    /** The shortest rest the rule allows after the entry's sets, in seconds; 0 when the entry is not the rule's. */
    private static double limit(RuleContext context, ExerciseWork work,
            BiFunction<ExerciseWork, Exercise, Limit> limitFor) {
        Exercise exercise = context.exerciseOrNull(work.exerciseId());
        Limit limit = exercise == null ? null : limitFor.apply(work, exercise);
        return limit == null ? 0 : context.param(limit.parameter());
    }

    private static void report(RuleContext context, Occurrences found, Week week, Session session, RestGap gap,
            Limit limit, double rest, double min) {
        double changeovers = gap.changeoverSeconds();
        String detail = "rest " + Texts.seconds(rest) + (changeovers == 0 ? ""
                : " (" + Texts.seconds(rest - changeovers) + " after the round + " + Texts.seconds(changeovers)
                        + " of changeovers)")
                + ", the " + context.profileName() + " profile asks for at least " + Texts.seconds(min) + " after "
                + limit.after();
        String fix = "rest: " + context.shown(limit.parameter())
                + (gap.superset().isPresent() ? " on the superset, the rest after each round" : "");
        Location where = gap.superset().map(s -> context.fieldLocation(s, "rest"))
                .orElseGet(() -> context.fieldLocation(gap.set(), "rest"));
        String noun = gap.superset().isPresent() ? "round" : "set";
        String label = gap.position() + " -> "
                + gap.following().map(RestCheck::name).orElse(Integer.toString(gap.position() + 1));
        found.add(week, session, gap.work().exerciseId(), where, gap.set().waivers(), new Occurrences.Step(noun, label),
                detail, fix, Facts.NONE.measured(rest, min, "s").withEdit(Edits.set(where, "rest",
                        context.shown(limit.parameter())).orElse(null)));
    }

    private static String name(WorkItem item) {
        if (item instanceof ExerciseWork e) {
            return e.exerciseId();
        }
        return "superset " + String.join(" + ", ((Superset) item).items().stream().map(ExerciseWork::exerciseId)
                .toList());
    }
}
