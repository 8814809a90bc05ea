package org.counterpoise.core.realisation;

/**
 * Plate materials for an eddy-current damper, with their electrical conductivity at 20 degrees C.
 * Copper: 58.0 MS/m (100 % IACS, the annealed-copper standard, IEC 60028). Aluminium: 35 MS/m for
 * commercially pure aluminium (about 61 % IACS; common practice, from memory until certified).
 */
public enum Conductor {
    /** Annealed copper plate. */
    COPPER("copper", 58.0e6),
    /** Commercially pure aluminium plate (lighter, about 60 % of copper's conductivity). */
    ALUMINIUM("aluminium", 35.0e6);

    private final String id;
    private final double conductivity;

    Conductor(String id, double conductivity) {
        this.id = id;
        this.conductivity = conductivity;
    }

    /** @return the identifier in project files and the JSON */
    public String id() {
        return id;
    }

    /** @return electrical conductivity at 20 degrees C, S/m */
    public double conductivity() {
        return conductivity;
    }
}
