package org.counterpoise.io.project;

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
}
