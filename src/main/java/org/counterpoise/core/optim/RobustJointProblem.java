package org.counterpoise.core.optim;

import org.counterpoise.core.error.Checks;

/**
 * One absorber per mode ({@link JointAbsorberSetup}) designed for the least WORST peak over the band
 * when each designed mode's natural frequency lies anywhere in [1 - s, 1 + s] times nominal, each on
 * its own (the two modes are identified or predicted separately, so their errors need not agree;
 * their stiffness by the square, modal mass, damping ratio and shape kept; the structure's other modes
 * as they are), both absorbers' natural frequencies are off by one common factor in [1 - a, 1 + a]
 * (one spring batch: spring rates by the square, masses and dampers kept), and every absorber's
 * damping ratio is at or above a floor. The response is per unit force on the NOMINAL structure's
 * scales, so a stiffer build's smaller deflection counts, as in the other robust designs.
 *
 * @param setup the structure, the two absorbers' modes and points, the mass and the band
 * @param structureRange s, fraction (0 to 0.5)
 * @param absorberRange a, fraction (0 to 0.5; 0 for absorbers as drawn)
 * @param dampingFloor least damping ratio of every absorber (0 to 0.5)
 */
public record RobustJointProblem(JointAbsorberSetup setup, double structureRange, double absorberRange,
        double dampingFloor) {

    /** Validates the problem; each message names what a user sets. */
    public RobustJointProblem {
        Checks.present("absorbers", setup, "one absorber on each of two modes");
        Checks.inRange("structure frequency range", structureRange, 0.0, 0.5);
        Checks.inRange("absorber frequency range", absorberRange, 0.0, 0.5);
        Checks.inRange("damping floor", dampingFloor, 0.0, 0.5);
    }

    /** @return each build factor's range: the lower designed mode's, the upper's, the absorbers' */
    double[] ranges() {
        return new double[] {structureRange, structureRange, absorberRange};
    }
}
