package org.counterpoise.core.realisation;

/** The resilient element that gives the absorber its stiffness. */
public enum SpringKind {
    /** Cold-coiled helical compression springs of round wire, designed to EN 13906-1. */
    HELICAL_COMPRESSION("helical-compression"),
    /** An elastomer element (pad or bush) whose loss factor is also the absorber's damping. */
    ELASTOMER("elastomer");

    private final String id;

    SpringKind(String id) {
        this.id = id;
    }

    /** @return the identifier in project files, the JSON and on the command line */
    public String id() {
        return id;
    }
}
