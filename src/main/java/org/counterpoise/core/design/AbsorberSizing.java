package org.counterpoise.core.design;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.Structure;

/**
 * How big the absorber may be: a mass ratio mu, or a mass budget in kg.
 *
 * @param massRatio mu, or NaN when a mass is given
 * @param mass absorber mass in kg, or NaN when a mass ratio is given
 */
public record AbsorberSizing(double massRatio, double mass) {

    /** Exactly one of the two must be given. */
    public AbsorberSizing {
        if (Double.isNaN(massRatio) == Double.isNaN(mass)) {
            throw new IllegalArgumentException("give exactly one of mass ratio and mass");
        }
        if (!Double.isNaN(massRatio)) {
            Checks.inOpenRange("absorber.mass_ratio", massRatio, 0.0, 2.0);
        } else {
            Checks.positive("absorber.mass", mass);
        }
    }

    /**
     * @param mu mass ratio
     * @return sizing by mass ratio
     */
    public static AbsorberSizing ofMassRatio(double mu) {
        return new AbsorberSizing(mu, Double.NaN);
    }

    /**
     * @param kilograms absorber mass
     * @return sizing by mass
     */
    public static AbsorberSizing ofMass(double kilograms) {
        return new AbsorberSizing(Double.NaN, kilograms);
    }

    /** @return true when sized by mass ratio */
    public boolean byRatio() {
        return !Double.isNaN(massRatio);
    }

    /**
     * @param structure the structure (its effective mass at the absorber point)
     * @return the mass ratio mu = m2 / m1
     */
    public double massRatioOn(Structure structure) {
        if (byRatio()) {
            return massRatio;
        }
        double mu = mass / structure.effectiveMass();
        return Checks.inOpenRange("absorber.mass (as a ratio of the structure's effective mass)", mu, 0.0, 2.0);
    }
}
