package org.counterpoise.io.project;

import java.util.Locale;
import org.counterpoise.core.units.Dimension;

/**
 * The manufacturing tolerances a project may give, in the one order the file, the wizard and the
 * Monte Carlo use: each with its key under {@code robustness.tolerances} in the project file, the
 * words that name it, and the dimension of an absolute amount. The one list of them.
 */
public enum ToleranceKey {
    /** The structure's modal mass. */
    STRUCTURE_MASS("Structure mass", Dimension.MASS),
    /** The structure's modal stiffness. */
    STRUCTURE_STIFFNESS("Structure stiffness", Dimension.STIFFNESS),
    /** The absorber's mass. */
    ABSORBER_MASS("Absorber mass", Dimension.MASS),
    /** The absorber's spring rate. */
    ABSORBER_STIFFNESS("Absorber spring rate", Dimension.STIFFNESS),
    /** The absorber's damping coefficient. */
    ABSORBER_DAMPING("Absorber damping", Dimension.DAMPING_COEFFICIENT);

    private final String label;
    private final Dimension dimension;

    ToleranceKey(String label, Dimension dimension) {
        this.label = label;
        this.dimension = dimension;
    }

    /** @return the key in the project file's {@code robustness.tolerances} object: the name in lower case */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** @return the field's path in a project file, e.g. {@code robustness.tolerances.structure_mass} */
    public String path() {
        return "robustness.tolerances." + key();
    }

    /** @return the words that name it, capitalised */
    public String label() {
        return label;
    }

    /** @return the dimension of an absolute amount */
    public Dimension dimension() {
        return dimension;
    }

    /**
     * @param r the robustness section as typed
     * @return this tolerance of it, or null when not given
     */
    public RobustnessInput.ToleranceInput of(RobustnessInput r) {
        return switch (this) {
            case STRUCTURE_MASS -> r.structureMass();
            case STRUCTURE_STIFFNESS -> r.structureStiffness();
            case ABSORBER_MASS -> r.absorberMass();
            case ABSORBER_STIFFNESS -> r.absorberStiffness();
            case ABSORBER_DAMPING -> r.absorberDamping();
        };
    }
}
