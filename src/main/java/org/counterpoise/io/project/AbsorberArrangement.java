package org.counterpoise.io.project;

/**
 * How the absorbers of a project are arranged on its structure (the file's
 * {@code absorbers.arrangement}, since format 7).
 */
public enum AbsorberArrangement {
    /** Every absorber on one mode, the target, at one point (format 6's only arrangement; the default). */
    ONE_MODE,
    /** One absorber on each of two named modes, designed jointly (since format 7). */
    ONE_PER_MODE
}
