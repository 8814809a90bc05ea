package org.counterpoise.core.optim;

/**
 * The designer's constraint that holds a peak optimum back from the free optimum. The words are
 * written in {@code io.text}; the core decides on the constant only.
 */
public enum ActiveConstraint {
    /** Nothing holds the optimum back. */
    NONE,
    /** The absorber stroke is on its limit. */
    STROKE_LIMIT,
    /** The absorber damping ratio is held fixed. */
    FIXED_DAMPING,
    /** The tuning ratio is held fixed. */
    FIXED_TUNING,
    /** The optimum lies on a bound of the tuning-ratio search (not a designer's constraint). */
    TUNING_SEARCH_BOUND,
    /**
     * The damping ratio sits on the least a practical damper gives (the robust methods do not go
     * below it; the free optimum asked for less).
     */
    PRACTICAL_DAMPING_FLOOR
}
