package org.counterpoise.core.units;

/** The physical kinds of quantity Counterpoise handles, each with its SI unit. */
public enum Dimension {
    /** kg. */
    MASS("kg"),
    /** N. */
    FORCE("N"),
    /** m. */
    LENGTH("m"),
    /** N/m. */
    STIFFNESS("N/m"),
    /** N*s/m. */
    DAMPING_COEFFICIENT("N*s/m"),
    /** rad/s: frequencies are angular inside the core. */
    FREQUENCY("rad/s"),
    /** m/s. */
    VELOCITY("m/s"),
    /** m/s^2. */
    ACCELERATION("m/s^2"),
    /** kg*m, the unbalance of a rotor (mass times eccentricity). */
    UNBALANCE("kg*m"),
    /** pure number. */
    RATIO(""),
    /** rad/s^2: how fast a speed changes (a run-up rate). */
    ANGULAR_ACCELERATION("rad/s^2"),
    /** Pa: a spring's shear stress, a wire's tensile strength. */
    STRESS("Pa"),
    /** T: the magnetic flux density across an eddy-current damper's gap. */
    FLUX_DENSITY("T"),
    /** s: a duration (an absorber's service life is stated in hours). */
    TIME("s");

    private final String siSymbol;

    Dimension(String siSymbol) {
        this.siSymbol = siSymbol;
    }

    /** @return the symbol of the SI unit used inside the core */
    public String siSymbol() {
        return siSymbol;
    }
}
