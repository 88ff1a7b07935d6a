package dev.mesolint.core.model;

import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.value.Durations;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Puts a session's sets in the order they are done, with rest and set-up times.
 *
 * <p>Exercises run set after set, each resting its own rest (default when unstated). A superset runs round by round:
 * item 1 set 1, item 2 set 1, rest, item 1 set 2, ... Within a round the sets' own rest is the changeover
 * (default {@code supersetChangeoverSeconds}); after the round's last item comes the superset's rest (default rest
 * when unstated). Each exercise costs a changeover and its warm-up sets before its work item starts.
 */
final class SessionPlanner {
    private final ModelParameters params;

    SessionPlanner(ModelParameters params) {
        this.params = params;
    }

    /** The session's sets in the order they are done; a new list, the caller's to keep. */
    List<PlannedSet> plan(Session session) {
        List<PlannedSet> planned = new ArrayList<>(4 * session.work().size());
        RestSeconds rests = new RestSeconds();
        for (WorkItem item : session.work()) {
            if (item instanceof ExerciseWork work) {
                planExercise(work, planned, rests);
            } else {
                planSuperset((Superset) item, planned, rests);
            }
        }
        if (!planned.isEmpty()) {
            PlannedSet last = planned.remove(planned.size() - 1);
            planned.add(new PlannedSet(last.item(), last.work(), last.set(), last.setupSecondsBefore(), 0,
                    last.restWritten(), last.round()));
        }
        return planned;
    }

    private void planExercise(ExerciseWork work, List<PlannedSet> planned, RestSeconds rests) {
        double setup = setupSeconds(work);
        for (SetPrescription set : work.sets()) {
            double rest = rests.of(set.rest(), params.defaultRestSeconds());
            planned.add(new PlannedSet(work, work, set, setup, rest, set.rest().isPresent(), 0));
            setup = 0;
        }
    }

    private void planSuperset(Superset superset, List<PlannedSet> planned, RestSeconds rests) {
        double setup = superset.items().stream().mapToDouble(this::setupSeconds).sum();
        // Each item should hold one set per round; every written set is kept even when the counts differ.
        int rounds = 0;
        for (ExerciseWork item : superset.items()) {
            rounds = Math.max(rounds, item.sets().size());
        }
        double roundRest = rests.of(superset.rest(), params.defaultRestSeconds());
        for (int round = 0; round < rounds; round++) {
            int lastItem = lastItemWithSet(superset, round);
            for (int i = 0; i <= lastItem; i++) {
                ExerciseWork item = superset.items().get(i);
                if (round >= item.sets().size()) {
                    continue;
                }
                SetPrescription set = item.sets().get(round);
                boolean roundEnd = i == lastItem;
                double rest = roundEnd ? roundRest
                        : rests.of(set.rest(), params.supersetChangeoverSeconds());
                boolean written = roundEnd ? superset.rest().isPresent() : set.rest().isPresent();
                planned.add(new PlannedSet(superset, item, set, setup, rest, written, round + 1));
                setup = 0;
            }
        }
    }

    private static int lastItemWithSet(Superset superset, int round) {
        int last = -1;
        for (int i = 0; i < superset.items().size(); i++) {
            if (round < superset.items().get(i).sets().size()) {
                last = i;
            }
        }
        return last;
    }

    /**
     * Written rests in seconds, the last one converted kept: an entry's sets share one rest value, so most sets
     * convert none. One per plan.
     */
    private static final class RestSeconds {
        private Duration last;
        private double lastSeconds;

        /** The rest in seconds, else the default (without boxing it per set). */
        double of(Optional<Duration> rest, double otherwise) {
            if (rest.isEmpty()) {
                return otherwise;
            }
            if (rest.get() != last) {
                last = rest.get();
                lastSeconds = Durations.seconds(last);
            }
            return lastSeconds;
        }
    }

    private double setupSeconds(ExerciseWork work) {
        return 60 * (params.exerciseChangeoverMinutes() + work.warmUpSets() * params.warmUpSetMinutes());
    }
}
