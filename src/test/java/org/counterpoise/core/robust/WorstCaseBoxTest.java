package org.counterpoise.core.robust;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The worst case over a box of factors ({@link WorstCase#overBox}) on functions whose maximum is known
 * in closed form: a smooth bump with its top inside the box (found to the Brent tolerance), a
 * function rising to a corner, two bumps of which the lower is the wider (the higher, narrower one
 * must win), and a box with one factor held at 1 (range 0). Analytic references, no source needed.
 */
class WorstCaseBoxTest {

    @Test
    void interiorMaximumOfASmoothBumpIsFound() {
        double[] top = {1.013, 0.962, 1.021};
        double[] w = WorstCase.overBox(x -> bump(x, top, 0.02, 2.0), new double[] {0.05, 0.05, 0.03});
        assertEquals(2.0, w[3], 1e-12);
        assertArrayEquals(top, new double[] {w[0], w[1], w[2]}, 1e-6);
    }

    @Test
    void aRisingFunctionPeaksAtTheCorner() {
        double[] w = WorstCase.overBox(x -> x[0] - 2 * x[1] + 0.5 * x[2], new double[] {0.1, 0.05, 0.02});
        assertArrayEquals(new double[] {1.1, 0.95, 1.02, 1.1 - 1.9 + 0.51}, w, 1e-12);
    }

    /** A wide bump of height 1 and a narrow one of height 1.5, about one grid cell (0.0125) wide. */
    @Test
    void theHigherOfTwoBumpsWins() {
        double[] wide = {0.97, 1.0, 1.0};
        double[] narrow = {1.035, 1.04, 0.99};
        double[] w = WorstCase.overBox(x -> Math.max(bump(x, wide, 0.05, 1.0), bump(x, narrow, 0.015, 1.5)),
                new double[] {0.05, 0.05, 0.03});
        assertEquals(1.5, w[3], 1e-12);
        assertArrayEquals(narrow, new double[] {w[0], w[1], w[2]}, 1e-6);
    }

    @Test
    void aFactorWithoutRangeStaysAtOne() {
        double[] top = {1.02, 1.3, 0.99};
        double[] w = WorstCase.overBox(x -> bump(x, top, 0.03, 1.0), new double[] {0.05, 0.0, 0.03});
        assertEquals(1.0, w[1], 0.0);
        assertEquals(1.02, w[0], 1e-6);
        assertEquals(0.99, w[2], 1e-6);
    }

    /** One varied factor (the 25-point grid): an interior top found to the Brent tolerance, the others at 1. */
    @Test
    void oneVariedFactorFindsItsInteriorTop() {
        double[] top = {1.0, 1.037, 1.0};
        double[] w = WorstCase.overBox(x -> bump(x, top, 0.01, 3.0), new double[] {0.0, 0.05, 0.0});
        assertArrayEquals(new double[] {1.0, 1.037, 1.0, 3.0}, w, 1e-6);
    }

    private static double bump(double[] x, double[] top, double width, double height) {
        double r2 = 0;
        for (int k = 0; k < x.length; k++) {
            r2 += (x[k] - top[k]) * (x[k] - top[k]);
        }
        return height * Math.exp(-r2 / (width * width));
    }
}
