package org.counterpoise.core.optim;

import org.counterpoise.core.error.Checks;

/**
 * Several absorbers of equal mass on one mode designed for the least WORST peak over the band when
 * the structure's natural frequency lies anywhere in [1 - s, 1 + s] times nominal (its stiffness by
 * the square; modal mass and damping ratio kept) and every absorber's natural frequency is off by
 * one common factor in [1 - a, 1 + a] (one spring batch: spring rates by the square, masses and
 * dampers kept), with every absorber's damping ratio at or above a floor. Non-dimensional as
 * {@link AbsorberSetProblem}: the response is X k1 / F of the NOMINAL structure's k1, so a stiffer
 * structure's smaller deflection counts, as in the single absorber's robust design.
 *
 * @param set the absorbers, structure and band
 * @param structureRange s, fraction (0 to 0.5)
 * @param absorberRange a, fraction (0 to 0.5; 0 for absorbers as drawn)
 * @param dampingFloor least damping ratio of every absorber (0 to 0.5)
 */
public record RobustSetProblem(AbsorberSetProblem set, double structureRange, double absorberRange,
        double dampingFloor) {

    /** Validates the problem; each message names what a user sets. */
    public RobustSetProblem {
        Checks.present("absorbers", set, "several absorbers on one mode");
        Checks.inRange("structure frequency range", structureRange, 0.0, 0.5);
        Checks.inRange("absorber frequency range", absorberRange, 0.0, 0.5);
        Checks.inRange("damping floor", dampingFloor, 0.0, 0.5);
    }
}
