package org.counterpoise.core.criteria;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;

/**
 * The largest value of a smooth function of the frequency ratio over a closed band where no
 * polynomial gives the stationary points (a sum of amplitudes |G_1| + |G_2| is not rational): a
 * dense scan, on a logarithmic grid of {@value #GRID} intervals joined with the given seeds (the
 * exact peaks of each term, where the sum's narrow maxima sit), then Brent's method (Brent 1973,
 * Algorithms for Minimization without Derivatives, ch. 5) on the two grid intervals around every
 * local maximum of the grid. Brent stops when the bracket is {@value #RELATIVE_TOLERANCE} of g
 * wide; at a smooth maximum a location error dg costs O(dg^2) in the value, so the value is right
 * to round-off (measured against a brute force: docs/acceptance.md). Every point tried is a real
 * frequency in the band, so the result never over-states the maximum.
 */
final class ScanMaximum {
    /** Intervals of the logarithmic grid over the band. */
    static final int GRID = 400;
    /** Relative width of Brent's final bracket in g. */
    static final double RELATIVE_TOLERANCE = 1e-13;
    private static final int MAX_EVALUATIONS = 300;

    private ScanMaximum() {
    }

    /**
     * @param function the function of g, finite or +infinity
     * @param low band start g (&gt; 0)
     * @param high band end g (&gt;= low)
     * @param seeds extra points to try (those outside the band are ignored)
     * @return {g, value} at the largest value found
     */
    static double[] of(DoubleUnaryOperator function, double low, double high, double[] seeds) {
        if (high <= low) {
            return new double[] {low, function.applyAsDouble(low)};
        }
        double[] g = new double[GRID + 1 + seeds.length];
        double step = Math.log(high / low) / GRID;
        for (int i = 0; i <= GRID; i++) {
            g[i] = i == GRID ? high : low * Math.exp(i * step);
        }
        int n = GRID + 1;
        for (double seed : seeds) {
            if (seed > low && seed < high) {
                g[n++] = seed;
            }
        }
        g = Arrays.copyOf(g, n);
        Arrays.sort(g);
        double[] v = new double[n];
        int best = 0;
        for (int i = 0; i < n; i++) {
            v[i] = function.applyAsDouble(g[i]);
            if (v[i] > v[best]) {
                best = i;
            }
        }
        double[] result = {g[best], v[best]};
        if (Double.isInfinite(v[best])) {
            return result;
        }
        BrentOptimizer brent = new BrentOptimizer(RELATIVE_TOLERANCE, Double.MIN_NORMAL);
        UnivariateObjectiveFunction objective = new UnivariateObjectiveFunction(function::applyAsDouble);
        for (int i = 1; i + 1 < n; i++) {
            if (v[i] >= v[i - 1] && v[i] >= v[i + 1] && g[i + 1] > g[i - 1]) {
                UnivariatePointValuePair found = brent.optimize(new MaxEval(MAX_EVALUATIONS), objective,
                        GoalType.MAXIMIZE, new SearchInterval(g[i - 1], g[i + 1], g[i]));
                if (found.getValue() > result[1]) {
                    result[0] = found.getPoint();
                    result[1] = found.getValue();
                }
            }
        }
        return result;
    }
}
