package org.counterpoise.core.robust;

import org.counterpoise.core.error.Checks;

/**
 * How a manufactured or estimated quantity may differ from nominal.
 *
 * @param distribution none, uniform (value = half-width) or normal (value = standard deviation)
 * @param value the half-width or standard deviation, as a fraction of nominal (relative) or in SI
 * @param relative true when value is a fraction of nominal
 */
public record Tolerance(Distribution distribution, double value, boolean relative) {

    /** The kinds of spread. */
    public enum Distribution {
        /** Exactly nominal. */
        NONE,
        /** Uniform between nominal - value and nominal + value. */
        UNIFORM,
        /** Normal with standard deviation value, truncated at 1 % of nominal (a value must stay positive). */
        NORMAL
    }

    /** Exactly nominal. */
    public static final Tolerance NONE = new Tolerance(Distribution.NONE, 0, true);

    /** Validates the record. */
    public Tolerance {
        Checks.present("tolerance.distribution", distribution, "none, uniform or normal");
        Checks.nonNegative("tolerance.value", value);
    }

    /**
     * @param fraction half-width as a fraction
     * @return uniform relative tolerance
     */
    public static Tolerance uniform(double fraction) {
        return new Tolerance(Distribution.UNIFORM, fraction, true);
    }

    /**
     * @param fraction standard deviation as a fraction
     * @return normal relative tolerance
     */
    public static Tolerance normal(double fraction) {
        return new Tolerance(Distribution.NORMAL, fraction, true);
    }

    /**
     * @param nominal the nominal value, SI
     * @param unitUniform a uniform draw in [0, 1)
     * @param standardNormal a standard normal draw
     * @return the sampled value, SI
     */
    double sample(double nominal, double unitUniform, double standardNormal) {
        double spread = relative ? value * nominal : value;
        double v = switch (distribution) {
            case NONE -> nominal;
            case UNIFORM -> nominal + spread * (2 * unitUniform - 1);
            case NORMAL -> nominal + spread * standardNormal;
        };
        return Math.max(v, 0.01 * nominal);
    }
}
