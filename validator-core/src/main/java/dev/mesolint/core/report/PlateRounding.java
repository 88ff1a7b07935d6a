package dev.mesolint.core.report;

import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import java.util.Optional;

/**
 * Rounds a worked-out weight to what can be loaded on a bar: a multiple of the plate increment (the smallest step the
 * lifter's plates allow, 2.5 kg with a pair of 1.25 kg plates).
 *
 * <p>The rule, common practice in coaching: round to the nearest step, except where overshooting matters, which is
 * under an athlete's load cap and at near-maximal loads (90% of 1RM or more): there the weight goes down to the step
 * below, so a rounded load never exceeds the share written or allowed. 70% of 142.5 kg (99.75 kg) under a 70% cap is
 * 97.5 kg, not 100 kg (70.2%).
 *
 * @param step the increment, in {@code unit}
 */
public record PlateRounding(double step, LoadUnit unit) {
    /** The share of 1RM from which a load counts as near-maximal and is rounded down. */
    public static final double NEAR_MAXIMAL = 0.90;
    /** Guards floor and round against binary fractions: 97.5 / 2.5 must be 39, not 38.99999. */
    private static final double EPSILON = 1e-9;

    public PlateRounding {
        if (!(step > 0)) {
            throw new IllegalArgumentException("plate increment must be above zero, was " + step);
        }
    }

    /** The default for a programme's unit: 2.5 kg, or 5 lb (a pair of the smallest common plates). */
    public static PlateRounding defaultFor(LoadUnit unit) {
        return unit == LoadUnit.LB ? new PlateRounding(5, LoadUnit.LB) : new PlateRounding(2.5, LoadUnit.KG);
    }

    /**
     * The increment a programme uses: its own {@code plate-increment}, else the repository's, else the default for
     * its unit; converted to the programme's unit.
     */
    public static PlateRounding of(Optional<Load.Absolute> programme, Optional<Load.Absolute> repository,
            LoadUnit units) {
        Optional<Load.Absolute> chosen = programme.or(() -> repository);
        return chosen.map(step -> new PlateRounding(step.in(units), units)).orElseGet(() -> defaultFor(units));
    }

    /** Why a weight was rounded the way it was. */
    public enum Direction {
        /** To the nearest step. */
        NEAREST,
        /** Down, because an athlete's cap applies to the set. */
        DOWN_UNDER_CAP,
        /** Down, because the load is near-maximal. */
        DOWN_NEAR_MAXIMAL
    }

    /** A rounded weight and how it was rounded. */
    public record Rounded(double weight, Direction direction) {
        public boolean down() {
            return direction != Direction.NEAREST;
        }
    }

    /**
     * Rounds {@code weight} (in {@link #unit()}) for a set at {@code shareOfMax} of 1RM.
     *
     * @param capped true when an athlete's load cap applies to the set's exercise
     */
    public Rounded round(double weight, double shareOfMax, boolean capped) {
        if (capped) {
            return new Rounded(down(weight), Direction.DOWN_UNDER_CAP);
        }
        if (shareOfMax >= NEAR_MAXIMAL - EPSILON) {
            return new Rounded(down(weight), Direction.DOWN_NEAR_MAXIMAL);
        }
        return new Rounded(nearest(weight), Direction.NEAREST);
    }

    /** The nearest multiple of the step; halves go up (106.875 kg with 2.5 kg steps is 107.5 kg). */
    public double nearest(double weight) {
        return clean(Math.floor(weight / step + 0.5 + EPSILON) * step);
    }

    /** The multiple of the step at or below {@code weight}; a weight below one step is left as it is. */
    public double down(double weight) {
        double steps = Math.floor(weight / step + EPSILON);
        return steps < 1 ? clean(weight) : clean(steps * step);
    }

    private static double clean(double v) {
        return Math.round(v * 1000) / 1000.0;
    }

    /** The increment as written in the report: {@code 2.5 kg}. */
    public String label() {
        return Html.weight(step) + " " + unit.symbol();
    }
}
