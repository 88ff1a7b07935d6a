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
import java.util.HashMap;
import java.util.Map;
import java.util.Objects;
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
        // equals and hashCode written out with the record's own values (see Location for why)
        @Override
        public boolean equals(Object o) {
            return this == o || o instanceof Limit l && Objects.equals(parameter, l.parameter)
                    && Objects.equals(after, l.after);
        }

        @Override
        public int hashCode() {
            return Objects.hashCode(parameter) * 31 + Objects.hashCode(after);
        }
    }

    /**
     * Reports every rest shorter than {@code limitFor} asks of an entry and its exercise; entries it maps to null are
     * not this rule's.
     */
    static void check(RuleContext context, BiFunction<ExerciseWork, Exercise, Limit> limitFor) {
        Occurrences found = new Occurrences();
        Map<Said, Wording> wordings = new HashMap<>();
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
                        report(context, found, wordings, week, session, gap, limit, rest, min);
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

    /**
     * What decides a short rest's words: the place its fix edits, the rest, its changeovers, the limit and whether
     * it is a superset's rest after a round.
     */
    private record Said(Location where, double rest, double changeovers, Limit limit, boolean superset) {
        @Override
        public boolean equals(Object o) {
            return this == o || o instanceof Said s && Objects.equals(where, s.where)
                    && Double.compare(rest, s.rest) == 0 && Double.compare(changeovers, s.changeovers) == 0
                    && Objects.equals(limit, s.limit) && superset == s.superset;
        }

        @Override
        public int hashCode() {
            int h = Objects.hashCode(where);
            h = h * 31 + Double.hashCode(rest);
            h = h * 31 + Double.hashCode(changeovers);
            h = h * 31 + Objects.hashCode(limit);
            return h * 31 + Boolean.hashCode(superset);
        }
    }

    /** A short rest's words, made once for the weeks that repeat it. */
    private record Wording(String detail, String fix, Facts facts) {
    }

    private static void report(RuleContext context, Occurrences found, Map<Said, Wording> wordings, Week week,
            Session session, RestGap gap, Limit limit, double rest, double min) {
        Location where = gap.superset().isPresent() ? context.fieldLocation(gap.superset().get(), "rest")
                : context.fieldLocation(gap.set(), "rest");
        Wording wording = wordings.computeIfAbsent(new Said(where, rest, gap.changeoverSeconds(), limit,
                gap.superset().isPresent()), said -> wording(context, said, min));
        String noun = gap.superset().isPresent() ? "round" : "set";
        String label = gap.position() + " -> "
                + gap.following().map(RestCheck::name).orElse(Integer.toString(gap.position() + 1));
        found.add(week, session, gap.work().exerciseId(), where, gap.set().waivers(), new Occurrences.Step(noun, label),
                wording.detail(), wording.fix(), wording.facts());
    }

    private static Wording wording(RuleContext context, Said said, double min) {
        double rest = said.rest();
        double changeovers = said.changeovers();
        String detail = "rest " + Texts.seconds(rest) + (changeovers == 0 ? ""
                : " (" + Texts.seconds(rest - changeovers) + " after the round + " + Texts.seconds(changeovers)
                        + " of changeovers)")
                + ", the " + context.profileName() + " profile asks for at least " + Texts.seconds(min) + " after "
                + said.limit().after();
        String fix = "rest: " + context.shown(said.limit().parameter())
                + (said.superset() ? " on the superset, the rest after each round" : "");
        Facts facts = Facts.NONE.measured(rest, min, "s").withEdit(Edits.set(said.where(), "rest",
                context.shown(said.limit().parameter())).orElse(null));
        return new Wording(detail, fix, facts);
    }

    private static String name(WorkItem item) {
        if (item instanceof ExerciseWork e) {
            return e.exerciseId();
        }
        return "superset " + String.join(" + ", ((Superset) item).items().stream().map(ExerciseWork::exerciseId)
                .toList());
    }
}
