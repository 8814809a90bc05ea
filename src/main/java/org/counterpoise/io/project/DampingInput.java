package org.counterpoise.io.project;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.DampingConversions;

/**
 * Structural damping in the measure the user has.
 *
 * @param measure which measure
 * @param value the number (ratio, loss factor or Q)
 * @param bandwidth the half-power bandwidth (only for {@link Measure#HALF_POWER_BANDWIDTH})
 */
public record DampingInput(Measure measure, double value, QuantityInput bandwidth) {

    /** The usual measures of modal damping. */
    public enum Measure {
        /** viscous damping ratio zeta. */
        RATIO("ratio"),
        /** loss factor eta. */
        LOSS_FACTOR("loss_factor"),
        /** quality factor Q. */
        Q_FACTOR("q_factor"),
        /** half-power (-3 dB) bandwidth. */
        HALF_POWER_BANDWIDTH("half_power_bandwidth");

        private final String key;

        Measure(String key) {
            this.key = key;
        }

        /** @return the JSON key */
        public String key() {
            return key;
        }
    }

    /**
     * @param zeta damping ratio
     * @return damping given as a ratio
     */
    public static DampingInput ratio(double zeta) {
        return new DampingInput(Measure.RATIO, zeta, null);
    }

    /**
     * @param d the damping as given, or null for none
     * @param path the JSON path of the damping object, for messages (e.g. {@code structure.damping})
     * @param omega the mode's natural frequency, rad/s (for a half-power bandwidth)
     * @return the damping ratio zeta (0 when none is given)
     */
    public static double ratioOf(DampingInput d, String path, double omega) {
        if (d == null) {
            return 0.0;
        }
        return switch (d.measure()) {
            case RATIO -> Checks.inRange(path + ".ratio", d.value(), 0.0, 0.99);
            case LOSS_FACTOR -> DampingConversions.fromLossFactor(d.value());
            case Q_FACTOR -> DampingConversions.fromQualityFactor(d.value());
            case HALF_POWER_BANDWIDTH -> DampingConversions.fromHalfPowerBandwidth(
                    d.bandwidth().si(path + ".half_power_bandwidth.value"), omega);
        };
    }
}
