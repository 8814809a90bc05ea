package org.counterpoise.core.realisation;

/**
 * The checks a realisation makes, each a demand against a capacity (see {@link DesignCheck}). The
 * spring, elastomer and damper designs add the kinds they check; the words are in io.text.
 */
public enum CheckKind {
    /**
     * The springs' total rate off the design's (|total / design - 1|) against the tolerance the spring
     * rate must hold: fails when no stock spring gives the rate.
     */
    SPRING_RATE("spring-rate"),
    /** Corrected shear stress at the largest working load against the permissible static stress. */
    SPRING_STATIC_STRESS("spring-static-stress"),
    /** Alternating stress against the fatigue strength at the service cycles and the mean stress. */
    SPRING_FATIGUE("spring-fatigue"),
    /** Working deflection against the critical buckling deflection. */
    SPRING_BUCKLING("spring-buckling"),
    /** The highest forcing frequency (times the margin) against the spring's surge frequency. */
    SPRING_SURGE("spring-surge"),
    /** The largest compression against the compression available before the coils touch. */
    SPRING_SOLID("spring-solid"),
    /** The loss factor the design needs against the compound's. */
    ELASTOMER_LOSS_FACTOR("elastomer-loss-factor"),
    /** The stroke the damper must allow against its usable stroke. */
    DAMPER_STROKE("damper-stroke"),
    /** An eddy-current damper's plate thickness against the skin depth at the highest forcing frequency. */
    EDDY_CURRENT_SKIN_DEPTH("eddy-current-skin-depth");

    private final String id;

    CheckKind(String id) {
        this.id = id;
    }

    /** @return the identifier in the JSON */
    public String id() {
        return id;
    }
}
