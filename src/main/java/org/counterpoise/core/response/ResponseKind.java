package org.counterpoise.core.response;

import org.counterpoise.core.units.Dimension;

/**
 * The response quantities of the structure-absorber system. Motions of the structure are
 * absolute unless named relative; "stroke" is absorber minus structure displacement.
 */
public enum ResponseKind {
    DISPLACEMENT("structure displacement", Dimension.LENGTH, false),
    VELOCITY("structure velocity", Dimension.VELOCITY, false),
    ACCELERATION("structure acceleration", Dimension.ACCELERATION, false),
    RELATIVE_DISPLACEMENT("structure displacement relative to the base", Dimension.LENGTH, false),
    STROKE("absorber stroke (absorber minus structure)", Dimension.LENGTH, true),
    TRANSMITTED_FORCE("force transmitted to the ground", Dimension.FORCE, false),
    ABSORBER_FORCE("force in the absorber spring plus damper", Dimension.FORCE, true),
    SPRING_FORCE("force in the absorber spring", Dimension.FORCE, true),
    DAMPER_FORCE("force in the absorber damper", Dimension.FORCE, true);

    private final String label;
    private final Dimension dimension;
    private final boolean needsAbsorber;

    ResponseKind(String label, Dimension dimension, boolean needsAbsorber) {
        this.label = label;
        this.dimension = dimension;
        this.needsAbsorber = needsAbsorber;
    }

    /** @return words for reports */
    public String label() {
        return label;
    }

    /** @return the physical dimension of the response */
    public Dimension dimension() {
        return dimension;
    }

    /** @return true when the quantity exists only with an absorber fitted */
    public boolean needsAbsorber() {
        return needsAbsorber;
    }
}
