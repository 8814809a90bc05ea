package org.counterpoise.core.model;

import org.counterpoise.core.error.Checks;

/**
 * The usual measures of light modal damping, turned into the viscous damping ratio zeta.
 * These are the standard equivalences for a lightly damped mode (common practice; see e.g.
 * Harris' Shock and Vibration Handbook, ch. 2): loss factor eta = 2 zeta at resonance,
 * quality factor Q = 1 / (2 zeta), half-power bandwidth delta_f = 2 zeta f_n.
 */
public final class DampingConversions {
    private DampingConversions() {
    }

    /**
     * @param lossFactor structural loss factor eta
     * @return zeta = eta / 2
     */
    public static double fromLossFactor(double lossFactor) {
        return Checks.inRange("structure.damping.loss_factor", lossFactor, 0.0, 1.9) / 2.0;
    }

    /**
     * @param qualityFactor Q, the resonant amplification
     * @return zeta = 1 / (2 Q)
     */
    public static double fromQualityFactor(double qualityFactor) {
        Checks.inRange("structure.damping.q_factor", qualityFactor, 0.51, 1e9);
        return 1.0 / (2.0 * qualityFactor);
    }

    /**
     * @param bandwidth half-power (-3 dB) bandwidth, in the same unit as the natural frequency
     * @param naturalFrequency natural frequency
     * @return zeta = bandwidth / (2 f_n)
     */
    public static double fromHalfPowerBandwidth(double bandwidth, double naturalFrequency) {
        Checks.nonNegative("structure.damping.half_power_bandwidth", bandwidth);
        Checks.positive("structure.natural_frequency", naturalFrequency);
        return Checks.inRange("structure.damping.half_power_bandwidth", bandwidth / (2.0 * naturalFrequency),
                0.0, 0.95);
    }

    /**
     * @param dampingRatio zeta
     * @return the loss factor eta = 2 zeta (the inverse of {@link #fromLossFactor})
     */
    public static double lossFactor(double dampingRatio) {
        return 2.0 * dampingRatio;
    }

    /**
     * @param dampingRatio zeta
     * @return Q = 1 / (2 zeta); NaN for zero damping, whose Q is unbounded
     */
    public static double qualityFactor(double dampingRatio) {
        return dampingRatio > 0 ? 1.0 / (2.0 * dampingRatio) : Double.NaN;
    }

    /**
     * @param dampingRatio zeta
     * @param naturalFrequency natural frequency (any unit)
     * @return half-power bandwidth 2 zeta f_n, in the unit of the frequency
     */
    public static double halfPowerBandwidth(double dampingRatio, double naturalFrequency) {
        return 2.0 * dampingRatio * naturalFrequency;
    }
}
