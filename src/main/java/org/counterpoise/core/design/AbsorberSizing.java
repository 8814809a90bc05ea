package org.counterpoise.core.design;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.Structure;

/**
 * How big the absorber may be: a mass ratio mu, a mass budget in kg, or a target response level
 * for which the lightest sufficient absorber is sought (with the exact-peak method).
 *
 * @param massRatio mu, or NaN
 * @param mass absorber mass in kg, or NaN
 * @param target the largest allowed peak of the response that matters, SI, or NaN
 * @param maxMassRatio with a target: the largest mass ratio considered
 */
public record AbsorberSizing(double massRatio, double mass, double target, double maxMassRatio) {

    /** Default largest mass ratio considered when sizing for a target (common practice). */
    public static final double DEFAULT_MAX_MASS_RATIO = 0.25;

    /** Exactly one of mass ratio, mass and target must be given. */
    public AbsorberSizing {
        int given = (Double.isNaN(massRatio) ? 0 : 1) + (Double.isNaN(mass) ? 0 : 1) + (Double.isNaN(target) ? 0 : 1);
        if (given != 1) {
            throw new IllegalArgumentException("give exactly one of mass ratio, mass and target");
        }
        if (!Double.isNaN(massRatio)) {
            Checks.inOpenRange("absorber.mass_ratio", massRatio, 0.0, 2.0);
        } else if (!Double.isNaN(mass)) {
            Checks.positive("absorber.mass", mass);
        } else {
            Checks.positive("absorber.target", target);
            Checks.inOpenRange("absorber.max_mass_ratio", maxMassRatio, 0.0, 2.0);
        }
    }

    /**
     * @param mu mass ratio
     * @return sizing by mass ratio
     */
    public static AbsorberSizing ofMassRatio(double mu) {
        return new AbsorberSizing(mu, Double.NaN, Double.NaN, Double.NaN);
    }

    /**
     * @param kilograms absorber mass
     * @return sizing by mass
     */
    public static AbsorberSizing ofMass(double kilograms) {
        return new AbsorberSizing(Double.NaN, kilograms, Double.NaN, Double.NaN);
    }

    /**
     * @param targetSi the largest allowed peak of the response that matters, SI
     * @param maxMu the largest mass ratio to consider
     * @return sizing for the lightest absorber that meets the target
     */
    public static AbsorberSizing ofTarget(double targetSi, double maxMu) {
        return new AbsorberSizing(Double.NaN, Double.NaN, targetSi, maxMu);
    }

    /** @return true when sized by mass ratio */
    public boolean byRatio() {
        return !Double.isNaN(massRatio);
    }

    /** @return true when sized for a target response */
    public boolean byTarget() {
        return !Double.isNaN(target);
    }

    /**
     * @param structure the structure (its effective mass at the absorber point)
     * @return the mass ratio mu = m2 / m1 (not for target sizing)
     */
    public double massRatioOn(Structure structure) {
        if (byTarget()) {
            throw new IllegalStateException("target sizing has no mass ratio before the design");
        }
        if (byRatio()) {
            return massRatio;
        }
        double mu = mass / structure.effectiveMass();
        return Checks.inOpenRange("absorber.mass (as a ratio of the structure's effective mass)", mu, 0.0, 2.0);
    }
}
