package org.counterpoise.core.model;

import org.counterpoise.core.error.Checks;

/**
 * A harmonic disturbance: its kind, its amplitude (SI, by kind: N, kg*m, m or m/s^2) and the
 * forcing frequencies it occurs at.
 *
 * @param kind what drives the structure
 * @param amplitude amplitude in the SI unit of {@link ExcitationKind#amplitudeDimension()}
 * @param band forcing frequencies, rad/s
 */
public record Excitation(ExcitationKind kind, double amplitude, FrequencyBand band) {

    /** Validates the record. */
    public Excitation {
        Checks.present("disturbance.kind", kind, "one of force, unbalance, base-displacement, base-acceleration");
        Checks.positive("disturbance.amplitude", amplitude);
        Checks.present("disturbance.frequency", band, "a frequency or a band");
    }
}
