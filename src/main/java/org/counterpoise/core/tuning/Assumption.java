package org.counterpoise.core.tuning;

/** What a closed-form tuning assumes about the system; the core decides on these, never on a note's words. */
public enum Assumption {
    /** The structure has no damping of its own (zeta1 = 0). */
    UNDAMPED_STRUCTURE,
    /** The excitation is white noise (a flat spectrum over all frequencies). */
    WHITE_NOISE
}
