package org.counterpoise.core.tuning;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.Tuning;

/**
 * Closed-form H2 (minimum mean-square) absorbers for white-noise excitation of an undamped
 * structure. All exact (the mean square has a closed form for this model). The mean square is
 * J = (1 / 2 pi) times the integral over all real g of |H(i g)|^2, in the normalisation of
 * {@link org.counterpoise.core.response.ResponseScale}.
 */
public final class MinimumVariance {
    private MinimumVariance() {
    }

    /**
     * White-noise force, response the structure's displacement (Crandall and Mark 1963, Random
     * Vibration in Mechanical Systems, Academic Press; Warburton 1982, Table I):
     * f = sqrt(1 + mu/2)/(1+mu), zeta_a = sqrt(mu (1 + 3 mu/4) / (4 (1+mu)(1 + mu/2))).
     * @param massRatio mu
     * @return the optimum tuning
     */
    public static Tuning forceDisplacement(double massRatio) {
        double mu = Checks.positive("absorber.mass_ratio", massRatio);
        return new Tuning(mu, Math.sqrt(1.0 + mu / 2.0) / (1.0 + mu),
                Math.sqrt(mu * (1.0 + 0.75 * mu) / (4.0 * (1.0 + mu) * (1.0 + mu / 2.0))));
    }

    /**
     * @param massRatio mu
     * @return the optimum mean square J_opt = sqrt((1 + 3 mu/4) / (mu (1+mu))) of the
     *     force-displacement pair (Warburton 1982)
     */
    public static double forceDisplacementOptimum(double massRatio) {
        double mu = Checks.positive("absorber.mass_ratio", massRatio);
        return Math.sqrt((1.0 + 0.75 * mu) / (mu * (1.0 + mu)));
    }

    /**
     * White-noise base acceleration, response the displacement relative to the base (Warburton
     * 1982, Table I): f = sqrt(1 - mu/2)/(1+mu), zeta_a = sqrt(mu (1 - mu/4) / (4 (1+mu)(1 - mu/2))).
     * Valid for mu &lt; 2.
     * @param massRatio mu
     * @return the optimum tuning
     */
    public static Tuning baseAccelerationRelativeDisplacement(double massRatio) {
        double mu = Checks.inOpenRange("absorber.mass_ratio", massRatio, 0.0, 2.0);
        return new Tuning(mu, Math.sqrt(1.0 - mu / 2.0) / (1.0 + mu),
                Math.sqrt(mu * (1.0 - mu / 4.0) / (4.0 * (1.0 + mu) * (1.0 - mu / 2.0))));
    }

    /**
     * White-noise force, response the structure's velocity: f = 1/sqrt(1+mu), zeta_a = sqrt(mu)/2,
     * J_opt = 1/sqrt(mu (1+mu)). Derived for this project from the closed-form mean square (not
     * from a publication); the tests confirm it is the minimum by numerical integration.
     * @param massRatio mu
     * @return the optimum tuning
     */
    public static Tuning forceVelocity(double massRatio) {
        double mu = Checks.positive("absorber.mass_ratio", massRatio);
        return new Tuning(mu, 1.0 / Math.sqrt(1.0 + mu), Math.sqrt(mu) / 2.0);
    }
}
