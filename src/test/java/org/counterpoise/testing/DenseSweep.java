package org.counterpoise.testing;

import java.util.function.DoubleUnaryOperator;

/**
 * The brute-force maximum of a function of one variable: a dense uniform sweep, then golden-section
 * search between the best sample's neighbours (an independent route to a peak for tests).
 */
public final class DenseSweep {
    private DenseSweep() {
    }

    /**
     * @param f the function
     * @param low start of the interval
     * @param high end of the interval
     * @param samples number of intervals of the sweep
     * @return the largest value found
     */
    public static double maximum(DoubleUnaryOperator f, double low, double high, int samples) {
        double best = Double.NEGATIVE_INFINITY;
        double at = low;
        for (int i = 0; i <= samples; i++) {
            double x = low + (high - low) * i / samples;
            double v = f.applyAsDouble(x);
            if (v > best) {
                best = v;
                at = x;
            }
        }
        double a = Math.max(low, at - (high - low) / samples);
        double b = Math.min(high, at + (high - low) / samples);
        double ratio = (Math.sqrt(5) - 1) / 2;
        for (int i = 0; i < 100; i++) {
            double c = b - ratio * (b - a);
            double d = a + ratio * (b - a);
            if (f.applyAsDouble(c) > f.applyAsDouble(d)) {
                b = d;
            } else {
                a = c;
            }
        }
        return Math.max(best, f.applyAsDouble(0.5 * (a + b)));
    }

    /**
     * The same with every local maximum of the sweep refined, not only the best sample (for functions
     * with several close peaks of nearly equal height, as an equal-peak optimum has).
     *
     * @param f the function
     * @param low start of the interval
     * @param high end of the interval
     * @param samples number of intervals of the sweep
     * @return the largest value found
     */
    public static double everyMaximum(DoubleUnaryOperator f, double low, double high, int samples) {
        double[] value = new double[samples + 1];
        for (int i = 0; i <= samples; i++) {
            value[i] = f.applyAsDouble(low + (high - low) * i / samples);
        }
        double best = Math.max(value[0], value[samples]);
        for (int i = 1; i < samples; i++) {
            if (value[i] >= value[i - 1] && value[i] >= value[i + 1]) {
                best = Math.max(best, maximum(f, low + (high - low) * (i - 1) / samples,
                        low + (high - low) * (i + 1) / samples, 8));
            }
        }
        return best;
    }
}
