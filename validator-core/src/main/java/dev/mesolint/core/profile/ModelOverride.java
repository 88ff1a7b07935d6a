package dev.mesolint.core.profile;

import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.model.NamedModelParameters;
import dev.mesolint.core.source.Location;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/**
 * The training-model parameters one profile sets in its {@code model:} block, each already checked against its
 * bounds, and where the block is written (for a problem that only their combination shows).
 *
 * @param values parameter name to a {@link Double}, {@link Integer} or {@link dev.mesolint.core.model.OneRepMaxRelation}
 */
public record ModelOverride(Map<String, Object> values, Optional<Location> at) {
    /** A profile without a {@code model:} block. */
    public static final ModelOverride NONE = new ModelOverride(Map.of(), Optional.empty());

    public ModelOverride {
        values = Map.copyOf(new LinkedHashMap<>(values));
    }

    /** {@code base} with these values; an {@link IllegalArgumentException} when they do not fit together. */
    public ModelParameters applyTo(ModelParameters base) {
        return values.isEmpty() ? base : NamedModelParameters.with(base, values);
    }
}
