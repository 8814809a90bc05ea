package org.counterpoise.core.model;

import java.util.OptionalDouble;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * What the disturbance's frequency content is. {@link Kind#HARMONIC}: a sinusoid at one forcing
 * frequency or anywhere in a band (the {@link Excitation}'s band and amplitude); the design is
 * judged by peaks. {@link Kind#WHITE_NOISE}: a broadband random force or base acceleration of
 * constant one-sided power spectral density G0 over all frequencies; the design is judged by the
 * root mean square (rms) response, and the minimum-variance (H2) design minimises it.
 *
 * @param kind harmonic or white noise
 * @param psdLevel with white noise: the one-sided power spectral density G0, in N^2/Hz for a
 *     force and (m/s^2)^2/Hz for a base acceleration (per hertz, the trade's convention); empty
 *     for a harmonic disturbance
 */
public record Spectrum(Kind kind, OptionalDouble psdLevel) {

    /** The kinds of spectrum. */
    public enum Kind {
        /** A sinusoid at one frequency or anywhere in a band. */
        HARMONIC,
        /** Broadband random excitation of constant spectral density. */
        WHITE_NOISE
    }

    /** A harmonic disturbance (every project file before spectra were added means this). */
    public static final Spectrum HARMONIC = new Spectrum(Kind.HARMONIC, OptionalDouble.empty());

    /** Validates the record. */
    public Spectrum {
        Checks.present("disturbance.spectrum.kind", kind, "harmonic or white-noise");
        Checks.present("disturbance.spectrum.psd", psdLevel, "a spectral density or none");
        if (kind == Kind.WHITE_NOISE) {
            if (psdLevel.isEmpty()) {
                throw InvalidInputException.missing("disturbance.spectrum.psd", "white noise needs a spectral density");
            }
            Checks.positive("disturbance.spectrum.psd", psdLevel.getAsDouble());
        } else if (psdLevel.isPresent()) {
            throw new InvalidInputException("disturbance.spectrum.psd", Checks.show(psdLevel.getAsDouble()),
                    "no spectral density for a harmonic disturbance");
        }
    }

    /**
     * @param psdLevel one-sided PSD, N^2/Hz (force) or (m/s^2)^2/Hz (base acceleration)
     * @return white noise of that level
     */
    public static Spectrum whiteNoise(double psdLevel) {
        return new Spectrum(Kind.WHITE_NOISE, OptionalDouble.of(psdLevel));
    }

    /** @return true for white noise */
    public boolean isWhiteNoise() {
        return kind == Kind.WHITE_NOISE;
    }
}
