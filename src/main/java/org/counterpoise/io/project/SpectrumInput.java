package org.counterpoise.io.project;

import org.counterpoise.core.model.Spectrum;
import org.counterpoise.core.units.SpectralDensityUnit;

/**
 * The disturbance's spectrum as the user gave it.
 *
 * @param kind harmonic or white noise
 * @param psdValue with white noise: the one-sided PSD level as typed, else NaN
 * @param psdUnit its unit, or null
 */
public record SpectrumInput(Spectrum.Kind kind, double psdValue, SpectralDensityUnit psdUnit) {

    /**
     * @param value PSD level as typed
     * @param unit its unit
     * @return white noise of that level
     */
    public static SpectrumInput whiteNoise(double value, SpectralDensityUnit unit) {
        return new SpectrumInput(Spectrum.Kind.WHITE_NOISE, value, unit);
    }
}
