package dev.mesolint.core.model;

/**
 * Diminishing returns within a session: S(x) = ln(1 + x/a) / ln(1 + 1/a), x the summed fatigue-adjusted stimulus.
 *
 * <p>S(1) = 1, so the result stays in units of one fresh hard set; with a = 0.25, six fresh hard sets give
 * exactly 2 (1 + 6/a = (1 + 1/a)^2 when a = 1/4): doubling the growth of one set takes five more. S rises with x
 * and bends down (concave), so an added set never lowers the result.
 */
public final class DoseResponse {
    private final double scale;
    private final double norm;

    public DoseResponse(ModelParameters params) {
        this.scale = params.diminishingReturnsScale();
        this.norm = Math.log1p(1 / scale);
    }

    public double sessionStimulus(double summedStimulus) {
        if (summedStimulus < 0) {
            throw new IllegalArgumentException("stimulus cannot be negative, was " + summedStimulus);
        }
        return Math.log1p(summedStimulus / scale) / norm;
    }
}
