package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.rule.RuleContext;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Which exercises make up a muscle's hard sets, for messages that say where to cut or add. */
final class Contributions {
    private Contributions() {
    }

    /** Credited hard sets per exercise for {@code muscle}, in the order done. */
    static Map<String, Double> of(RuleContext context, List<SessionMetrics> sessions, Muscle muscle) {
        Map<String, Double> credited = new LinkedHashMap<>();
        for (SessionMetrics session : sessions) {
            for (SetMetrics set : session.sets()) {
                Exercise exercise = context.exerciseOrNull(set.exerciseId());
                double credit = exercise == null ? 0.0 : exercise.credit(muscle);
                if (set.hard() && credit > 0) {
                    credited.merge(set.exerciseId(), credit, Double::sum);
                }
            }
        }
        return credited;
    }

    /** {@code barbell-bench-press 4, cable-chest-fly 4}. */
    static String text(Map<String, Double> credited) {
        List<String> parts = new ArrayList<>();
        credited.forEach((id, sets) -> parts.add(id + " " + Texts.num(sets)));
        return String.join(", ", parts);
    }

    /** The exercise giving the most, for a concrete fix. */
    static String largest(Map<String, Double> credited) {
        return credited.entrySet().stream().max(Map.Entry.comparingByValue()).map(Map.Entry::getKey).orElse("");
    }
}
