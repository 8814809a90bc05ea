package org.counterpoise.core.commission;

/**
 * What makes a commissioning finding doubtful or calls for action; its words are written in
 * {@code io}. The limits are common practice for site checks, with no single source.
 */
public enum CommissioningWarning {
    /** The fitted model misses more than {@link #POOR_FIT_LIMIT} of the measured response. */
    POOR_FIT,
    /** A fitted absorber frequency came out far from its design's (below 0.55 or above 1.8 times it). */
    FREQUENCY_AT_SEARCH_EDGE,
    /** The trim needed is more than the plates supplied can give: the spring (or the mass) is off. */
    BEYOND_TRIM_RANGE,
    /** The absorber's damping is outside its part tolerance. */
    DAMPING_OUT_OF_TOLERANCE,
    /** The operating response differs from the prediction by more than a factor {@link #DISAGREEMENT_FACTOR}. */
    OPERATING_DISAGREES,
    /** With the disturbance the site shows, the absorber's stroke would use up its clearance. */
    STROKE_BEYOND_CLEARANCE,
    /** The spectrum's largest line lies away from the running speed and is more than {@link #OTHER_LINE_FACTOR} times the line at it. */
    OTHER_LINE_DOMINATES,
    /** A fitted natural frequency of the structure lies more than {@link #STRUCTURE_FAR} from the design's. */
    STRUCTURE_FREQUENCY_FAR,
    /** Trimming the absorbers to their targets would not lower the peak over the band: no trim is advised. */
    TRIM_DOES_NOT_HELP,
    /** The set designed again for the structure as measured does not keep the project's spillover limit there. */
    SPILLOVER_LIMIT_NOT_KEPT;

    /** A fitted structure frequency further than this fraction from the design's is doubted. */
    public static final double STRUCTURE_FAR = 0.15;

    /** Normalised residual above which the as-built fit is called poor (as for a modal fit). */
    public static final double POOR_FIT_LIMIT = 0.1;
    /** Ratio of measured to predicted operating response beyond which (or below whose inverse) they disagree. */
    public static final double DISAGREEMENT_FACTOR = 1.5;
    /** How much larger a line away from the running speed must be to be said to dominate. */
    public static final double OTHER_LINE_FACTOR = 2.0;
}
