package org.counterpoise.core.identify;

import java.util.Arrays;
import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * A measured frequency response function at one point (driving point when the force acts there),
 * SI: angular frequencies in rad/s, strictly increasing; complex values of the given kind; an
 * optional coherence per line (0..1), empty when not measured.
 *
 * @param omega angular frequencies, rad/s
 * @param real real parts, SI of the kind
 * @param imaginary imaginary parts, SI of the kind
 * @param coherence ordinary coherence per line, or an empty array
 * @param kind what was measured
 */
public record MeasuredFrf(double[] omega, double[] real, double[] imaginary, double[] coherence, FrfKind kind) {
    /** The fewest lines any fit here accepts. */
    public static final int MINIMUM_POINTS = 5;

    /** Validates on construction and keeps copies. */
    public MeasuredFrf {
        Checks.present("frf.kind", kind, "receptance, mobility or accelerance");
        int n = omega.length;
        if (n < MINIMUM_POINTS) {
            throw new InvalidInputException("frf", n + " lines", "at least " + MINIMUM_POINTS + " frequency lines");
        }
        if (real.length != n || imaginary.length != n || (coherence.length != 0 && coherence.length != n)) {
            throw new InvalidInputException("frf", "columns of different lengths", "one value of each column per line");
        }
        for (int i = 0; i < n; i++) {
            Checks.positive("frf.frequency[" + i + "]", omega[i]);
            if (i > 0 && !(omega[i] > omega[i - 1])) {
                throw new InvalidInputException("frf.frequency[" + i + "]", Checks.show(omega[i]),
                        "frequencies in increasing order, each line once");
            }
            if (!Double.isFinite(real[i]) || !Double.isFinite(imaginary[i])) {
                throw new InvalidInputException("frf.value[" + i + "]", "not finite", "a finite complex value");
            }
            if (coherence.length != 0) {
                Checks.inRange("frf.coherence[" + i + "]", coherence[i], 0.0, 1.0);
            }
        }
        omega = omega.clone();
        real = real.clone();
        imaginary = imaginary.clone();
        coherence = coherence.clone();
    }

    /** @return the number of frequency lines */
    public int size() {
        return omega.length;
    }

    /**
     * @param i line index
     * @return the measured value at line i
     */
    public Complex value(int i) {
        return new Complex(real[i], imaginary[i]);
    }

    /**
     * @param target the kind wanted
     * @return this measurement converted to {@code target} (multiplied by powers of i omega)
     */
    public MeasuredFrf as(FrfKind target) {
        if (target == kind) {
            return this;
        }
        int n = size();
        double[] re = new double[n];
        double[] im = new double[n];
        for (int i = 0; i < n; i++) {
            Complex c = kind.convert(value(i), omega[i], target);
            re[i] = c.getReal();
            im[i] = c.getImaginary();
        }
        return new MeasuredFrf(omega, re, im, coherence, target);
    }

    /**
     * @param low lowest angular frequency kept, rad/s
     * @param high highest angular frequency kept, rad/s
     * @return the lines within [low, high]
     */
    public MeasuredFrf within(double low, double high) {
        int from = 0;
        while (from < size() && omega[from] < low) {
            from++;
        }
        int to = from;
        while (to < size() && omega[to] <= high) {
            to++;
        }
        if (to - from < MINIMUM_POINTS) {
            throw new InvalidInputException("band", (to - from) + " lines inside",
                    "a band holding at least " + MINIMUM_POINTS + " measured lines");
        }
        return new MeasuredFrf(Arrays.copyOfRange(omega, from, to), Arrays.copyOfRange(real, from, to),
                Arrays.copyOfRange(imaginary, from, to),
                coherence.length == 0 ? coherence : Arrays.copyOfRange(coherence, from, to), kind);
    }

    /** @return the mean coherence, when measured */
    public OptionalDouble meanCoherence() {
        return Arrays.stream(coherence).average();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MeasuredFrf m && kind == m.kind && Arrays.equals(omega, m.omega)
                && Arrays.equals(real, m.real) && Arrays.equals(imaginary, m.imaginary)
                && Arrays.equals(coherence, m.coherence);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(omega) * 31 + Arrays.hashCode(real) + kind.hashCode();
    }

    @Override
    public String toString() {
        return "MeasuredFrf[" + kind.id() + ", " + size() + " lines]";
    }
}
