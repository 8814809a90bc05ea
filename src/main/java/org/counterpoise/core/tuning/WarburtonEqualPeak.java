package org.counterpoise.core.tuning;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.Tuning;

/**
 * Fixed-point (equal-peak) optima for other excitation and response pairs on an undamped
 * structure (Warburton 1982, "Optimum absorber parameters for various combinations of response
 * and excitation parameters", Earthquake Eng. Struct. Dyn. 10, 381-401, Table I; written down from
 * memory and confirmed numerically against the exact optimum, to the fixed-point accuracy stated
 * on each method).
 */
public final class WarburtonEqualPeak {
    private WarburtonEqualPeak() {
    }

    /**
     * Base acceleration, response the displacement relative to the base:
     * f = sqrt(1 - mu/2)/(1+mu), zeta_a = sqrt(3 mu / (8 (1+mu)(1 - mu/2))). Valid for mu &lt; 2.
     * @param massRatio mu
     * @return the fixed-point tuning
     */
    public static Tuning baseAccelerationRelativeDisplacement(double massRatio) {
        double mu = Checks.inOpenRange("absorber.mass_ratio", massRatio, 0.0, 2.0);
        return new Tuning(mu, Math.sqrt(1.0 - mu / 2.0) / (1.0 + mu),
                Math.sqrt(3.0 * mu / (8.0 * (1.0 + mu) * (1.0 - mu / 2.0))));
    }

    /**
     * @param massRatio mu
     * @return (1+mu) sqrt(2/mu), the fixed-point height of the base-acceleration pair
     */
    public static double baseAccelerationRelativeDisplacementHeight(double massRatio) {
        double mu = Checks.positive("absorber.mass_ratio", massRatio);
        return (1.0 + mu) * Math.sqrt(2.0 / mu);
    }

    /**
     * Harmonic force, response the structure's acceleration (equally: rotating unbalance,
     * response the displacement): f = 1/sqrt(1+mu), zeta_a = sqrt(3 mu / (8 (1 + mu/2))). The
     * weakest fixed-point result: its peak is up to 2.6 % above the true optimum at mu = 0.2.
     * @param massRatio mu
     * @return the fixed-point tuning
     */
    public static Tuning forceAcceleration(double massRatio) {
        double mu = Checks.positive("absorber.mass_ratio", massRatio);
        return new Tuning(mu, 1.0 / Math.sqrt(1.0 + mu), Math.sqrt(3.0 * mu / (8.0 * (1.0 + mu / 2.0))));
    }
}
