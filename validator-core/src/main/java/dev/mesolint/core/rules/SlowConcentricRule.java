package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.value.Tempo;
import java.util.List;

/** A tempo that slows the lifting phase on purpose. */
public final class SlowConcentricRule implements Rule {
    public static final String ID = "slow-concentric";
    static final String SLOW_LIFTING = "slow-lifting";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "A tempo whose lifting phase is {slow-lifting} or slower on purpose: it lowers effort, it does not raise "
                    + "stimulus.",
            Severity.INFO, RuleMetadata.Category.EFFORT,
            List.of(RuleParameter.seconds(SLOW_LIFTING, 4, 2, 10,
                    "Lifting phases this long or longer are reported.")),
            "A deliberately slow lifting phase forces a lighter load and spreads the effort over fewer, easier "
                    + "reps; it feels hard but does not add growth over lifting with control at the speed the load "
                    + "allows. Slow lowering phases and pauses are not reported: the rule reads only the third "
                    + "number of the tempo (lowering-pause-lifting-pause). Slow lifting as a teaching or "
                    + "rehabilitation tool is a valid choice: waive the finding with that reason.",
            "Schoenfeld, Ogborn & Krieger 2015 (Sports Med 45(4):577-585), from memory: rep durations from 0.5 to "
                    + "8 s gave similar hypertrophy, very slow reps may be inferior");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        double limit = context.param(SLOW_LIFTING);
        Occurrences found = new Occurrences();
        ExerciseVisits.each(context.programme(), (week, session, work, superset) -> {
            for (SetPrescription set : work.sets()) {
                if (set.tempo().isEmpty() || set.tempo().get().explosiveLift()
                        || set.tempo().get().lifting() < limit) {
                    continue;
                }
                Tempo t = set.tempo().get();
                Tempo brisk = new Tempo(t.lowering(), t.bottomPause(), 1, t.topPause(), false);
                found.add(week, session, work.exerciseId(), context.fieldLocation(set, "tempo"), set.waivers(),
                        new Occurrences.Step(superset == null ? "set" : "round", Integer.toString(set.number())),
                        "tempo " + t + " lifts in " + Texts.seconds(t.lifting()) + ", at or over the "
                                + Texts.seconds(limit) + " the " + context.profileName() + " profile reports: a "
                                + "slow lift lowers the load and the effort per rep, it does not add stimulus",
                        "tempo: " + brisk + " (lift with control, as fast as the load allows)");
            }
        });
        found.report(context);
    }
}
