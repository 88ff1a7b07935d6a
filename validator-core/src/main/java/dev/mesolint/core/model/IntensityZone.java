package dev.mesolint.core.model;

import java.util.OptionalDouble;

/**
 * The reps and sets of one lift in one session that fall in one intensity zone: shares of 1RM from {@code from}
 * (inclusive) up to {@code below} (exclusive; empty for the open top zone).
 *
 * @param index 0 for the zone under the first bound, then 1 to 4 for the zones of {@code intensityZone1From} to
 *              {@code intensityZone4From}
 */
public record IntensityZone(int index, double from, OptionalDouble below, int sets, double reps) {
}
