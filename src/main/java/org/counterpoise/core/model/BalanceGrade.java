package org.counterpoise.core.model;

import org.counterpoise.core.error.Checks;

/**
 * The unbalance a rotor may keep after balancing to a balance quality grade, which a project may
 * give instead of an unbalance it does not know.
 *
 * <p>ISO 21940-11:2016 (formerly ISO 1940-1:2003), "Mechanical vibration - Rotor balancing -
 * Procedures and tolerances for rotors with rigid behaviour": the grade G is the product of the
 * permissible residual specific unbalance and the maximum service angular speed,
 * {@code G = e_per * Omega_max} (G in mm/s in the standard's tables: G 0.4 to G 4000 in steps of
 * about 2.5), so the permissible residual unbalance of a rotor of mass m is
 * {@code U_per = e_per * m = G * m / Omega_max}. Everything here is SI: G in m/s, m in kg,
 * Omega_max in rad/s, e_per in m, U_per in kg*m (1 kg*m = 10^6 g*mm). The formula is the
 * standard's definition of the grade; the clause number is not quoted here because it was not read
 * in the 2016 edition during this work.
 *
 * @param grade the balance quality grade G, m/s (G 6.3 is 6.3e-3 m/s) (&gt; 0)
 * @param rotorMass the rotor's mass m, kg (&gt; 0)
 * @param maxServiceSpeed the rotor's maximum service angular speed Omega_max, rad/s (&gt; 0)
 */
public record BalanceGrade(double grade, double rotorMass, double maxServiceSpeed) {

    /** Validates the record. */
    public BalanceGrade {
        Checks.positive("disturbance.balance_grade.grade", grade);
        Checks.positive("disturbance.balance_grade.rotor_mass", rotorMass);
        Checks.positive("disturbance.balance_grade.max_speed", maxServiceSpeed);
    }

    /** @return the permissible residual specific unbalance e_per = G / Omega_max, m */
    public double specificUnbalance() {
        return grade / maxServiceSpeed;
    }

    /** @return the permissible residual unbalance U_per = G m / Omega_max, kg*m */
    public double permissibleUnbalance() {
        return specificUnbalance() * rotorMass;
    }
}
