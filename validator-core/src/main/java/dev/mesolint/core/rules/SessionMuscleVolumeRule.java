package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.MuscleSession;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Places;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.List;
import java.util.Map;

/** One session gives a muscle more hard sets than a session can put to use. */
public final class SessionMuscleVolumeRule implements Rule {
    public static final String ID = "session-muscle-volume";
    static final String MAX_SETS = "max-sets";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "No muscle gets more than {max-sets} credited hard sets in one session.", Severity.WARNING,
            RuleMetadata.Category.VOLUME,
            List.of(RuleParameter.number(MAX_SETS, 10, 4, 30,
                    "Most credited hard sets for one muscle in one session (prime mover 1, synergist 0.5).")),
            "More sets give more growth, but with diminishing returns, and within one session the returns fall "
                    + "fastest: each further set of the same muscle starts more fatigued and adds less. Past about "
                    + "ten hard sets for one muscle in a session, the extra sets mostly add fatigue and time; the "
                    + "same sets spread over two sessions of the week are worth more. Sets are credited 1 for a "
                    + "prime mover and 0.5 for a synergist, so presses also count for the triceps.",
            "Pelland et al. 2024 (diminishing returns; fractional 0.5 counting of indirect sets); Schoenfeld, Ogborn "
                    + "& Krieger 2017, J Sports Sci 35(11):1073-1082; the limit of 10 per session is common practice");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        double max = context.param(MAX_SETS);
        Occurrences found = new Occurrences();
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                for (Map.Entry<Muscle, MuscleSession> e : session.muscles().entrySet()) {
                    double sets = e.getValue().hardSets();
                    if (sets <= max) {
                        continue;
                    }
                    Muscle muscle = e.getKey();
                    Map<String, Double> credited = Contributions.of(context, List.of(session), muscle);
                    double over = Math.ceil(sets - max);
                    Places.addSession(context, found, week, session, Places.session(session) + ": "
                            + Texts.sets(sets) + " for the " + Texts.muscle(muscle) + " ("
                            + Contributions.text(credited) + "), over the " + context.shown(MAX_SETS)
                            + " per session the " + context.profileName() + " profile allows",
                            "move " + Texts.num(over) + " of the " + Texts.muscle(muscle)
                                    + " sets to another day, e.g. from " + Contributions.largest(credited),
                            Facts.about(Subject.muscle(Texts.muscle(muscle))).measured(sets, max, "sets"));
                }
            }
        }
        found.report(context);
    }
}
