package dev.mesolint.core.model;

/**
 * Diminishing returns, in two steps. Within a session, effective sets level off towards a plateau:
 * g(x) = x / (1 + (x/c)^m)^(1/m), x the session's summed fatigue-adjusted stimulus (about x for small x, never above
 * c). Over the week, the sessions' effective sets add up and W = (sum g)^p.
 *
 * <p>W(1) = 1, so the weekly stimulus stays in units of one fresh hard set. A power law has no scale: six times the
 * sets give 6^p = 2 times the stimulus (p = ln 2 / ln 6) at one session a week or five, which is what the
 * dose-response data say; summing the sets over the week before the curve is what makes the same weekly sets
 * split over more sessions give about the same stimulus (Schoenfeld, Grgic &amp; Krieger 2019). Both steps rise
 * with x, so an added set never lowers the result.
 */
public final class DoseResponse {
    private final double plateau;
    private final double sharpness;
    private final double exponent;

    public DoseResponse(ModelParameters params) {
        this.plateau = params.sessionPlateauSets();
        this.sharpness = params.sessionPlateauSharpness();
        this.exponent = params.weeklyDoseExponent();
    }

    /** A session's effective sets, g(x), from its summed stimulus x. */
    public double sessionEffective(double summedStimulus) {
        requireNonNegative(summedStimulus);
        return summedStimulus / Math.pow(1 + Math.pow(summedStimulus / plateau, sharpness), 1 / sharpness);
    }

    /** The weekly stimulus, W = (sum of the sessions' effective sets)^p. */
    public double weeklyStimulus(double effectiveSets) {
        requireNonNegative(effectiveSets);
        return Math.pow(effectiveSets, exponent);
    }

    private static void requireNonNegative(double value) {
        if (value < 0) {
            throw new IllegalArgumentException("stimulus cannot be negative, was " + value);
        }
    }
}
