package org.counterpoise.core.design;

import java.util.OptionalDouble;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.robust.MonteCarlo;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.robust.ToleranceSet;

/**
 * What the engineer expects of the real structure and absorber: the ranges the design must hold
 * over (structure and absorber natural frequency, absorber damping; {@link ToleranceRanges}), an
 * optional target for the response, and the tolerances for a Monte Carlo run.
 *
 * @param ranges the +/- ranges of structure frequency, absorber frequency and absorber damping
 * @param target the largest acceptable peak of the response that matters, SI, when one is set
 * @param tolerances spreads of mass, stiffness and damping for Monte Carlo
 * @param samples number of Monte Carlo samples
 * @param seed Monte Carlo random seed
 */
public record RobustnessSettings(ToleranceRanges ranges, OptionalDouble target, ToleranceSet tolerances, int samples,
        long seed) {

    /** Nothing stated: the default ranges ({@link ToleranceRanges#DEFAULT}), no target, no tolerances. */
    public static final RobustnessSettings DEFAULT = new RobustnessSettings(ToleranceRanges.DEFAULT,
            OptionalDouble.empty(), ToleranceSet.NONE, MonteCarlo.DEFAULT_SAMPLES, 1L);

    /**
     * Settings with the structure and absorber frequency ranges stated and no damping range (the
     * shape before the damping range existed; tests and callers that vary only the frequencies).
     *
     * @param structureRange structure natural frequency may be off by +/- this fraction (0 to 0.5)
     * @param absorberRange absorber natural frequency may be off by +/- this fraction (0 to 0.5)
     * @param target the largest acceptable peak, SI, when one is set
     * @param tolerances spreads for Monte Carlo
     * @param samples number of Monte Carlo samples
     * @param seed Monte Carlo random seed
     */
    public RobustnessSettings(double structureRange, double absorberRange, OptionalDouble target,
            ToleranceSet tolerances, int samples, long seed) {
        this(ToleranceRanges.stated(structureRange, absorberRange, 0.0), target, tolerances, samples, seed);
    }

    /** Validates the record. */
    public RobustnessSettings {
        Checks.present("robustness", ranges, "tolerance ranges");
        Checks.present("robustness.target", target, "a target or none");
        target.ifPresent(v -> Checks.positive("robustness.target", v));
        Checks.present("robustness.tolerances", tolerances, "tolerances");
        Checks.inRange("robustness.samples", samples, 1, 1_000_000);
    }

    /** @return the structure natural frequency range, +/- fraction */
    public double structureRange() {
        return ranges.structure();
    }

    /** @return the absorber natural frequency range, +/- fraction */
    public double absorberRange() {
        return ranges.absorber();
    }

    /** @return the absorber damping range, +/- fraction */
    public double dampingRange() {
        return ranges.damping();
    }

    /**
     * @param samples another sample count
     * @param seed another seed
     * @return these settings with them (they move no part of the design, only its Monte Carlo)
     */
    public RobustnessSettings withSampling(int samples, long seed) {
        return new RobustnessSettings(ranges, target, tolerances, samples, seed);
    }
}
