package org.counterpoise.core.realisation;

/**
 * How the helical springs hold the absorber mass. A compression spring must never unload: a spring
 * that lifts off its seat each cycle hammers, wears its ends and stops acting as the rate the
 * tuning assumes (common practice).
 */
public enum SpringArrangement {
    /**
     * The springs stand under the mass and carry its weight: the static load keeps them compressed
     * through the whole cycle (it exceeds the dynamic amplitude with a reserve).
     */
    SEATED("seated"),
    /**
     * Springs in opposed pairs, one on each side of the mass along the axis, each compressed at
     * assembly by a preload larger than the dynamic amplitude: both stay in compression through the
     * cycle and the pair acts with twice one spring's rate. Used when the static load is smaller
     * than the dynamic amplitude (a horizontal absorber, or a light one on stiff springs).
     */
    OPPOSED_PRELOADED_PAIRS("opposed-preloaded-pairs");

    private final String id;

    SpringArrangement(String id) {
        this.id = id;
    }

    /** @return the identifier in the JSON */
    public String id() {
        return id;
    }
}
