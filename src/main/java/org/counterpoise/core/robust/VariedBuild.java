package org.counterpoise.core.robust;

import org.counterpoise.core.model.Absorber;

/**
 * One way the structure and the absorber as built may differ from the design: a point of the
 * tolerance ranges or one sampled build. Applied to any nominal absorber, so that a search over
 * designs compares them on the same builds (common random numbers).
 */
@FunctionalInterface
public interface VariedBuild {
    /**
     * @param nominal the absorber as designed
     * @return the exact peak of the response over the band of this build of it, SI
     */
    double peak(Absorber nominal);

    /**
     * @param m the mistuning model
     * @param structureFactor structure natural frequency over nominal
     * @param absorberFactor absorber natural frequency over nominal
     * @param dampingFactor absorber damping coefficient over nominal
     * @return the build with those factors
     */
    static VariedBuild of(Mistuning m, double structureFactor, double absorberFactor, double dampingFactor) {
        return a -> m.peak(a, structureFactor, absorberFactor, dampingFactor);
    }
}
