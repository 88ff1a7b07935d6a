package dev.mesolint.core.model;

import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.WorkItem;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The rest an exercise gets after one of its sets before its next set, or before the next work item after its last
 * set, as the session plan of docs/model.md runs it.
 *
 * @param work        the exercise entry (a superset item for a superset)
 * @param set         the set the rest follows (for a superset, the item's set of that round)
 * @param superset    the superset the rest belongs to; empty for straight sets
 * @param position    1-based set number of straight sets, or the superset round
 * @param following   the next work item when this rest leads to it (after the last set or round), else empty
 * @param seconds     the rest: the set's own rest for straight sets; for a superset, the round's rest plus the
 *                    changeovers between its items; empty when the rest that decides it is not written (never a
 *                    default of the model)
 * @param changeoverSeconds the changeovers within the round included in {@code seconds} (0 for straight sets);
 *                    unwritten ones count at the model's {@code supersetChangeoverSeconds}
 */
public record RestGap(ExerciseWork work, SetPrescription set, Optional<Superset> superset, int position,
        Optional<WorkItem> following, OptionalDouble seconds, double changeoverSeconds) {
}
