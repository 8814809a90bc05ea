package org.counterpoise.core.error;

import java.util.List;

/**
 * What a {@link Warning} is about. The constant's name is the stable code written to JSON outputs
 * and compared by the golden results, so a name never changes; the words live in
 * {@code io.text.WarningText}. Each kind lists the parameters it carries.
 */
public enum WarningKind {
    /** A closed form that assumes an undamped structure was used on a damped one. */
    DAMPED_STRUCTURE(WarningParameter.METHOD_ID, WarningParameter.STRUCTURE_DAMPING_RATIO),
    /** The robust-design search stopped at its evaluation limit. */
    OPTIMUM_NOT_VERIFIED,
    /** A one-frequency disturbance designed by exact peak: says which band was used. */
    SINGLE_FREQUENCY_EXACT(WarningParameter.PEAK_BAND),
    /** No absorber up to the largest mass ratio meets the target. */
    TARGET_NOT_MET(WarningParameter.MAX_MASS_RATIO),
    /**
     * No absorber up to the largest mass ratio meets the acceptance criterion: the best at that
     * ratio, its utilisation (as designed for exact-peak, over the tolerances for the robust methods).
     */
    CRITERION_NOT_MET(WarningParameter.MAX_MASS_RATIO, WarningParameter.UTILISATION, WarningParameter.METHOD_ID),
    /** No absorber up to the largest mass ratio gives the criterion's measure a finite bound. */
    CRITERION_NOT_MET_UNBOUNDED(WarningParameter.MAX_MASS_RATIO),
    /**
     * The bare structure already meets the acceptance criterion: no absorber is needed; the design
     * shown is the lightest considered.
     */
    NO_ABSORBER_NEEDED(WarningParameter.UTILISATION, WarningParameter.MASS_RATIO),
    /** The bare structure is undamped and resonant in the band. */
    RESONANT_UNDAMPED,
    /** The absorber makes the response that matters larger. */
    WORSE_WITH_ABSORBER,
    /** The mass ratio is unusually large. */
    HEAVY_ABSORBER(WarningParameter.MASS_RATIO),
    /** The mass ratio is very small. */
    LIGHT_ABSORBER(WarningParameter.MASS_RATIO),
    /** One forcing frequency with a design for all frequencies. */
    SINGLE_FREQUENCY,
    /** An undamped absorber tuned to the centre of a band. */
    UNDAMPED_IN_BAND,
    /** The lower coupled natural frequency lies below the band. */
    START_UP_RESONANCE(WarningParameter.LOWER_NATURAL_FREQUENCY, WarningParameter.UPPER_NATURAL_FREQUENCY),
    /**
     * The machine criterion's class says a rigid support, but the structure's natural frequency is not
     * 25 % above the forcing (ISO 10816-3:2009, 4.3): by the standard's own definition the support is
     * flexible, whose zone limits are higher.
     */
    SUPPORT_NOT_RIGID(WarningParameter.STRUCTURE_NATURAL_FREQUENCY, WarningParameter.FORCING_FREQUENCY),
    /** The run-up stroke is unbounded (no absorber damping). */
    UNBOUNDED_TRANSIT_STROKE,
    /** The absorber has no damping and the band is not one frequency. */
    NO_DAMPING,
    /** The structure frequency range within which the peak rises by at most 10 % is narrower than the stated range. */
    STRUCTURE_TOLERANCE_NARROW(WarningParameter.TOLERATED_LOW, WarningParameter.TOLERATED_HIGH,
            WarningParameter.STATED_RANGE, WarningParameter.METHOD_ID),
    /** The same for the absorber's frequency. */
    ABSORBER_TOLERANCE_NARROW(WarningParameter.TOLERATED_LOW, WarningParameter.TOLERATED_HIGH,
            WarningParameter.STATED_RANGE, WarningParameter.METHOD_ID),
    /** The absorber damping ratio is below what a practical damper gives. */
    DAMPING_BELOW_PRACTICAL(WarningParameter.ABSORBER_DAMPING_RATIO, WarningParameter.PRACTICAL_DAMPING_RATIO),
    /** The stroke during run-up is more than twice the stroke in band. */
    RUN_UP_STROKE_LARGE(WarningParameter.RUN_UP_STROKE, WarningParameter.IN_BAND_STROKE,
            WarningParameter.RUN_UP_BASIS),
    /** The stroke during run-up exceeds the stroke limit. */
    RUN_UP_OVER_STROKE_LIMIT(WarningParameter.RUN_UP_STROKE, WarningParameter.STROKE_LIMIT,
            WarningParameter.RUN_UP_BASIS),
    /** The largest stroke the damper sees in service exceeds the clearance it is made to allow. */
    DAMPER_STROKE_OVER_CLEARANCE(WarningParameter.DAMPER_STROKE, WarningParameter.CLEARANCE),
    /** An eddy-current damper's plate is thicker than the skin depth at the highest forcing frequency. */
    EDDY_CURRENT_PLATE_THICK(WarningParameter.PLATE_THICKNESS, WarningParameter.SKIN_DEPTH),
    /**
     * The workshop's mass tolerance leaves no room for the spring rate within the absorber frequency
     * tolerance (the mass alone can move the frequency by as much).
     */
    MASS_TOLERANCE_TOO_LOOSE(WarningParameter.MASS_TOLERANCE, WarningParameter.FREQUENCY_TOLERANCE),
    /** A helical spring's stress exceeds the permissible (EN 13906-1); the utilisation is demand over capacity. */
    SPRING_OVERSTRESSED(WarningParameter.UTILISATION),
    /** A helical spring's stress amplitude exceeds its fatigue strength at the mean stress. */
    SPRING_FATIGUE(WarningParameter.UTILISATION),
    /** A helical spring's working deflection exceeds its buckling deflection. */
    SPRING_BUCKLES(WarningParameter.UTILISATION),
    /** The forcing (with its margin) reaches a helical spring's surge frequency. */
    SPRING_SURGE(WarningParameter.UTILISATION),
    /** A helical spring's working compression leaves less than the standard's minimum gaps before solid. */
    SPRING_GOES_SOLID(WarningParameter.UTILISATION),
    /**
     * An elastomer element whose compound loss factor misses the loss factor the hysteretic optimum
     * needs, so that the peak with the compound's own loss factor exceeds the design's promised peak by
     * more than the allowance (the utilisation is that peak over the allowed one).
     */
    ELASTOMER_LOSS_FACTOR_MISSED(WarningParameter.COMPOUND_LOSS_FACTOR, WarningParameter.LOSS_FACTOR_NEEDED,
            WarningParameter.UTILISATION),
    /** No helical springs of stock wire give the design's rate: the closest are shown, off by this much. */
    SPRING_RATE_NOT_MET(WarningParameter.RATE_DEVIATION),
    /**
     * The project asked for an odd number of helical springs, but the absorber's static load is
     * smaller than its dynamic load, so its springs stand in opposed preloaded pairs: the sizing used
     * the next even count (the parameter), which the part list shows.
     */
    SPRING_COUNT_MADE_EVEN(WarningParameter.SPRING_COUNT);

    private final List<WarningParameter> parameters;

    WarningKind(WarningParameter... parameters) {
        this.parameters = List.of(parameters);
    }

    /** @return the parameters a warning of this kind carries, in the order its words use them */
    public List<WarningParameter> parameters() {
        return parameters;
    }
}
