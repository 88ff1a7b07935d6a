package dev.mesolint.core.model;

/** The closed range a numeric model parameter may take. */
public record ParameterBound(double min, double max) {

    public ParameterBound {
        if (!(min <= max)) {
            throw new IllegalArgumentException("min " + min + " above max " + max);
        }
    }

    /** True for a value in [min, max]; never for NaN. */
    public boolean contains(double value) {
        return value >= min && value <= max;
    }
}
