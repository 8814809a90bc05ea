package org.counterpoise.core.criteria;

/** How the responses to several excitation orders are judged together. */
public enum OrderCombination {
    /**
     * The orders add into one broadband value (r.m.s. of the sum, or the sum of amplitudes for peak
     * conventions, {@link AmplitudeConvention#ofSum}) judged against a flat limit: machine severity,
     * ISO 2631-1 weighted r.m.s., a flat user limit.
     */
    TOGETHER,
    /**
     * Each order is judged on its own against the limit at its own frequency, as one-third-octave
     * band values are (building curves, vibration criterion curves, a user's curve): orders of a
     * rotor lie in different one-third-octave bands unless their frequencies are within a factor
     * 2^(1/3) of each other, which the verdict then combines (r.m.s. of the sum in that band).
     */
    EACH_ORDER
}
