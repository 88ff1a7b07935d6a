package dev.mesolint.core.model;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The outcome of comparing a set's load, reps and stated effort, with the numbers a finding needs.
 *
 * @param repsToFailure reps the load allows to failure, R(L); empty without a share of 1RM
 * @param impliedRir    R(L) minus the reps prescribed (midpoint of a range); empty without R(L)
 * @param statedRir     stated reps in reserve (RIR, or 10 - RPE; midpoint of a range); empty when none is stated
 * @param tolerance     reps of disagreement accepted
 */
public record EffortAgreement(AgreementStatus status, OptionalDouble repsToFailure, OptionalDouble impliedRir,
        OptionalDouble statedRir, double tolerance) {

    public EffortAgreement {
        Objects.requireNonNull(status, "status");
    }

    public static EffortAgreement notChecked(double tolerance) {
        return new EffortAgreement(AgreementStatus.NOT_CHECKED, OptionalDouble.empty(), OptionalDouble.empty(),
                OptionalDouble.empty(), tolerance);
    }

    /** True for the statuses the effort-conflict rule reports. */
    public boolean isConflict() {
        return status != AgreementStatus.NOT_CHECKED && status != AgreementStatus.AGREE;
    }
}
