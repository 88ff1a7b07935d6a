package dev.mesolint.core.model;

/**
 * A published relation between a load, the reps it allows to failure, and the one-repetition maximum (1RM).
 *
 * <p>Each relation is used both ways: {@link #oneRepMax} estimates a 1RM from a set to failure, and
 * {@link #repsToFailure} gives the reps a lifter can do to failure at a share of 1RM. Both agree that 100% of 1RM
 * allows exactly one rep.
 */
public enum OneRepMaxRelation {

    /**
     * Epley 1985: 1RM = w(1 + r/30). The raw formula gives 1.033w for a single rep; by convention one rep returns w,
     * so the inverse, R = 30(1/f - 1), is floored at one rep (the two meet at f = 30/31).
     */
    EPLEY {
        @Override
        double factor(double reps) {
            return reps <= 1 ? 1 : 1 + reps / 30;
        }

        @Override
        public double repsToFailure(double fraction) {
            checkFraction(fraction);
            return fraction > 1 ? 0 : Math.max(1, 30 * (1 / fraction - 1));
        }
    },

    /** Brzycki 1993: 1RM = 36w / (37 - r); inverse R = 37 - 36f. Undefined at 37 reps and beyond. */
    BRZYCKI {
        @Override
        double factor(double reps) {
            if (reps >= 37) {
                throw new IllegalArgumentException("the Brzycki relation is undefined at 37 reps or more, was " + reps);
            }
            return 36 / (37 - reps);
        }

        @Override
        public double repsToFailure(double fraction) {
            checkFraction(fraction);
            return fraction > 1 ? 0 : 37 - 36 * fraction;
        }
    },

    /** The mean of the Epley and Brzycki estimates; its inverse is solved numerically. Undefined from 37 reps. */
    MEAN {
        @Override
        double factor(double reps) {
            return (EPLEY.factor(reps) + BRZYCKI.factor(reps)) / 2;
        }

        @Override
        public double repsToFailure(double fraction) {
            checkFraction(fraction);
            if (fraction > 1) {
                return 0;
            }
            double target = 1 / fraction;
            if (target <= factor(1)) {
                return 1;
            }
            // factor() rises steadily from 1 rep towards infinity at 37: bisection always converges.
            double low = 1;
            double high = 37 - 1e-9;
            for (int i = 0; i < 100; i++) {
                double mid = (low + high) / 2;
                if (factor(mid) < target) {
                    low = mid;
                } else {
                    high = mid;
                }
            }
            return (low + high) / 2;
        }
    };

    /** 1RM as a multiple of the load lifted for {@code reps} reps to failure. */
    abstract double factor(double reps);

    /** Reps to failure possible at {@code fraction} of 1RM; 0 above 1RM (not even one rep). */
    public abstract double repsToFailure(double fraction);

    /**
     * Estimated 1RM from {@code weight} lifted for {@code reps} reps to failure.
     *
     * @throws IllegalArgumentException when reps is below 1, or outside the relation's range
     */
    public double oneRepMax(double weight, double reps) {
        if (!(reps >= 1)) {
            throw new IllegalArgumentException("a set to failure has at least one rep, was " + reps);
        }
        if (!(weight > 0)) {
            throw new IllegalArgumentException("weight must be > 0, was " + weight);
        }
        return weight * factor(reps);
    }

    private static void checkFraction(double fraction) {
        if (!(fraction > 0)) {
            throw new IllegalArgumentException("share of 1RM must be > 0, was " + fraction);
        }
    }
}
