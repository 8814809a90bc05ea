package org.counterpoise.core.rational;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The one-pass value and derivative against hand differentiation and against the separate Horner chains. */
class RealPolynomialsTest {

    @Test
    void valueAndDerivativeMatchHandDifferentiation() {
        // p(x) = 1 - 3x + 2x^3, p'(x) = -3 + 6x^2 (differentiated by hand): p(2) = 11, p'(2) = 21
        double[] out = new double[2];
        RealPolynomials.valueAndDerivative(new double[] {1, -3, 0, 2}, 2.0, out);
        assertEquals(11.0, out[0], 0.0);
        assertEquals(21.0, out[1], 0.0);
        // a constant has derivative zero; the empty polynomial is zero
        RealPolynomials.valueAndDerivative(new double[] {4.5}, 7.0, out);
        assertEquals(4.5, out[0], 0.0);
        assertEquals(0.0, out[1], 0.0);
        RealPolynomials.valueAndDerivative(new double[0], 7.0, out);
        assertEquals(0.0, out[0], 0.0);
        assertEquals(0.0, out[1], 0.0);
    }

    @Test
    void valueAndDerivativeGiveTheSameBitsAsTheSeparateChains() {
        // the root refinement relies on it: every peak, and so every golden figure, stays the same
        Random random = new Random(11L);
        double[] out = new double[2];
        for (int trial = 0; trial < 2000; trial++) {
            double[] p = new double[1 + random.nextInt(13)];
            for (int i = 0; i < p.length; i++) {
                p[i] = (random.nextDouble() - 0.5) * Math.pow(10, random.nextInt(13) - 6);
            }
            double x = (random.nextDouble() - 0.3) * Math.pow(10, random.nextInt(5) - 2);
            RealPolynomials.valueAndDerivative(p, x, out);
            assertEquals(Double.doubleToLongBits(RealPolynomials.value(p, x)), Double.doubleToLongBits(out[0]));
            assertEquals(Double.doubleToLongBits(RealPolynomials.derivativeValue(p, x)),
                    Double.doubleToLongBits(out[1]));
        }
    }
}
