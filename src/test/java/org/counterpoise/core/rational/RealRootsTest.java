package org.counterpoise.core.rational;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.junit.jupiter.api.Test;

/** Root isolation at a degree where Newton from Cauchy's bound alone runs out of steps. */
class RealRootsTest {

    /**
     * R = P'Q - PQ' of three absorbers on an undamped mode (degree 13, coefficients near 1e9, a
     * single real root on [0, infinity)). Before the bisection fallback the search stopped at
     * x = 29.09 after 200 Newton steps from the bound 4.6e8. The root is checked against the sign
     * of R evaluated in exact decimal arithmetic either side of it (an independent route).
     */
    @Test
    void aHighDegreeRootFarBelowCauchysBoundIsFound() {
        double[] r = {1.9738508207081473E8, -6.3878660587803E8, 9.220430436099555E8, -8.130909991325042E8,
            4.869804897594347E8, -2.0895177396029365E8, 6.587826080080618E7, -1.5495316982458036E7, 2727854.7408814565,
            -357132.60812039184, 34021.04818941477, -2260.9061423803055, 95.23540308263566, -2.0};
        double[] roots = RealRoots.roots(r, 0, Double.POSITIVE_INFINITY);
        assertEquals(1, roots.length);
        double x = roots[0];
        assertTrue(exact(r, x * (1 - 1e-12)) > 0 && exact(r, x * (1 + 1e-12)) < 0, "root at " + x);
    }

    private static double exact(double[] p, double x) {
        BigDecimal v = BigDecimal.ZERO;
        BigDecimal bx = new BigDecimal(x);
        for (int i = p.length - 1; i >= 0; i--) {
            v = v.multiply(bx, MathContext.DECIMAL128).add(new BigDecimal(p[i]), MathContext.DECIMAL128);
        }
        return v.doubleValue();
    }
}
