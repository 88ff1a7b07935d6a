package dev.mesolint.core.format;

import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.source.Location;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Expands weeks written as "week M with these changes" into full weeks, before any rule or metric sees them.
 *
 * <p>Expanded sets keep the location of the set they were copied from, so findings point at the line that wrote
 * them. A week can repeat a week that itself repeats another; changes accumulate.
 */
final class WeekExpander {
    private final BindContext ctx;

    WeekExpander(BindContext ctx) {
        this.ctx = ctx;
    }

    List<Week> expand(List<WeekDraft> drafts) {
        Map<Integer, Week> byNumber = new HashMap<>();
        List<Week> weeks = new ArrayList<>();
        for (WeekDraft draft : drafts) {
            List<Session> sessions = draft.repeat().map(m -> repeated(draft, m, byNumber)).orElse(draft.sessions());
            Week week = new Week(draft.number(), draft.deload(), sessions, draft.location(), draft.numberLocation(),
                    draft.waivers());
            byNumber.putIfAbsent(week.number(), week);
            weeks.add(week);
        }
        return weeks;
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
            sessions.add(replacement.orElseGet(() -> copy(s, draft)));
        }
        draft.sessions().stream().filter(own -> base.sessions().stream().noneMatch(b -> b.day() == own.day()))
                .forEach(sessions::add);
        sessions.sort(Comparator.comparingInt(Session::day));
        return sessions;
    }

    private static Session copy(Session s, WeekDraft draft) {
        List<Waiver> waivers = plus(s.waivers(), draft.waivers());
        List<WorkItem> work = s.work().stream().map(item -> adjust(item, draft.adjust(), draft.waivers())).toList();
        return new Session(s.day(), s.name(), work, s.location(), s.dayLocation(), waivers);
    }

    private static WorkItem adjust(WorkItem item, Adjustment a, List<Waiver> weekWaivers) {
        if (item instanceof ExerciseWork e) {
            return adjust(e, a, weekWaivers, a.appliesTo(e.exerciseId()) ? a.setsDelta() : 0);
        }
        Superset s = (Superset) item;
        boolean any = s.items().stream().anyMatch(i -> a.appliesTo(i.exerciseId()));
        int rounds = any ? Math.max(1, s.rounds() + a.setsDelta()) : s.rounds();
        List<ExerciseWork> items = s.items().stream()
                .map(i -> adjust(i, a, weekWaivers, rounds - s.rounds()))
                .toList();
        return new Superset(rounds, s.rest(), items, s.location(), plus(s.waivers(), weekWaivers));
    }

    private static ExerciseWork adjust(ExerciseWork e, Adjustment a, List<Waiver> weekWaivers, int setsDelta) {
        boolean applies = a.appliesTo(e.exerciseId());
        List<SetPrescription> sets = new ArrayList<>(e.sets());
        resize(sets, setsDelta);
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
