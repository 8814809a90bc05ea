package org.counterpoise.io.project;

/**
 * The robustness section of a project as typed. Percent values; absent entries are NaN or null.
 *
 * @param structureMistuningPercent the structure's natural frequency may be off by +/- this
 * @param absorberMistuningPercent the absorber's natural frequency may be off by +/- this
 * @param target largest acceptable peak of the response that matters, or null
 * @param samples Monte Carlo samples (0 for the default)
 * @param seed Monte Carlo seed
 * @param structureMass tolerance of the structure's mass, or null
 * @param structureStiffness tolerance of the structure's stiffness, or null
 * @param absorberMass tolerance of the absorber's mass, or null
 * @param absorberStiffness tolerance of the absorber's spring rate, or null
 * @param absorberDamping tolerance of the absorber's damping coefficient, or null
 */
public record RobustnessInput(double structureMistuningPercent, double absorberMistuningPercent, QuantityInput target,
        int samples, long seed, ToleranceInput structureMass, ToleranceInput structureStiffness,
        ToleranceInput absorberMass, ToleranceInput absorberStiffness, ToleranceInput absorberDamping) {

    /**
     * A tolerance as typed: a distribution and either a percent or an absolute value with unit.
     *
     * @param distribution "uniform" or "normal"
     * @param percent half-width (uniform) or standard deviation (normal) in percent, or NaN
     * @param absolute the same as an absolute quantity, or null
     */
    public record ToleranceInput(String distribution, double percent, QuantityInput absolute) {
    }
}
