package dev.mesolint.core.model;

import dev.mesolint.core.value.RirRange;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Compares what a set's load allows with its reps and stated effort.
 *
 * <p>Feasibility reads the hardest corner of the prescription (top of the rep range, least reserve stated), since a
 * lifter who hits that corner must be able to; the mislabel check reads the midpoints the model uses.
 */
final class EffortAgreementCheck {
    private final double tolerance;
    /** Immutable, so every set without a check shares it. */
    private final EffortAgreement notChecked;

    EffortAgreementCheck(double tolerance) {
        this.tolerance = tolerance;
        this.notChecked = EffortAgreement.notChecked(tolerance);
    }

    /**
     * @param reps          reps the model uses (midpoint)
     * @param repsUpper     top of the rep range
     * @param repsToFailure R(L); empty without a known share of 1RM
     * @param stated        stated reserve: RIR, else RPE read as RIR; empty when neither is given
     * @param rpeAsRir      RPE read as RIR, when both RIR and RPE are stated
     */
    EffortAgreement check(double reps, double repsUpper, OptionalDouble repsToFailure, Optional<RirRange> stated,
            OptionalDouble rpeAsRir, boolean amrap) {
        OptionalDouble statedMid = stated.isPresent() ? OptionalDouble.of(stated.get().midpoint()) : OptionalDouble.empty();
        if (repsToFailure.isPresent() && !amrap) {
            double r = repsToFailure.getAsDouble();
            OptionalDouble implied = OptionalDouble.of(r - reps);
            return new EffortAgreement(loadStatus(reps, repsUpper, r, stated), repsToFailure, implied, statedMid,
                    tolerance);
        }
        if (stated.isPresent() && rpeAsRir.isPresent()) {
            boolean differ = Math.abs(stated.get().midpoint() - rpeAsRir.getAsDouble()) > tolerance;
            return new EffortAgreement(differ ? AgreementStatus.RIR_RPE_DIFFER : AgreementStatus.AGREE,
                    OptionalDouble.empty(), OptionalDouble.empty(), statedMid, tolerance);
        }
        return notChecked;
    }

    private AgreementStatus loadStatus(double reps, double repsUpper, double repsToFailure, Optional<RirRange> stated) {
        if (repsUpper - repsToFailure > tolerance) {
            return AgreementStatus.INFEASIBLE;
        }
        if (stated.isEmpty()) {
            return AgreementStatus.AGREE;
        }
        if (repsUpper + stated.get().min() - repsToFailure > tolerance) {
            return AgreementStatus.HARDER_THAN_STATED;
        }
        if (repsToFailure - reps - stated.get().midpoint() > tolerance) {
            return AgreementStatus.MISLABELLED;
        }
        return AgreementStatus.AGREE;
    }
}
