package dev.mesolint.core.model;

import java.util.OptionalDouble;

/**
 * A set's load in the two forms the model uses.
 *
 * @param fraction share of 1RM, for effort; empty for a weight without a known 1RM
 * @param absolute weight in the programme's unit, for volume load; empty for a share of an unknown 1RM
 */
public record ResolvedLoad(OptionalDouble fraction, OptionalDouble absolute) {
    public static final ResolvedLoad NONE = new ResolvedLoad(OptionalDouble.empty(), OptionalDouble.empty());
}
