package org.counterpoise.core.criteria;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.ExcitationOrder;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;

/**
 * The independent route the verdict is checked against: the steady harmonic response of the
 * structure (m1, k1, c1 to the base) with or without the absorber (m2, k2, c2 to the structure)
 * from Newton's second law for each mass, solved in complex amplitudes at each forcing frequency
 * (Den Hartog 1956, Mechanical Vibrations, 4th ed., ch. 3; any vibration text):
 *
 * <pre>
 *   (k1 + k2 - m1 w^2 + i w (c1 + c2)) X1 - (k2 + i w c2) X2 = F + (k1 + i w c1) U
 *   -(k2 + i w c2) X1 + (k2 - m2 w^2 + i w c2) X2 = 0
 * </pre>
 *
 * F = force amplitude, or m_u e w^2 for an unbalance; U = base displacement amplitude, or -A / w^2
 * for a base acceleration A. The ISO 2631-1:1997 Annex A weightings are written out here in complex
 * arithmetic from the standard's formulae and constants (checked against its Table 3 in
 * {@link AssessorTest}). Nothing from the production algebra (TransferFunctions, ResponseScale,
 * FrequencyWeighting, PeakFinder) is used, and maxima are found by brute force: a dense logarithmic
 * grid, then golden-section refinement around the best grid points.
 */
final class NewtonReference {
    private final double m1;
    private final double k1;
    private final double c1;
    private final double m2;
    private final double k2;
    private final double c2;

    NewtonReference(Structure structure, Tuning tuning) {
        double phi2 = structure.modeShapeAtAbsorber() * structure.modeShapeAtAbsorber();
        m1 = structure.modalMass() / phi2;
        k1 = structure.modalStiffness() / phi2;
        c1 = 2 * structure.dampingRatio() * Math.sqrt(k1 * m1);
        if (tuning == null) {
            m2 = 0;
            k2 = 0;
            c2 = 0;
        } else {
            double omegaA = tuning.tuningRatio() * Math.sqrt(k1 / m1);
            m2 = tuning.massRatio() * m1;
            k2 = m2 * omegaA * omegaA;
            c2 = 2 * tuning.dampingRatio() * m2 * omegaA;
        }
    }

    /** @return the SI complex amplitude of the quantity under one order at angular frequency w */
    Complex response(ResponseKind quantity, ExcitationKind kind, double amplitude, double w) {
        Complex force = switch (kind) {
            case FORCE -> new Complex(amplitude);
            case UNBALANCE -> new Complex(amplitude * w * w);
            default -> Complex.ZERO;
        };
        Complex base = switch (kind) {
            case BASE_DISPLACEMENT -> new Complex(amplitude);
            case BASE_ACCELERATION -> new Complex(-amplitude / (w * w));
            default -> Complex.ZERO;
        };
        Complex baseSpring = new Complex(k1, w * c1);
        Complex rhs = force.add(base.multiply(baseSpring));
        Complex x1;
        if (m2 == 0) {
            x1 = rhs.divide(new Complex(k1 - m1 * w * w, w * c1));
        } else {
            Complex a11 = new Complex(k1 + k2 - m1 * w * w, w * (c1 + c2));
            Complex a12 = new Complex(-k2, -w * c2);
            Complex a22 = new Complex(k2 - m2 * w * w, w * c2);
            // Cramer's rule for the 2 x 2 system
            x1 = rhs.multiply(a22).divide(a11.multiply(a22).subtract(a12.multiply(a12)));
        }
        Complex iw = new Complex(0, w);
        return switch (quantity) {
            case DISPLACEMENT -> x1;
            case VELOCITY -> x1.multiply(iw);
            case ACCELERATION -> x1.multiply(-w * w);
            case RELATIVE_DISPLACEMENT -> x1.subtract(base);
            case TRANSMITTED_FORCE -> baseSpring.multiply(x1.subtract(base));
            default -> throw new IllegalArgumentException(quantity.name());
        };
    }

