package dev.mesolint.core.model;

import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.WorkItem;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The rests of a session that more work follows, read from the same session plan the model's clock runs on, so the
 * rest rules and the model's figures agree on every superset.
 *
 * <p>Straight sets: the rest after each set, including the last set when another work item follows. A superset
 * round: every item gets the round's rest plus the changeovers between the items (the time doing the other items
 * is not counted, so the figure errs short); the last round counts when another work item follows.
 */
public final class SessionRests {
    private SessionRests() {
    }

    public static List<RestGap> of(Session session, ModelParameters params) {
        List<PlannedSet> plan = new SessionPlanner(params).plan(session);
        List<RestGap> gaps = new ArrayList<>();
        int start = 0;
        int position = 0;
        while (start < plan.size()) {
            PlannedSet first = plan.get(start);
            int end = endOfStep(plan, start);
            if (end == plan.size()) {
                break; // the session's last set or round: no more work follows
            }
            position = start > 0 && plan.get(start - 1).item() == first.item() ? position + 1 : 1;
            Optional<WorkItem> following = plan.get(end).item() == first.item()
                    ? Optional.empty() : Optional.of(plan.get(end).item());
            List<PlannedSet> step = plan.subList(start, end);
            PlannedSet closing = step.get(step.size() - 1);
            double changeovers = step.subList(0, step.size() - 1).stream()
                    .mapToDouble(PlannedSet::restAfterSeconds).sum();
            OptionalDouble seconds = closing.restWritten()
                    ? OptionalDouble.of(closing.restAfterSeconds() + changeovers) : OptionalDouble.empty();
            Optional<Superset> superset = first.item() instanceof Superset s ? Optional.of(s) : Optional.empty();
            for (PlannedSet p : step) {
                gaps.add(new RestGap(p.work(), p.set(), superset, position, following, seconds, changeovers));
            }
            start = end;
        }
        return List.copyOf(gaps);
    }

    /** The end (exclusive) of the step starting at {@code start}: one straight set, or one superset round. */
    private static int endOfStep(List<PlannedSet> plan, int start) {
        PlannedSet first = plan.get(start);
        int end = start + 1;
        while (first.round() > 0 && end < plan.size() && plan.get(end).item() == first.item()
                && plan.get(end).round() == first.round()) {
            end++;
        }
        return end;
    }
}
