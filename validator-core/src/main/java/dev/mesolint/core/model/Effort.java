package dev.mesolint.core.model;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * A working set resolved to the reps performed and the reps left in reserve.
 *
 * @param reps          reps performed, n: the midpoint of a range; for AMRAP, R(L) or the documented default
 * @param repsUpper     the top of the rep range (feasibility uses it); equals {@code reps} for AMRAP
 * @param rir           reps in reserve, r; empty when nothing states the effort
 * @param loadFraction  the load as a share of 1RM; empty when unknown
 * @param absoluteLoad  the load in the programme's unit; empty when unknown
 */
public record Effort(EffortSource source, double reps, double repsUpper, OptionalDouble rir,
        OptionalDouble loadFraction, OptionalDouble absoluteLoad, EffortAgreement agreement) {

    public Effort {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(agreement, "agreement");
        if (rir.isPresent() == (source == EffortSource.UNKNOWN)) {
            throw new IllegalArgumentException("rir is known exactly when the source is not UNKNOWN");
        }
    }

    public boolean known() {
        return rir.isPresent();
    }
}
