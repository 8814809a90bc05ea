package org.counterpoise.core.realisation;

/**
 * The tolerance each part must be made to, as fractions (+/-), so that the built absorber's frequency
 * and damping stay inside what the design tolerates.
 *
 * @param mass absorber mass
 * @param springRate spring rate (total)
 * @param damping damping coefficient
 * @param absorberFrequency the absorber's own frequency the parts together give
 * @param basis where the frequency and damping ranges come from
 */
public record PartTolerances(double mass, double springRate, double damping, double absorberFrequency,
        ToleranceBasis basis) {

    /** Where the ranges the parts are held to come from. */
    public enum ToleranceBasis {
        /** The project's tolerance ranges, which the robust design holds over. */
        ROBUST_RANGES,
        /** The mistuning at which the peak rises by the tolerance allowance (a non-robust design). */
        ALLOWED_RISE
    }
}
