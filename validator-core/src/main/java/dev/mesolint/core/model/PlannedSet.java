package dev.mesolint.core.model;

import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.WorkItem;

/**
 * A working set in the order it is done in a session, with the time around it.
 *
 * @param item               the work item the set belongs to: the exercise entry, or the superset holding it
 * @param setupSecondsBefore changeover and warm-up sets before this set (only on a work item's first set)
 * @param restAfterSeconds   rest after this set; 0 for the session's last set
 * @param restWritten        whether the programme wrote that rest (else it is a default of the model)
 * @param round              1-based superset round, or 0 outside a superset
 */
record PlannedSet(WorkItem item, ExerciseWork work, SetPrescription set, double setupSecondsBefore,
        double restAfterSeconds, boolean restWritten, int round) {
}
