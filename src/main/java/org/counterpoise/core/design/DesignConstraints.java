package org.counterpoise.core.design;

import org.counterpoise.core.error.Checks;

/**
 * What the designer cannot change: a stroke clearance the absorber must stay within, a given
 * damper (an elastomer, a stock damper) or a given tuning. NaN means "free".
 *
 * @param strokeLimit largest allowed peak absorber stroke over the band at the design amplitude, m
 * @param fixedDampingRatio the absorber damping ratio zeta_a, held fixed
 * @param fixedTuningRatio the tuning ratio f, held fixed
 */
public record DesignConstraints(double strokeLimit, double fixedDampingRatio, double fixedTuningRatio) {

    /** No constraints. */
    public static final DesignConstraints NONE = new DesignConstraints(Double.NaN, Double.NaN, Double.NaN);

    /** Validates the given values. */
    public DesignConstraints {
        if (!Double.isNaN(strokeLimit)) {
            Checks.positive("absorber.stroke_limit", strokeLimit);
        }
        if (!Double.isNaN(fixedDampingRatio)) {
            Checks.inRange("absorber.fixed_damping_ratio", fixedDampingRatio, 0.0, 4.0);
        }
        if (!Double.isNaN(fixedTuningRatio)) {
            Checks.inOpenRange("absorber.fixed_tuning_ratio", fixedTuningRatio, 0.0, 20.0);
        }
    }

    /** @return true when any constraint is given */
    public boolean any() {
        return !Double.isNaN(strokeLimit) || !Double.isNaN(fixedDampingRatio) || !Double.isNaN(fixedTuningRatio);
    }
}
