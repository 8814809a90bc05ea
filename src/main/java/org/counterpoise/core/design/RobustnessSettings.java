package org.counterpoise.core.design;

import java.util.OptionalDouble;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.robust.MonteCarlo;
import org.counterpoise.core.robust.ToleranceSet;

/**
 * What the engineer expects of the real structure and absorber: how far the structure's natural
 * frequency may be off (mass of contents, joints, temperature), how far the absorber's may be off
 * (manufacture), an optional target for the response, and the tolerances for a Monte Carlo run.
 *
 * @param structureRange structure natural frequency may be off by +/- this fraction (0 to 0.5)
 * @param absorberRange absorber natural frequency may be off by +/- this fraction (0 to 0.5)
 * @param target the largest acceptable peak of the response that matters, SI, when one is set
 * @param tolerances spreads of mass, stiffness and damping for Monte Carlo
 * @param samples number of Monte Carlo samples
 * @param seed Monte Carlo random seed
 */
public record RobustnessSettings(double structureRange, double absorberRange, OptionalDouble target,
        ToleranceSet tolerances, int samples, long seed) {

    /** Common-practice defaults: +/- 10 % on the structure, +/- 2 % on the absorber, no target. */
    public static final RobustnessSettings DEFAULT = new RobustnessSettings(0.10, 0.02, OptionalDouble.empty(),
            ToleranceSet.NONE, MonteCarlo.DEFAULT_SAMPLES, 1L);

    /** Validates the record. */
    public RobustnessSettings {
        Checks.inRange("robustness.structure_mistuning", structureRange, 0.0, 0.5);
        Checks.inRange("robustness.absorber_mistuning", absorberRange, 0.0, 0.5);
        Checks.present("robustness.target", target, "a target or none");
        target.ifPresent(v -> Checks.positive("robustness.target", v));
        Checks.present("robustness.tolerances", tolerances, "tolerances");
        Checks.inRange("robustness.samples", samples, 1, 1_000_000);
    }
}
