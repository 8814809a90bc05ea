package org.counterpoise.testing;

import java.util.Arrays;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.MeasuredFrf;

/**
 * Synthetic measurements made independently of the production model: each mode is a physical
 * single-degree-of-freedom oscillator with mass m, stiffness k = m omega_n^2 and viscous damper
 * c = 2 zeta sqrt(k m), driven at its mass, so its receptance is 1/(k - m omega^2 + i c omega)
 * (Newton's second law; common practice). Velocity and acceleration are i omega and -omega^2 times
 * the displacement. Noise is proportional, complex Gaussian with a fixed seed:
 * H (1 + noise (g1 + i g2)).
 */
public final class SyntheticFrf {
    private SyntheticFrf() {
    }

    /** One mode: natural frequency in Hz, damping ratio, modal mass in kg. */
    public record Mode(double frequencyHz, double dampingRatio, double massKg) {
        Complex receptance(double w) {
            double wn = 2.0 * Math.PI * frequencyHz;
            double k = massKg * wn * wn;
            double c = 2.0 * dampingRatio * Math.sqrt(k * massKg);
            return Complex.ONE.divide(new Complex(k - massKg * w * w, c * w));
        }
    }

    /**
     * @param kind what to measure
     * @param fromHz first line, Hz
     * @param toHz last line, Hz
     * @param lines number of equally spaced lines
     * @param noise relative noise (0 for exact data)
     * @param seed random seed
     * @param modes the modes
     * @return the measurement
     */
    public static MeasuredFrf of(FrfKind kind, double fromHz, double toHz, int lines, double noise, long seed,
            Mode... modes) {
        double[] w = new double[lines];
        double[] re = new double[lines];
        double[] im = new double[lines];
        Random random = new Random(seed);
        for (int i = 0; i < lines; i++) {
            w[i] = 2.0 * Math.PI * (fromHz + (toHz - fromHz) * i / (lines - 1));
            Complex h = Complex.ZERO;
            for (Mode m : modes) {
                h = h.add(m.receptance(w[i]));
            }
            Complex iw = new Complex(0.0, w[i]);
            if (kind == FrfKind.MOBILITY) {
                h = h.multiply(iw);
            } else if (kind == FrfKind.ACCELERANCE) {
                h = h.multiply(-w[i] * w[i]);
            }
            h = h.multiply(new Complex(1.0 + noise * random.nextGaussian(), noise * random.nextGaussian()));
            re[i] = h.getReal();
            im[i] = h.getImaginary();
        }
        return new MeasuredFrf(w, re, im, new double[0], kind);
    }

    /**
     * @param frf a measurement
     * @param drop every line whose index modulo {@code drop} is 1 is removed
     * @return the measurement with every {@code drop}-th line missing
     */
    public static MeasuredFrf withoutEvery(MeasuredFrf frf, int drop) {
        int kept = 0;
        double[] w = new double[frf.size()];
        double[] re = new double[frf.size()];
        double[] im = new double[frf.size()];
        for (int i = 0; i < frf.size(); i++) {
            if (i % drop != 1) {
                w[kept] = frf.omega()[i];
                re[kept] = frf.real()[i];
                im[kept] = frf.imaginary()[i];
                kept++;
            }
        }
        return new MeasuredFrf(Arrays.copyOf(w, kept), Arrays.copyOf(re, kept),
                Arrays.copyOf(im, kept), new double[0], frf.kind());
    }
}
