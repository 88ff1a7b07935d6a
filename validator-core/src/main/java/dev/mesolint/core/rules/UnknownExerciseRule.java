package dev.mesolint.core.rules;

import dev.mesolint.core.rule.Edits;
import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/** Every exercise id resolves in the catalogue; suggests the closest ids. */
public final class UnknownExerciseRule implements Rule {
    public static final String ID = "unknown-exercise";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Every exercise id resolves in the catalogue (built-in, repository files or the programme's own entries).",
            Severity.ERROR, RuleMetadata.Category.STRUCTURE, List.of(),
            "Every figure the checks compute (hard sets per muscle, rest needs, region loads) comes from the "
                    + "catalogue entry of the exercise. An unknown id would silently drop the exercise from the "
                    + "volume counts, so it is an error, with the nearest known ids as suggestions.",
            "common practice");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        // Expanded weeks repeat the same written entry; report each written place once.
        Set<String> reported = new HashSet<>();
        for (Week week : context.programme().weeks()) {
            week.sessions().forEach(session -> session.work().forEach(item -> check(context, item, reported)));
        }
        context.programme().athlete().constraints().forEach(c -> c.avoid().stream()
                .filter(id -> context.exerciseOrNull(id) == null)
                .forEach(id -> context.report(c.location(), List.of(), context.severity(),
                        "constraint names unknown exercise '" + id + "'" + suggestion(context, id),
                        fix(context, id), Facts.about(Subject.exercise(id)))));
    }

    private static void check(RuleContext context, WorkItem item, Set<String> reported) {
        if (item instanceof Superset s) {
            s.items().forEach(i -> check(context, i, reported));
            return;
        }
        ExerciseWork work = (ExerciseWork) item;
        if (context.exerciseOrNull(work.exerciseId()) == null && reported.add(work.exerciseLocation().pointer())) {
            List<String> closest = context.catalogue().closest(work.exerciseId(), 1);
            Facts facts = Facts.about(Subject.exercise(work.exerciseId()));
            context.report(work.exerciseLocation(), work.waivers(), context.severity(),
                    "unknown exercise '" + work.exerciseId() + "'" + suggestion(context, work.exerciseId()),
                    fix(context, work.exerciseId()), closest.isEmpty() ? facts
                            : facts.withEdit(Edits.set(work.exerciseLocation(), "exercise", closest.get(0))
                                    .orElse(null)));
        }
    }

    private static String suggestion(RuleContext context, String id) {
        List<String> closest = context.catalogue().closest(id, 3);
        return closest.isEmpty() ? "" : "; closest ids: " + String.join(", ", closest);
    }

    private static String fix(RuleContext context, String id) {
        List<String> closest = context.catalogue().closest(id, 1);
        return closest.isEmpty()
                ? "add a local entry under exercises: with this id, or list the catalogue with 'mesolint catalogue'"
                : "exercise: " + closest.get(0) + ", or add a local entry under exercises:";
    }
}
