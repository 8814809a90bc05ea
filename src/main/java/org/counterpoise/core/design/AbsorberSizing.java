package org.counterpoise.core.design;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.Structure;

/**
 * How big the absorber may be: a mass ratio mu, a mass budget in kg, or a target response level
 * for which the lightest sufficient absorber is sought (with the exact-peak method). Exactly one
 * of the three, by type.
 */
public sealed interface AbsorberSizing {

    /** Default largest mass ratio considered when sizing for a target (common practice). */
    double DEFAULT_MAX_MASS_RATIO = 0.25;

    /**
     * Sized by a mass ratio.
     *
     * @param massRatio mu = m2 / m1, in (0, 2)
     */
    record ByMassRatio(double massRatio) implements AbsorberSizing {
        /** Validates the ratio. */
        public ByMassRatio {
            Checks.inOpenRange("absorber.mass_ratio", massRatio, 0.0, 2.0);
        }
    }

    /**
     * Sized by a mass budget.
     *
     * @param mass absorber mass, kg (&gt; 0)
     */
    record ByMass(double mass) implements AbsorberSizing {
        /** Validates the mass. */
        public ByMass {
            Checks.positive("absorber.mass", mass);
        }
    }

    /**
     * Sized for a target: the lightest absorber whose peak meets it.
     *
     * @param target the largest allowed peak of the response that matters, SI (&gt; 0)
     * @param maxMassRatio the largest mass ratio considered, in (0, 2)
     */
    record ByTarget(double target, double maxMassRatio) implements AbsorberSizing {
        /** Validates the target and the largest ratio. */
        public ByTarget {
            Checks.positive("absorber.target", target);
            Checks.inOpenRange("absorber.max_mass_ratio", maxMassRatio, 0.0, 2.0);
        }
    }

    /**
     * Sized to meet the study's acceptance criterion: the lightest absorber whose verdict passes over
     * the band, over the tolerance ranges for the robust methods (nominal for exact-peak), or, when
     * no mass ratio up to the largest can, the best reachable with how far it misses.
     *
     * @param maxMassRatio the largest mass ratio considered, in (0, 2)
     */
    record MeetCriterion(double maxMassRatio) implements AbsorberSizing {
        /** Validates the largest ratio. */
        public MeetCriterion {
            Checks.inOpenRange("absorber.max_mass_ratio", maxMassRatio, 0.0, 2.0);
        }
    }

    /**
     * @param mu mass ratio
     * @return sizing by mass ratio
     */
    static AbsorberSizing ofMassRatio(double mu) {
        return new ByMassRatio(mu);
    }

    /**
     * @param kilograms absorber mass
     * @return sizing by mass
     */
    static AbsorberSizing ofMass(double kilograms) {
        return new ByMass(kilograms);
    }

    /**
     * @param targetSi the largest allowed peak of the response that matters, SI
     * @param maxMu the largest mass ratio to consider
     * @return sizing for the lightest absorber that meets the target
     */
    static AbsorberSizing ofTarget(double targetSi, double maxMu) {
        return new ByTarget(targetSi, maxMu);
    }

    /** @return true when sized for a target response */
    default boolean byTarget() {
        return this instanceof ByTarget;
    }

    /** @return true when the design finds the mass ratio (for a target or to meet the criterion) */
    default boolean findsMassRatio() {
        return this instanceof ByTarget || this instanceof MeetCriterion;
    }

    /**
     * @param structure the structure (its effective mass at the absorber point)
     * @return the mass ratio mu = m2 / m1 (not for target sizing, whose ratio the design finds)
     */
    default double massRatioOn(Structure structure) {
        if (this instanceof ByMassRatio r) {
            return r.massRatio();
        }
        if (this instanceof ByMass m) {
            double mu = m.mass() / structure.effectiveMass();
            return Checks.inOpenRange("absorber.mass (as a ratio of the structure's effective mass)", mu, 0.0, 2.0);
        }
        throw new IllegalStateException("bug: target sizing has no mass ratio before the design");
    }
}