    /** @return |W| of an ISO 2631-1:1997 Annex A weighting at a frequency, Hz (formulae A.1 to A.4) */
    static double weighting(FrequencyWeighting w, double hertz) {
        // constants of ISO 2631-1:1997 Table A.1 (Annex A), typed here from the standard's table
        double f1 = 0.4;
        double f2 = 100;
        double f3;
        double f4;
        double q4 = 0.63;
        double f5 = Double.POSITIVE_INFINITY;
        double q5 = 0;
        double f6 = Double.POSITIVE_INFINITY;
        double q6 = 0;
        if (w == FrequencyWeighting.WK) {
            f3 = 12.5;
            f4 = 12.5;
            f5 = 2.37;
            q5 = 0.91;
            f6 = 3.35;
            q6 = 0.91;
        } else if (w == FrequencyWeighting.WD) {
            f3 = 2.0;
            f4 = 2.0;
        } else {
            throw new IllegalArgumentException(w.name());
        }
        Complex s = new Complex(0, 2 * Math.PI * hertz);
        double w1 = 2 * Math.PI * f1;
        double w2 = 2 * Math.PI * f2;
        double w3 = 2 * Math.PI * f3;
        double w4 = 2 * Math.PI * f4;
        Complex one = Complex.ONE;
        Complex hh = one.divide(one.add(s.reciprocal().multiply(w1 * Math.sqrt(2)))
                .add(s.reciprocal().multiply(w1).pow(2)));
        Complex hl = one.divide(one.add(s.divide(w2).multiply(Math.sqrt(2))).add(s.divide(w2).pow(2)));
        Complex ht = one.add(s.divide(w3)).divide(one.add(s.divide(q4 * w4)).add(s.divide(w4).pow(2)));
        Complex h = hh.multiply(hl).multiply(ht);
        if (Double.isFinite(f5)) {
            double w5 = 2 * Math.PI * f5;
            double w6 = 2 * Math.PI * f6;
            Complex hs = one.add(s.divide(q5 * w5)).add(s.divide(w5).pow(2))
                    .divide(one.add(s.divide(q6 * w6)).add(s.divide(w6).pow(2))).multiply(w5 * w5 / (w6 * w6));
            h = h.multiply(hs);
        }
        return h.abs();
    }

    /**
     * @return each order's SI amplitude at the design order's frequency w (weighted where w given)
     */
    double[] amplitudes(ResponseKind quantity, List<ExcitationOrder> orders, FrequencyWeighting weighting, double w) {
        double[] out = new double[orders.size()];
        for (int j = 0; j < out.length; j++) {
            ExcitationOrder o = orders.get(j);
            double wj = o.frequencyFactor() * w;
            double a = response(quantity, o.kind(), o.amplitude(), wj).abs();
            out[j] = weighting == null ? a : a * weighting(weighting, wj / (2 * Math.PI));
        }
        return out;
    }

    /**
     * Brute-force maximum of a function of the angular frequency over a closed band.
     * @return {w, value}
     */
    static double[] maximise(DoubleUnaryOperator f, double low, double high) {
        if (high <= low) {
            return new double[] {low, f.applyAsDouble(low)};
        }
        int n = 20000;
        double[] w = new double[n + 1];
        double[] v = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            w[i] = i == n ? high : low * Math.pow(high / low, (double) i / n);
            v[i] = f.applyAsDouble(w[i]);
        }
        double[] best = {low, v[0]};
        for (int i = 0; i <= n; i++) {
            if (v[i] > best[1]) {
                best[0] = w[i];
                best[1] = v[i];
            }
            boolean localMax = (i == 0 || v[i] >= v[i - 1]) && (i == n || v[i] >= v[i + 1]);
            if (localMax && i > 0 && i < n) {
                // golden-section search on the two grid intervals around the local maximum
                double a = w[i - 1];
                double b = w[i + 1];
                double r = (Math.sqrt(5) - 1) / 2;
                double c = b - r * (b - a);
                double d = a + r * (b - a);
                double fc = f.applyAsDouble(c);
                double fd = f.applyAsDouble(d);
                for (int k = 0; k < 200 && b - a > 1e-15 * b; k++) {
                    if (fc > fd) {
                        b = d;
                        d = c;
                        fd = fc;
                        c = b - r * (b - a);
                        fc = f.applyAsDouble(c);
                    } else {
                        a = c;
                        c = d;
                        fc = fd;
                        d = a + r * (b - a);
                        fd = f.applyAsDouble(d);
                    }
                }
                double m = 0.5 * (a + b);
                double fm = f.applyAsDouble(m);
                if (fm > best[1]) {
                    best[0] = m;
                    best[1] = fm;
                }
            }
        }
        return best;
    }
}
