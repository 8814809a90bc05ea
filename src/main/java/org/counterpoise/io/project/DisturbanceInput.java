package org.counterpoise.io.project;

import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.units.Unit;

/**
 * The disturbance as the user gave it: one frequency or a band (low, high in one unit), times a
 * harmonic order (1 unless the speed is a shaft speed and the force comes, say, once per blade).
 *
 * @param kind what drives the structure
 * @param amplitude its amplitude
 * @param frequency one frequency, or null for a band
 * @param bandLow low end of the band, or NaN
 * @param bandHigh high end of the band, or NaN
 * @param bandUnit unit of the band ends, or null
 * @param harmonicOrder forcing cycles per revolution (&gt; 0)
 * @param spectrum the spectrum (white noise and its level), or null for harmonic
 */
public record DisturbanceInput(ExcitationKind kind, QuantityInput amplitude, QuantityInput frequency,
        double bandLow, double bandHigh, Unit bandUnit, double harmonicOrder, SpectrumInput spectrum) {

    /**
     * A harmonic disturbance.
     * @param kind what drives the structure
     * @param amplitude its amplitude
     * @param frequency one frequency, or null for a band
     * @param bandLow low end of the band, or NaN
     * @param bandHigh high end of the band, or NaN
     * @param bandUnit unit of the band ends, or null
     * @param harmonicOrder forcing cycles per revolution
     */
    public DisturbanceInput(ExcitationKind kind, QuantityInput amplitude, QuantityInput frequency, double bandLow,
            double bandHigh, Unit bandUnit, double harmonicOrder) {
        this(kind, amplitude, frequency, bandLow, bandHigh, bandUnit, harmonicOrder, null);
    }

    /** @return true when a band is given */
    public boolean isBand() {
        return frequency == null;
    }
}
