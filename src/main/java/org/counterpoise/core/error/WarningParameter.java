package org.counterpoise.core.error;

/**
 * A value a {@link Warning} carries, in SI units (frequencies angular, rad/s), or a token (a
 * stable identifier such as a design method's id, never words).
 */
public enum WarningParameter {
    /** The absorber's mass ratio mu = m2 / m1 (non-dimensional). */
    MASS_RATIO(false),
    /** The largest mass ratio considered when sizing for a target (non-dimensional). */
    MAX_MASS_RATIO(false),
    /**
     * A criterion's utilisation: the judged value over the limit where that ratio is largest (at
     * most 1 meets the criterion; non-dimensional).
     */
    UTILISATION(false),
    /** The structure's damping ratio zeta1 (non-dimensional). */
    STRUCTURE_DAMPING_RATIO(false),
    /** The structure's own natural frequency (without the absorber), rad/s. */
    STRUCTURE_NATURAL_FREQUENCY(false),
    /** The highest forcing frequency of the design order's band, rad/s. */
    FORCING_FREQUENCY(false),
    /** The lower undamped natural frequency of the structure with the absorber, rad/s. */
    LOWER_NATURAL_FREQUENCY(false),
    /** The upper undamped natural frequency of the structure with the absorber, rad/s. */
    UPPER_NATURAL_FREQUENCY(false),
    /** The low end of a tolerated frequency range, as a signed change (-0.005 for -0.5 %; non-dimensional). */
    TOLERATED_LOW(false),
    /** The high end of a tolerated frequency range, as a signed change (non-dimensional). */
    TOLERATED_HIGH(false),
    /** A stated (or default) tolerance range, +/- this fraction (non-dimensional). */
    STATED_RANGE(false),
    /** The absorber's damping ratio zeta_a (non-dimensional). */
    ABSORBER_DAMPING_RATIO(false),
    /** The least damping ratio a practical damper gives (non-dimensional). */
    PRACTICAL_DAMPING_RATIO(false),
    /** The absorber's peak stroke during run-up, m. */
    RUN_UP_STROKE(false),
    /** The absorber's peak stroke in the band, m. */
    IN_BAND_STROKE(false),
    /** The stroke limit the designer gave, m. */
    STROKE_LIMIT(false),
    /** Which run-up stroke figure (a {@code core.design.RunUpStroke.Basis} name; a token). */
    RUN_UP_BASIS(true),
    /** The largest stroke a damper sees in service, m. */
    DAMPER_STROKE(false),
    /** The stroke clearance, m. */
    CLEARANCE(false),
    /** A conducting plate's thickness, m. */
    PLATE_THICKNESS(false),
    /** An electromagnetic skin depth, m. */
    SKIN_DEPTH(false),
    /** The absorber mass tolerance, +/- fraction (non-dimensional). */
    MASS_TOLERANCE(false),
    /** The absorber frequency tolerance, +/- fraction (non-dimensional). */
    FREQUENCY_TOLERANCE(false),
    /** The loss factor of the elastomer compound the workshop will use (non-dimensional). */
    COMPOUND_LOSS_FACTOR(false),
    /** The loss factor the hysteretic optimum needs (non-dimensional). */
    LOSS_FACTOR_NEEDED(false),
    /** The springs' total rate over the rate the design needs, minus one (non-dimensional). */
    RATE_DEVIATION(false),
    /** A number of springs in parallel (a count). */
    SPRING_COUNT(false),
    /** The design method's id as files and the command line spell it (a token). */
    METHOD_ID(true),
    /** The band the exact-peak design minimises over for one forcing frequency (a {@link PeakBand} name). */
    PEAK_BAND(true);

    private final boolean token;

    WarningParameter(boolean token) {
        this.token = token;
    }

    /** @return true when the value is a token (String), false when it is a number (Double) */
    public boolean token() {
        return token;
    }

    /** Which band a one-frequency exact-peak design minimises the peak over. */
    public enum PeakBand {
        /** All frequencies (which also covers start-up and mistuning). */
        ALL_FREQUENCIES,
        /** The speeds passed on start-up, up to the forcing frequency. */
        RUN_UP,
        /** The octave either side of the forcing frequency. */
        OCTAVE
    }
}
