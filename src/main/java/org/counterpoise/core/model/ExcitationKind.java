package org.counterpoise.core.model;

import org.counterpoise.core.units.Dimension;

/** What drives the structure, and the SI kind of its amplitude. */
public enum ExcitationKind {
    /** Harmonic force on the structure, amplitude F in N. */
    FORCE("harmonic force", Dimension.FORCE),
    /** Rotating unbalance m_u e, force amplitude m_u e omega^2; amplitude in kg*m. */
    UNBALANCE("rotating unbalance", Dimension.UNBALANCE),
    /** Harmonic motion of the base (ground), displacement amplitude U in m. */
    BASE_DISPLACEMENT("base displacement", Dimension.LENGTH),
    /** Harmonic motion of the base given by its acceleration amplitude A in m/s^2. */
    BASE_ACCELERATION("base acceleration", Dimension.ACCELERATION);

    private final String label;
    private final Dimension amplitudeDimension;

    ExcitationKind(String label, Dimension amplitudeDimension) {
        this.label = label;
        this.amplitudeDimension = amplitudeDimension;
    }

    /** @return words for reports */
    public String label() {
        return label;
    }

    /** @return the dimension of the amplitude */
    public Dimension amplitudeDimension() {
        return amplitudeDimension;
    }

    /** @return true for the two base-motion kinds */
    public boolean isBaseMotion() {
        return this == BASE_DISPLACEMENT || this == BASE_ACCELERATION;
    }
}
