package org.counterpoise.core.realisation;

/** How the absorber's damping is realised. */
public enum DamperKind {
    /** A viscous (fluid) dashpot bought or made to the required coefficient. */
    VISCOUS_DASHPOT("viscous-dashpot"),
    /** A conducting plate moving through a magnet gap: force proportional to velocity, no fluid, no wear. */
    EDDY_CURRENT("eddy-current"),
    /** The loss of the elastomer spring itself (with {@link SpringKind#ELASTOMER} only). */
    ELASTOMER_LOSS("elastomer-loss");

    private final String id;

    DamperKind(String id) {
        this.id = id;
    }

    /** @return the identifier in project files, the JSON and on the command line */
    public String id() {
        return id;
    }
}
