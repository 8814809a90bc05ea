package org.counterpoise.core.robust;

/**
 * Peak response over the band against one mistuning factor.
 *
 * @param factors the factors (1 = nominal), ascending
 * @param peaks the peak response at each, SI
 */
public record SensitivityCurve(double[] factors, double[] peaks) {

    /** Defensive copies. */
    public SensitivityCurve {
        factors = factors.clone();
        peaks = peaks.clone();
    }

    @Override
    public double[] factors() {
        return factors.clone();
    }

    @Override
    public double[] peaks() {
        return peaks.clone();
    }
}
