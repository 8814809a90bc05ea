package org.counterpoise.core.model;

import org.counterpoise.core.error.Checks;

/**
 * A disturbance: its kind, its harmonic amplitude (SI, by kind: N, kg*m, m or m/s^2), the forcing
 * frequencies it occurs at, and its spectrum (harmonic, or broadband white noise of a stated
 * spectral density, see {@link Spectrum}).
 *
 * @param kind what drives the structure
 * @param amplitude amplitude in the SI unit of {@link ExcitationKind#amplitudeDimension()}
 * @param band forcing frequencies, rad/s
 * @param spectrum harmonic, or white noise with its PSD level
 */
public record Excitation(ExcitationKind kind, double amplitude, FrequencyBand band, Spectrum spectrum) {

    /**
     * A harmonic disturbance.
     * @param kind what drives the structure
     * @param amplitude SI amplitude
     * @param band forcing frequencies, rad/s
     */
    public Excitation(ExcitationKind kind, double amplitude, FrequencyBand band) {
        this(kind, amplitude, band, Spectrum.HARMONIC);
    }

    /** Validates the record. */
    public Excitation {
        Checks.present("disturbance.kind", kind, "one of force, unbalance, base-displacement, base-acceleration");
        Checks.positive("disturbance.amplitude", amplitude);
        Checks.present("disturbance.frequency", band, "a frequency or a band");
        Checks.present("disturbance.spectrum", spectrum, "harmonic or white-noise");
    }
}
