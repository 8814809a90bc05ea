package org.counterpoise.core.model;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * The forcing frequencies the machine produces in service: one frequency (low == high) or a
 * closed band. Angular frequencies in rad/s.
 *
 * @param low lowest forcing frequency, rad/s (&gt; 0)
 * @param high highest forcing frequency, rad/s (&gt;= low)
 */
public record FrequencyBand(double low, double high) {

    /** Validates the band. */
    public FrequencyBand {
        Checks.positive("disturbance.frequency_low", low);
        Checks.positive("disturbance.frequency_high", high);
        if (high < low) {
            throw new InvalidInputException("disturbance.frequency_high", Checks.show(high),
                    "must not be below the low end of the band (" + Checks.show(low) + " rad/s)");
        }
    }

    /**
     * @param omega forcing frequency, rad/s
     * @return a band of one frequency
     */
    public static FrequencyBand single(double omega) {
        return new FrequencyBand(omega, omega);
    }

    /**
     * The forcing band of a rotor: shaft speed range times a harmonic order (1 for unbalance,
     * the blade count for blade-pass, the pole-pair count for some motor forces ...).
     * @param shaftLow lowest shaft speed, rad/s
     * @param shaftHigh highest shaft speed, rad/s
     * @param harmonicOrder forcing cycles per revolution (&gt; 0)
     * @return the forcing band
     */
    public static FrequencyBand ofRotor(double shaftLow, double shaftHigh, double harmonicOrder) {
        Checks.positive("disturbance.harmonic_order", harmonicOrder);
        return new FrequencyBand(shaftLow * harmonicOrder, shaftHigh * harmonicOrder);
    }

    /** @return true when the band is one frequency */
    public boolean isSingle() {
        return low == high;
    }

    /** @return the centre of the band, rad/s */
    public double centre() {
        return 0.5 * (low + high);
    }
}
