package org.counterpoise.core.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.rational.TransferFunction;
import org.junit.jupiter.api.Test;

/**
 * The weightings as rational functions: the reference value ISO 8041-1 prints, and the product
 * form of ISO 2631-1 Annex A evaluated directly in complex numbers (an independent route past the
 * polynomial expansion of {@link FrequencyWeighting#relativeTo}).
 */
class FrequencyWeightingTest {

    @Test
    void wdAtTheReferenceFrequencyIsTheValueOfIso8041Table1() {
        // ISO 8041-1:2017 Table 1: reference frequency 100 rad/s = 15.915 Hz for whole-body
        // weightings; |Wd| there is 0.1261 (as transcribed in jmrplens/phonometry).
        assertEquals(0.1261, FrequencyWeighting.WD.factorAt(100 / (2 * Math.PI)), 0.00005);
    }

    @Test
    void polynomialFormEqualsTheProductOfTheFourStages() {
        // ISO 2631-1:1997 Annex A (ISO 8041-1:2017 Formulae (1)-(5)): H = Hh Hl Ht Hs, evaluated
        // stage by stage in complex numbers with the constants written out here again.
        double inf = Double.POSITIVE_INFINITY;
        double wmCorner = 1 / (0.028 * 2 * Math.PI);
        check(FrequencyWeighting.WK, 0.4, 100, 12.5, 12.5, 0.63, 2.37, 0.91, 3.35, 0.91);
        check(FrequencyWeighting.WD, 0.4, 100, 2.0, 2.0, 0.63, inf, 1, inf, 1);
        check(FrequencyWeighting.WM, Math.pow(10, -0.1), 100, wmCorner, wmCorner, 0.5, inf, 1, inf, 1);
    }

    @Test
    void anyReferenceFrequencyGivesTheSameFactors() {
        // The weighting in the structure's variable g = omega / omega1 must not depend on omega1.
        for (FrequencyWeighting w : FrequencyWeighting.values()) {
            for (double omega1 : new double[] {2 * Math.PI * 0.7, 2 * Math.PI * 14.2, 900.0}) {
                TransferFunction h = w.relativeTo(omega1);
                for (double f : new double[] {0.3, 1, 4, 6.3, 16, 63, 250}) {
                    double expected = w.factorAt(f);
                    assertEquals(expected, h.magnitude(2 * Math.PI * f / omega1), 1e-12 * expected,
                            w.symbol() + " at " + f + " Hz with omega1 " + omega1);
                }
            }
        }
    }

    @Test
    void peaksAreWhereTheWeightingsPutThem() {
        // Wk weights vertical vibration most near 4 to 8 Hz, Wd horizontal near 1 to 2 Hz
        // (ISO 2631-1:1997 Table 3: Wk peaks at 1054 per mille at 6.3 Hz, Wd at 1011 at 1 Hz).
        assertEquals(1.054, FrequencyWeighting.WK.factorAt(6.3), 0.0005);
        assertEquals(1.011, FrequencyWeighting.WD.factorAt(1.0), 0.0005);
        assertTrue(FrequencyWeighting.WK.factorAt(6.3) > FrequencyWeighting.WK.factorAt(2.0));
        assertTrue(FrequencyWeighting.WD.factorAt(1.0) > FrequencyWeighting.WD.factorAt(8.0));
    }

    @Test
    void symbolsIdsAndSources() {
        assertEquals("Wk", FrequencyWeighting.WK.symbol());
        assertEquals("wd", FrequencyWeighting.WD.id());
        assertTrue(FrequencyWeighting.WK.source().contains("ISO 2631-1:1997"));
        assertTrue(FrequencyWeighting.WM.source().contains("ISO 2631-2:2003"));
    }

    private static void check(FrequencyWeighting w, double f1, double f2, double f3, double f4, double q4,
            double f5, double q5, double f6, double q6) {
        for (int band = -10; band <= 26; band++) {
            double f = Math.pow(10, band / 10.0) * 1.07; // off the band centres on purpose
            Complex s = new Complex(0, 2 * Math.PI * f);
            Complex h = highPass(s, f1).multiply(lowPass(s, f2)).multiply(transition(s, f3, f4, q4))
                    .multiply(step(s, f5, q5, f6, q6));
            assertEquals(h.abs(), w.factorAt(f), 1e-12 * h.abs(), w.symbol() + " at " + f + " Hz");
        }
    }

    private static Complex highPass(Complex s, double f1) {
        Complex r = new Complex(2 * Math.PI * f1).divide(s);
        return Complex.ONE.divide(Complex.ONE.add(r.multiply(Math.sqrt(2))).add(r.multiply(r)));
    }

    private static Complex lowPass(Complex s, double f2) {
        Complex r = s.divide(2 * Math.PI * f2);
        return Complex.ONE.divide(Complex.ONE.add(r.multiply(Math.sqrt(2))).add(r.multiply(r)));
    }

    private static Complex transition(Complex s, double f3, double f4, double q4) {
        Complex num = Double.isInfinite(f3) ? Complex.ONE : Complex.ONE.add(s.divide(2 * Math.PI * f3));
        Complex r4 = s.divide(2 * Math.PI * f4);
        Complex den = Double.isInfinite(f4) ? Complex.ONE : Complex.ONE.add(r4.divide(q4)).add(r4.multiply(r4));
        return num.divide(den);
    }

    private static Complex step(Complex s, double f5, double q5, double f6, double q6) {
        if (Double.isInfinite(f5)) {
            return Complex.ONE;
        }
        Complex r5 = s.divide(2 * Math.PI * f5);
        Complex r6 = s.divide(2 * Math.PI * f6);
        Complex num = Complex.ONE.add(r5.divide(q5)).add(r5.multiply(r5));
        Complex den = Complex.ONE.add(r6.divide(q6)).add(r6.multiply(r6));
        return num.divide(den).multiply((f5 / f6) * (f5 / f6));
    }
}
