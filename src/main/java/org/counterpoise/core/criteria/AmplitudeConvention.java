package org.counterpoise.core.criteria;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * How an oscillating value is stated: its peak (amplitude), its root mean square or its
 * peak-to-peak excursion. For one steady harmonic of amplitude A: r.m.s. = A / sqrt 2 and
 * peak-to-peak = 2 A (definitions; any vibration text, e.g. Harris and Piersol 2002, Shock and
 * Vibration Handbook, 5th ed., ch. 1).
 *
 * <p>Several harmonics at distinct frequencies (the orders of a rotor) add: the r.m.s. of the sum
 * is the square root of the sum of the squared r.m.s. values, exactly (the cross terms average to
 * zero over a long time); the peak of the sum is at most the sum of the amplitudes and reaches it
 * when the phases line up, which they do at some instant for incommensurate frequencies and may do
 * for integer orders whose phases nobody knows, so the sum of amplitudes is taken (the safe side).
 */
public enum AmplitudeConvention {
    /** The amplitude of the oscillation (zero to peak). */
    PEAK("peak", "peak"),
    /** The root mean square over a long time. */
    RMS("rms", "r.m.s."),
    /** The whole excursion from the lowest to the highest value. */
    PEAK_TO_PEAK("peak-to-peak", "peak-to-peak");

    private final String id;
    private final String label;

    AmplitudeConvention(String id, String label) {
        this.id = id;
        this.label = label;
    }

    /** @return the id in project files and on the command line */
    public String id() {
        return id;
    }

    /** @return words for reports */
    public String label() {
        return label;
    }

    /** @return the prefix of JSON keys that hold values in this convention: peak, rms, peak_to_peak */
    public String keyPrefix() {
        return id.replace('-', '_');
    }

    /**
     * @param amplitude the amplitude (peak) of one steady harmonic, &gt;= 0
     * @return the same harmonic stated in this convention
     */
    public double ofHarmonic(double amplitude) {
        return switch (this) {
            case PEAK -> amplitude;
            case RMS -> amplitude / Math.sqrt(2.0);
            case PEAK_TO_PEAK -> 2.0 * amplitude;
        };
    }

    /**
     * @param amplitudes the amplitudes (peaks) of harmonics at distinct frequencies, each &gt;= 0
     * @return their sum stated in this convention (class comment: exact for r.m.s., the upper bound
     *     for peak and peak-to-peak)
     */
    public double ofSum(double... amplitudes) {
        if (this == RMS) {
            double sumOfSquares = 0;
            for (double a : amplitudes) {
                sumOfSquares += a * a;
            }
            return Math.sqrt(sumOfSquares / 2.0);
        }
        return ofHarmonic(Arrays.stream(amplitudes).sum());
    }

    /** @return every id, for messages */
    public static List<String> ids() {
        return Arrays.stream(values()).map(AmplitudeConvention::id).toList();
    }

    /**
     * @param id an id
     * @return the convention, if the id names one
     */
    public static Optional<AmplitudeConvention> byId(String id) {
        return Arrays.stream(values()).filter(c -> c.id.equals(id)).findFirst();
    }
}
