package dev.mesolint.core.model;

import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import dev.mesolint.core.value.RepTarget;
import dev.mesolint.core.value.RirRange;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Resolves a working set to reps performed and reps in reserve.
 *
 * <p>Stated effort wins over the load: a lifter told "RIR 2" adjusts the weight to leave two reps, so AMRAP, then
 * RIR, then RPE, then the load give r. Disagreements between them are reported in {@link Effort#agreement()}.
 */
public final class EffortResolver {
    /** A 1RM test without a load is a single at 100% of the 1RM being tested. */
    private static final Optional<Load> TEST_LOAD = Optional.of(new Load.Relative(1.0));

    private final ModelParameters params;
    private final EffortAgreementCheck agreementCheck;

    public EffortResolver(ModelParameters params) {
        this.params = params;
        this.agreementCheck = new EffortAgreementCheck(params.effortToleranceReps());
    }

    /**
     * @param exerciseId the exercise, to look up the athlete's 1RM for an absolute load
     * @param units      the programme's unit, for the absolute load
     */
    public Effort resolve(SetPrescription set, String exerciseId, Athlete athlete, LoadUnit units) {
        return resolve(set, exerciseId, false, athlete, units);
    }

    /**
     * @param ballistic a ballistic or Olympic lift: a set ends with a technical miss, so no reps in reserve are
     *                  inferred from its load (only a stated RIR or RPE gives its effort)
     */
    public Effort resolve(SetPrescription set, String exerciseId, boolean ballistic, Athlete athlete, LoadUnit units) {
        Optional<Load> written = set.test() && set.load().isEmpty() ? TEST_LOAD : set.load();
        // without a load there is nothing to look the athlete's 1RM up for
        ResolvedLoad load = written.isEmpty() ? ResolvedLoad.NONE
                : LoadResolver.resolve(written, athlete.oneRepMax(exerciseId), units);
        OptionalDouble repsToFailure = load.fraction().isPresent() && !ballistic
                ? OptionalDouble.of(params.oneRepMaxRelation().repsToFailure(load.fraction().getAsDouble()))
                : OptionalDouble.empty();
        RepTarget target = set.reps();
        // 5+ is an AMRAP with a floor: at least the stated minimum
        double reps = target.amrap() ? Math.max(target.min(), repsToFailure.orElse(params.amrapDefaultReps()))
                : target.midpoint();
        double repsUpper = target.amrap() ? reps : target.max();

        OptionalDouble rpeAsRir = set.rpe().isPresent()
                ? OptionalDouble.of(set.rpe().get().repsInReserve())
                : OptionalDouble.empty();
        Optional<RirRange> stated = set.rir().isPresent() ? set.rir()
                : set.rpe().map(rpe -> RirRange.of(rpe.repsInReserve()));

        EffortSource source;
        OptionalDouble rir;
        if (target.amrap()) {
            source = EffortSource.AMRAP;
            rir = OptionalDouble.of(0);
        } else if (set.rir().isPresent()) {
            source = EffortSource.RIR;
            rir = OptionalDouble.of(set.rir().get().midpoint());
        } else if (set.rpe().isPresent()) {
            source = EffortSource.RPE;
            rir = rpeAsRir;
        } else if (repsToFailure.isPresent()) {
            source = EffortSource.LOAD;
            // A load too heavy for the reps ends the set at failure: no negative reserve.
            rir = OptionalDouble.of(Math.max(0, repsToFailure.getAsDouble() - reps));
        } else {
            source = EffortSource.UNKNOWN;
            rir = OptionalDouble.empty();
        }
        EffortAgreement agreement = agreementCheck.check(reps, repsUpper, repsToFailure, stated,
                set.rir().isPresent() ? rpeAsRir : OptionalDouble.empty(), target.amrap());
        return new Effort(source, reps, repsUpper, rir, load.fraction(), load.absolute(), agreement);
    }
}
