package org.counterpoise.core.model;

import org.counterpoise.core.error.Checks;

/**
 * The absorber as built: a mass on a spring and a viscous damper connecting it to the structure.
 * All SI.
 *
 * @param mass absorber mass m2, kg (&gt; 0)
 * @param stiffness spring rate k2, N/m (&gt; 0)
 * @param damping damping coefficient c2, N*s/m (&gt;= 0)
 */
public record Absorber(double mass, double stiffness, double damping) {

    /** Validates the record. */
    public Absorber {
        Checks.positive("absorber.mass", mass);
        Checks.positive("absorber.stiffness", stiffness);
        Checks.nonNegative("absorber.damping", damping);
    }

    /**
     * Builds the absorber from non-dimensional parameters.
     * k2 = m2 (f omega1)^2 and c2 = 2 zeta_a m2 (f omega1): the damping ratio is referred to the
     * absorber's own frequency (see {@link Tuning}).
     * @param structure the structure it is tuned to (effective mass and frequency are used)
     * @param tuning mass ratio, tuning ratio, absorber damping ratio
     * @return the absorber
     */
    public static Absorber of(Structure structure, Tuning tuning) {
        double m2 = tuning.massRatio() * structure.effectiveMass();
        double omegaA = tuning.tuningRatio() * structure.naturalFrequency();
        return new Absorber(m2, m2 * omegaA * omegaA, 2.0 * tuning.dampingRatio() * m2 * omegaA);
    }

    /** @return the absorber's own natural frequency omega_a = sqrt(k2/m2), rad/s */
    public double naturalFrequency() {
        return Math.sqrt(stiffness / mass);
    }

    /**
     * @param structure the structure it is attached to
     * @return the non-dimensional description (mu, f, zeta_a) on that structure
     */
    public Tuning tuningOn(Structure structure) {
        double omegaA = naturalFrequency();
        return new Tuning(mass / structure.effectiveMass(), omegaA / structure.naturalFrequency(),
                damping / (2.0 * mass * omegaA));
    }
}
