package org.counterpoise.core.model;

import org.counterpoise.core.error.Checks;

/**
 * The non-dimensional absorber: mass ratio mu = m2/m1, tuning ratio f = omega_a/omega1 and
 * absorber damping ratio zeta_a = c2 / (2 m2 omega_a).
 *
 * <p>The damping ratio is referred to the absorber's OWN frequency omega_a. Den Hartog (1956)
 * refers it to the structure's frequency instead (c_c = 2 m2 omega1); the two differ by the
 * factor f. Every closed form in {@code core.tuning} is written in this class's convention.
 *
 * @param massRatio mu (&gt; 0)
 * @param tuningRatio f (&gt; 0)
 * @param dampingRatio zeta_a (&gt;= 0)
 */
public record Tuning(double massRatio, double tuningRatio, double dampingRatio) {

    /** Validates the record. */
    public Tuning {
        Checks.inOpenRange("absorber.mass_ratio", massRatio, 0.0, 10.0);
        Checks.inOpenRange("absorber.tuning_ratio", tuningRatio, 0.0, 100.0);
        Checks.inRange("absorber.damping_ratio", dampingRatio, 0.0, 10.0);
    }
}
