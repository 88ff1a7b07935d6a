package dev.mesolint.core.format;

import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.RepTarget;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Expands weeks written as "week M with these changes" into full weeks, before any rule or metric sees them.
 *
 * <p>Expanded sets keep the location of the set they were copied from, so findings point at the line that wrote
 * them. A week can repeat a week that itself repeats another; changes accumulate. Accumulated changes obey the
 * format's own bounds (sets and rounds 1 to 20, reps 1 to 100), and a file expands to at most {@link #MAX_WEEKS}
 * weeks and {@link #MAX_EXPANDED_SETS} sets: a small file of chained repeats cannot grow without bound. Each bound
 * crossed is a located error at the key that grew it; the value is held at the bound.
 */
final class WeekExpander {
    /** The longest programme the format describes (the schema's largest week number): two years. */
    static final int MAX_WEEKS = 104;
    /** Sets per exercise and rounds per superset: the schema's bound, re-applied after {@code adjust}. */
    static final int MAX_SETS = 20;
    /**
     * Sets after expansion in one file: over twice a two-year, six-day programme of 15 sets a session (104 x 6 x 15 =
     * 9,360), so no real programme meets it, while the model's per-set figures stay a few megabytes.
     */
    static final int MAX_EXPANDED_SETS = 20_000;

    private final BindContext ctx;
    private final Set<String> reported = new HashSet<>();

    WeekExpander(BindContext ctx) {
        this.ctx = ctx;
    }

    List<Week> expand(List<WeekDraft> drafts) {
        Map<Integer, Week> byNumber = new HashMap<>();
        List<Week> weeks = new ArrayList<>();
        long total = 0;
        for (WeekDraft draft : drafts) {
            if (weeks.size() == MAX_WEEKS) {
                ctx.reject(draft.location().pointer(), "the programme has more than " + MAX_WEEKS + " weeks; the "
                        + "format describes at most two years", "split it into programmes of at most " + MAX_WEEKS
                        + " weeks");
                break;
            }
            List<Session> sessions = draft.repeat().map(m -> repeated(draft, m, byNumber)).orElse(draft.sessions());
            Week week = new Week(draft.number(), draft.deload(), sessions, draft.location(), draft.numberLocation(),
                    draft.waivers());
            total += setCount(sessions);
            if (total > MAX_EXPANDED_SETS) {
                String key = draft.repeat().isPresent() ? draft.repeatLocation().pointer() : draft.location().pointer();
                ctx.reject(key, "by week " + draft.number() + " the programme expands to more than "
                        + String.format("%,d", MAX_EXPANDED_SETS) + " sets, the limit for one file"
                        + (draft.repeat().isPresent() ? " (this repeat and the ones before it add them)" : ""),
                        "check the repeats' adjust: sets, or split the programme into several files");
                break;
            }
            byNumber.putIfAbsent(week.number(), week);
            weeks.add(week);
        }
        return weeks;
    }

    private static long setCount(List<Session> sessions) {
        long n = 0;
        for (Session s : sessions) {
            for (WorkItem item : s.work()) {
                n += item instanceof ExerciseWork e ? e.sets().size()
                        : ((Superset) item).items().stream().mapToLong(i -> i.sets().size()).sum();
            }
        }
        return n;
    }

    /** Reports a bound crossed by {@code draft}'s {@code adjust: key}, once per week and key. */
    private void overBound(WeekDraft draft, String key, String what, int value, String bound) {
        String pointer = draft.location().pointer() + "/adjust/" + key;
        if (reported.add(pointer)) {
            ctx.reject(pointer, "week " + draft.number() + " repeats week " + draft.repeat().orElse(0) + " with '"
                    + key + "' changed until " + what + " reach " + value + "; the format allows " + bound,
                    "lower adjust: " + key + " here or in the weeks it repeats, or write this week's sessions out");
        }
    }
    private List<Session> repeated(WeekDraft draft, int baseNumber, Map<Integer, Week> done) {
        Week base = done.get(baseNumber);
        if (base == null || baseNumber >= draft.number()) {
            ctx.reject(draft.repeatLocation().pointer(), "week " + draft.number() + " repeats week " + baseNumber
                    + ", which is not written before it", "repeat an earlier week, e.g. repeat: 1");
            return draft.sessions();
        }
        List<Session> sessions = new ArrayList<>();
        for (Session s : base.sessions()) {
            Optional<Session> replacement = draft.sessions().stream().filter(own -> own.day() == s.day()).findFirst();
            sessions.add(replacement.orElseGet(() -> copy(s, draft, draft.adjust())));
        }
        draft.sessions().stream().filter(own -> base.sessions().stream().noneMatch(b -> b.day() == own.day()))
                .forEach(sessions::add);
        sessions.sort(Comparator.comparingInt(Session::day));
        return sessions;
    }

    private Session copy(Session s, WeekDraft draft, Adjustment a) {
        List<Waiver> waivers = plus(s.waivers(), draft.waivers());
        List<WorkItem> work = s.work().stream().map(item -> adjust(item, draft, a)).toList();
        return new Session(s.day(), s.name(), work, s.location(), s.dayLocation(), waivers);
    }

    private WorkItem adjust(WorkItem item, WeekDraft draft, Adjustment a) {
        if (item instanceof ExerciseWork e) {
            return adjust(e, draft, a, a.appliesTo(e.exerciseId()) ? a.setsDelta() : 0);
        }
        Superset s = (Superset) item;
        boolean any = s.items().stream().anyMatch(i -> a.appliesTo(i.exerciseId()));
        int wanted = any ? Math.max(1, s.rounds() + a.setsDelta()) : s.rounds();
        if (wanted > MAX_SETS) {
            overBound(draft, "sets", "a superset's rounds", wanted, "at most " + MAX_SETS);
        }
        int rounds = Math.min(MAX_SETS, wanted);
        List<ExerciseWork> items = s.items().stream()
                .map(i -> adjust(i, draft, a, rounds - s.rounds()))
                .toList();
        return new Superset(rounds, s.rest(), items, s.location(), plus(s.waivers(), draft.waivers()));
    }

    private ExerciseWork adjust(ExerciseWork e, WeekDraft draft, Adjustment a, int setsDelta) {
        boolean applies = a.appliesTo(e.exerciseId());
        List<Waiver> weekWaivers = draft.waivers();
        int wanted = e.sets().size() + setsDelta;
        if (wanted > MAX_SETS) {
            overBound(draft, "sets", e.exerciseId() + " sets", wanted, "at most " + MAX_SETS);
        }
        List<SetPrescription> sets = new ArrayList<>(e.sets());
        resize(sets, Math.min(setsDelta, MAX_SETS - sets.size()));
        if (applies && a.repsDelta() != 0) {
            checkReps(e, draft, a);
        }
        List<SetPrescription> out = new ArrayList<>();
        for (int i = 0; i < sets.size(); i++) {
            SetPrescription p = sets.get(i);
            // Holds, carries and 1RM tests have no rep count to change.
            boolean repsApply = applies && !p.holdOrCarry() && !p.test();
            out.add(p.with(i + 1, repsApply ? a.reps(p.reps()) : p.reps(), applies ? a.rir(p.rir()) : p.rir(),
                    applies ? a.rpe(p.rpe()) : p.rpe(), applies ? a.load(p.load()) : p.load(), p.technique(),
                    plus(p.waivers(), weekWaivers)));
        }
        return e.with(out, plus(e.waivers(), weekWaivers));
    }

    private void checkReps(ExerciseWork e, WeekDraft draft, Adjustment a) {
        for (SetPrescription p : e.sets()) {
            // Holds, carries and tests keep their reps, as the expansion below does.
            if (p.reps().amrap() || p.holdOrCarry() || p.test()) {
                continue;
            }
            int high = p.reps().max() + a.repsDelta();
            int low = p.reps().min() + a.repsDelta();
            if (high > RepTarget.MAX_REPS) {
                overBound(draft, "reps", e.exerciseId() + " reps", high, "at most " + RepTarget.MAX_REPS);
            } else if (low < 1) {
                overBound(draft, "reps", e.exerciseId() + " reps", low, "at least 1");
            }
        }
    }

    /** Adds copies of the last plain set (before a final technique set) or removes sets from the end, keeping one. */
    private static void resize(List<SetPrescription> sets, int delta) {
        for (int i = 0; i < delta; i++) {
            SetPrescription last = sets.get(sets.size() - 1);
            SetPrescription plain = last.with(last.number(), last.reps(), last.rir(), last.rpe(), last.load(),
                    Optional.empty(), last.waivers());
            sets.add(last.technique().isPresent() ? sets.size() - 1 : sets.size(), plain);
        }
        for (int i = 0; i > delta && sets.size() > 1; i--) {
            sets.remove(last(sets));
        }
    }

    private static int last(List<SetPrescription> sets) {
        // Keep a final technique set: remove the plain set before it.
        return sets.get(sets.size() - 1).technique().isPresent() && sets.size() > 1 ? sets.size() - 2 : sets.size() - 1;
    }

    private static List<Waiver> plus(List<Waiver> a, List<Waiver> b) {
        if (b.isEmpty()) {
            return a;
        }
        List<Waiver> all = new ArrayList<>(a);
        b.stream().filter(w -> !all.contains(w)).forEach(all::add);
        return all;
    }
}
