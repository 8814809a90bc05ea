package org.counterpoise.core.optim;

/**
 * The fixed-point design of a hysteretic absorber on an undamped structure, force in and
 * displacement out: the method Snowdon (1968, Vibration and Shock in Damped Mechanical Systems,
 * Wiley) applies to absorbers of rubberlike material, derived here step by step because the book's
 * text could not be consulted (docs/realisation.md gives the derivation):
 * <ul>
 *   <li>with K = f^2 (1 + i eta) and x = g^2, |X1 k1/F|^2 = [(a - x)^2 + b^2] /
 *       [((1 - x)(a - x) - mu a x)^2 + b^2 (1 - (1 + mu) x)^2], a = f^2, b = a eta;</li>
 *   <li>it does not depend on b where (a - x)(1 - (1+mu) x) = -((1 - x)(a - x) - mu a x), i.e. at
 *       the roots of (2 + mu) x^2 - 2 (1 + (1 + mu) a) x + 2 a = 0: the viscous absorber's fixed
 *       points (Hahnkamm 1932; Den Hartog 1956, section 3.3), with height 1/|1 - (1 + mu) x|;</li>
 *   <li>equal heights give the same tuning as the viscous absorber, f = 1/(1 + mu), and the
 *       height sqrt(1 + 2/mu);</li>
 *   <li>a zero slope at each fixed point (N' = h^2 D' there, linear in b^2) gives one loss factor
 *       for each; the mean of their squares (Brock's 1946 choice for the viscous absorber) is
 *       eta^2 = mu (3 + 2 mu) / (2 + mu).</li>
 * </ul>
 */
public final class HystereticFixedPoints {

    /** Where the formulas come from, for reports. */
    public static final String SOURCE = "fixed-point method (Hahnkamm 1932, Brock 1946) for a hysteretic absorber,"
            + " as Snowdon (1968), Vibration and Shock in Damped Mechanical Systems, Wiley, applies it; formulas"
            + " derived in Counterpoise (docs/realisation.md)";

    private HystereticFixedPoints() {
    }

    /**
     * @param massRatio mu
     * @return the fixed-point tuning ratio 1/(1 + mu)
     */
    public static double tuningRatio(double massRatio) {
        return 1.0 / (1.0 + massRatio);
    }

    /**
     * @param massRatio mu
     * @return the fixed-point loss factor sqrt(mu (3 + 2 mu) / (2 + mu))
     */
    public static double lossFactor(double massRatio) {
        return Math.sqrt(massRatio * (3 + 2 * massRatio) / (2 + massRatio));
    }

    /**
     * @param massRatio mu
     * @return the height of the fixed points, sqrt(1 + 2/mu): the peak the fixed-point method promises
     */
    public static double fixedPointHeight(double massRatio) {
        return Math.sqrt(1 + 2 / massRatio);
    }
}
