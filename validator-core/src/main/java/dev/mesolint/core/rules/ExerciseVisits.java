package dev.mesolint.core.rules;

import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.programme.WorkItem;

/** Walks every exercise of the expanded programme, superset items included, in programme order. */
final class ExerciseVisits {
    private ExerciseVisits() {
    }

    /** What a rule does with each exercise it meets. */
    @FunctionalInterface
    interface Visitor {
        /** @param superset the superset the exercise is an item of, or null for straight sets */
        void visit(Week week, Session session, ExerciseWork work, Superset superset);
    }

    static void each(Programme programme, Visitor visitor) {
        for (Week week : programme.weeks()) {
            for (Session session : week.sessions()) {
                for (WorkItem item : session.work()) {
                    if (item instanceof Superset s) {
                        s.items().forEach(i -> visitor.visit(week, session, i, s));
                    } else {
                        visitor.visit(week, session, (ExerciseWork) item, null);
                    }
                }
            }
        }
    }
}
