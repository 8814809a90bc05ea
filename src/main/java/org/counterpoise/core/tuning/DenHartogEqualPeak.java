package org.counterpoise.core.tuning;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.Tuning;

/**
 * The classical equal-peak (fixed-point) absorber for a harmonic force on an undamped structure,
 * response the structure's displacement.
 *
 * <p>Tuning f = 1/(1+mu) makes the two fixed points P and Q, through which every damping's
 * response curve passes, equally high (Ormondroyd and Den Hartog 1928, Trans. ASME 50; Den Hartog
 * 1956, Mechanical Vibrations, 4th ed., eq. 3.23); Brock (1946, J. Appl. Mech. 13) chose the
 * damping that puts the curve's maxima near P and Q. In this project's damping convention
 * (zeta_a = c2 / (2 m2 omega_a)) that damping is zeta_a = sqrt(3 mu / (8 (1+mu))); Den Hartog
 * writes the same damper as (c/c_c)^2 = 3 mu / (8 (1+mu)^3) with c_c = 2 m2 omega1.
 * The fixed points are the roots x = g^2 of (2+mu) x^2 - 2 (1 + (1+mu) f^2) x + 2 f^2 = 0 with
 * height 1 / |1 - (1+mu) x|; at the optimum tuning their height is sqrt(1 + 2/mu) (Den Hartog
 * 1956, eq. 3.24). This is the fixed-point approximation, not the exact H-infinity optimum (see
 * {@link NishiharaAsamiExact}): its peak exceeds the exact optimum by 7e-6 to 6e-4 relative for
 * mu = 0.01 to 0.2.
 */
public final class DenHartogEqualPeak {
    private DenHartogEqualPeak() {
    }

    /**
     * @param massRatio mu
     * @return f = 1/(1+mu), zeta_a = sqrt(3 mu / (8 (1+mu)))
     */
    public static Tuning tuning(double massRatio) {
        double mu = Checks.positive("absorber.mass_ratio", massRatio);
        return new Tuning(mu, 1.0 / (1.0 + mu), Math.sqrt(3.0 * mu / (8.0 * (1.0 + mu))));
    }

    /**
     * The two fixed points for any tuning: roots of (2+mu) x^2 - 2 (1 + (1+mu) f^2) x + 2 f^2 = 0.
     * @param massRatio mu
     * @param tuningRatio f
     * @return {g_P, g_Q}, the frequency ratios of the fixed points, ascending
     */
    public static double[] fixedPoints(double massRatio, double tuningRatio) {
        double mu = massRatio;
        double a = 2.0 + mu;
        double b = -2.0 * (1.0 + (1.0 + mu) * tuningRatio * tuningRatio);
        double c = 2.0 * tuningRatio * tuningRatio;
        double disc = Math.sqrt(b * b - 4.0 * a * c);
        // Numerically stable pair of roots of a quadratic.
        double qq = -0.5 * (b - disc);
        double x1 = c / qq;
        double x2 = qq / a;
        return new double[] {Math.sqrt(Math.min(x1, x2)), Math.sqrt(Math.max(x1, x2))};
    }

    /**
     * @param massRatio mu
     * @param frequencyRatio g of a fixed point
     * @return its height |X1| / (F/k1) = 1 / |1 - (1+mu) g^2|
     */
    public static double fixedPointHeight(double massRatio, double frequencyRatio) {
        return 1.0 / Math.abs(1.0 - (1.0 + massRatio) * frequencyRatio * frequencyRatio);
    }

    /**
     * @param massRatio mu
     * @return sqrt(1 + 2/mu), the common height of P and Q at the optimum tuning
     */
    public static double equalPeakHeight(double massRatio) {
        return Math.sqrt(1.0 + 2.0 / Checks.positive("absorber.mass_ratio", massRatio));
    }
}
