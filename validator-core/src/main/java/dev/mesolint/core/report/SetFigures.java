package dev.mesolint.core.report;

/**
 * One working set's stimulus.
 *
 * @param exercise           the exercise id
 * @param line               where the set is written
 * @param stimulus           before the fatigue discount
 * @param discountedStimulus after the fatigue accumulated earlier in the session
 */
public record SetFigures(String exercise, int line, double stimulus, double discountedStimulus) {

    public SetFigures {
        if (discountedStimulus > stimulus + 1e-9) {
            throw new IllegalArgumentException("the discounted stimulus of " + exercise + " at line " + line
                    + " exceeds its raw stimulus");
        }
    }
}
