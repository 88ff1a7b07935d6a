package dev.mesolint.core.model;

import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import java.util.Optional;
import java.util.OptionalDouble;

/** Turns a written load into a share of 1RM and a weight, using the athlete's 1RM where the programme gives one. */
final class LoadResolver {

    private LoadResolver() {
    }

    static ResolvedLoad resolve(Optional<Load> load, Optional<Load.Absolute> oneRepMax, LoadUnit units) {
        if (load.isEmpty()) {
            return ResolvedLoad.NONE;
        }
        if (load.get() instanceof Load.Relative relative) {
            OptionalDouble weight = oneRepMax.isPresent()
                    ? OptionalDouble.of(relative.fraction() * oneRepMax.get().in(units))
                    : OptionalDouble.empty();
            return new ResolvedLoad(OptionalDouble.of(relative.fraction()), weight);
        }
        Load.Absolute absolute = (Load.Absolute) load.get();
        OptionalDouble fraction = oneRepMax.isPresent()
                ? OptionalDouble.of(absolute.in(oneRepMax.get().unit()) / oneRepMax.get().amount())
                : OptionalDouble.empty();
        return new ResolvedLoad(fraction, OptionalDouble.of(absolute.in(units)));
    }
}
