package org.counterpoise.core.identify;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * Modal mass and stiffness at a point from two natural frequencies, before and after a known
 * mass is added there (the added-mass or mass-perturbation method; common practice, see Ewins
 * 2000, Modal Testing, 2nd ed., on mass modification, from memory): omega_1^2 = k/m and
 * omega_2^2 = k/(m + dm) give m = dm omega_2^2 / (omega_1^2 - omega_2^2) and k = m omega_1^2.
 * Exact for one mode whose shape the added mass does not change; a mass large enough to change
 * the shape, or neighbouring modes, bias it.
 *
 * @param modalMass modal mass at the point, kg
 * @param modalStiffness modal stiffness, N/m
 * @param naturalFrequency the structure's own natural frequency omega_1, rad/s
 */
public record AddedMass(double modalMass, double modalStiffness, double naturalFrequency) {

    /**
     * @param before natural frequency without the added mass, rad/s
     * @param after natural frequency with it, rad/s
     * @param addedMass the added mass, kg
     * @return the modal mass and stiffness
     */
    public static AddedMass of(double before, double after, double addedMass) {
        Checks.positive("added_mass", addedMass);
        Checks.positive("frequencies[0]", before);
        Checks.positive("frequencies[1]", after);
        if (!(after < before)) {
            throw new InvalidInputException("frequencies", Checks.show(before) + "," + Checks.show(after),
                    "the second frequency (with the added mass) lower than the first");
        }
        double m = addedMass * after * after / (before * before - after * after);
        return new AddedMass(m, m * before * before, before);
    }
}
