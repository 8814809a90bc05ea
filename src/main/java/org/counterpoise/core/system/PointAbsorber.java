package org.counterpoise.core.system;

import org.counterpoise.core.error.Checks;

/**
 * An absorber attached to the structure at a named point: a mass on a spring and a viscous damper
 * in parallel, both between the point and the mass. SI units.
 *
 * @param point the structure's point it is attached to
 * @param mass absorber mass m_j, kg (&gt; 0)
 * @param stiffness spring stiffness k_j, N/m (&gt;= 0)
 * @param damping viscous damping coefficient c_j, N s/m (&gt;= 0)
 */
public record PointAbsorber(String point, double mass, double stiffness, double damping) {

    /** Validates the absorber. */
    public PointAbsorber {
        Checks.present("absorber point", point, "the name of a point of the structure");
        Checks.positive("absorber mass", mass);
        Checks.nonNegative("absorber stiffness", stiffness);
        Checks.nonNegative("absorber damping", damping);
    }

    /**
     * An absorber given by its own natural frequency and damping ratio.
     *
     * @param point attachment point
     * @param mass m_j, kg
     * @param frequency omega_j = sqrt(k_j / m_j), rad/s
     * @param dampingRatio zeta_j = c_j / (2 m_j omega_j), referred to the absorber's OWN frequency
     * @return the absorber
     */
    public static PointAbsorber tuned(String point, double mass, double frequency, double dampingRatio) {
        return new PointAbsorber(point, mass, mass * frequency * frequency, 2 * mass * dampingRatio * frequency);
    }

    /** @return omega_j = sqrt(k_j / m_j), rad/s */
    public double frequency() {
        return Math.sqrt(stiffness / mass);
    }
}
