package dev.mesolint.core.review;

/**
 * A profile limit that the change crosses, in either direction.
 *
 * @param week    the week the figure belongs to
 * @param subject the muscle, or the session ({@code day 3 (Lower)})
 * @param measure what is measured: {@code weekly hard sets}, {@code session minutes}
 * @param limit   the limit crossed, as a number in the measure's unit
 * @param kind    which limit and which way
 */
public record LimitCrossing(int week, String subject, String measure, double before, double after, double limit,
        Kind kind) {

    /** Which way the change crosses which limit. */
    public enum Kind {
        NOW_ABOVE_CAP("now above the cap"), NOW_BELOW_FLOOR("now below the floor"),
        BACK_UNDER_CAP("back under the cap"), BACK_OVER_FLOOR("back at or above the floor"),
        NOW_OVER_BUDGET("now over the session budget"), BACK_WITHIN_BUDGET("back within the session budget");

        private final String words;

        Kind(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }

        /** True when the change moves the figure out of bounds (a reviewer's concern), false when back in. */
        public boolean worse() {
            return this == NOW_ABOVE_CAP || this == NOW_BELOW_FLOOR || this == NOW_OVER_BUDGET;
        }
    }
}
