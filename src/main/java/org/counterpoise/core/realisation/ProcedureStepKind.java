package org.counterpoise.core.realisation;

/** The steps of tuning and commissioning, in order; the words are in io.text. */
public enum ProcedureStepKind {
    /** Measure the structure's natural frequency with the absorber locked or not yet fitted. */
    MEASURE_STRUCTURE,
    /** Check the measured structure frequency against the range the design holds; the absorber keeps its design frequency. */
    COMPUTE_ABSORBER_TARGET,
    /** Tune the absorber alone (tap test or shaker) to the target within the tolerance. */
    TUNE_ABSORBER,
    /** Fit the absorber, check the clearances and the fixings. */
    FIT,
    /** Measure the response at the running speed and over the band. */
    MEASURE_RESPONSE,
    /** Compare with the predicted response table. */
    COMPARE,
    /** Adjust by the trim step when the reading is off. */
    ADJUST
}
