package org.counterpoise.core.robust;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleBinaryOperator;
import java.util.function.DoubleUnaryOperator;
import java.util.stream.IntStream;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.counterpoise.core.model.Absorber;

/**
 * The worst response over the forcing band when the structure's natural frequency may be anywhere
 * in [1 - ds, 1 + ds] times nominal and the absorber's in [1 - da, 1 + da]. The worst point can be
 * inside the range (a coupled resonance sweeping into the band), not only at its corners, so the
 * range is sampled on a grid (25 points in one dimension, 13 x 13 in two) and every grid point
 * that is at least as high as its neighbours is refined: by Brent's method in one dimension, by
 * three rounds of alternating Brent searches in two, each to 1e-10 relative in the factor. A local
 * maximum narrower than a grid cell could in principle be missed; against a dense brute force
 * (tests) the worst case agrees to 1e-9.
 */
public final class WorstCase {
    private static final int POINTS_1D = 25;
    private static final int POINTS_2D = 13;

    private WorstCase() {
    }

    /**
     * Where the worst case is and how bad.
     *
     * @param structureFactor structure frequency factor of the worst case
     * @param absorberFactor absorber frequency factor of the worst case
     * @param peak the worst peak response over the band, SI
     */
    public record Point(double structureFactor, double absorberFactor, double peak) {
    }

    /**
     * @param m the mistuning model
     * @param absorber the absorber
     * @param structureRange ds, fraction (0 for none)
     * @param absorberRange da, fraction (0 for none)
     * @return the worst case
     */
    public static Point of(Mistuning m, Absorber absorber, double structureRange, double absorberRange) {
        DoubleBinaryOperator peak = (s, a) -> m.peak(absorber, s, a);
        if (structureRange == 0 && absorberRange == 0) {
            return new Point(1, 1, peak.applyAsDouble(1, 1));
        }
        if (absorberRange == 0) {
            return oneDimension(s -> peak.applyAsDouble(s, 1), structureRange, true);
        }
        if (structureRange == 0) {
            return oneDimension(a -> peak.applyAsDouble(1, a), absorberRange, false);
        }
        return twoDimensions(peak, structureRange, absorberRange);
    }

    private static Point oneDimension(DoubleUnaryOperator f, double range, boolean structure) {
        double[] x = Sensitivity.factors(range, POINTS_1D);
        double[] v = new double[x.length];
        IntStream.range(0, x.length).parallel().forEach(i -> v[i] = f.applyAsDouble(x[i]));
        double bestX = 1;
        double best = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < x.length; i++) {
            boolean local = (i == 0 || v[i] >= v[i - 1]) && (i == x.length - 1 || v[i] >= v[i + 1]);
            if (!local) {
                continue;
            }
            double[] refined = maximise(f, x[Math.max(i - 1, 0)], x[Math.min(i + 1, x.length - 1)], x[i], v[i]);
            if (refined[1] > best) {
                best = refined[1];
                bestX = refined[0];
            }
        }
        return structure ? new Point(bestX, 1, best) : new Point(1, bestX, best);
    }

    private static Point twoDimensions(DoubleBinaryOperator f, double sRange, double aRange) {
        double[] s = Sensitivity.factors(sRange, POINTS_2D);
        double[] a = Sensitivity.factors(aRange, POINTS_2D);
        double[][] v = new double[s.length][a.length];
        // The grid values are independent: computed on all cores, each into its own cell, so the
        // result does not depend on the thread count.
        IntStream.range(0, s.length * a.length).parallel()
                .forEach(k -> v[k / a.length][k % a.length] = f.applyAsDouble(s[k / a.length], a[k % a.length]));
        List<int[]> maxima = new ArrayList<>();
        for (int i = 0; i < s.length; i++) {
            for (int j = 0; j < a.length; j++) {
                if (isLocalMax(v, i, j)) {
                    maxima.add(new int[] {i, j});
                }
            }
        }
        // Each local maximum is refined on its own (on all cores); the highest wins, the first in
        // grid order among equals, as in a sequential sweep.
        List<Point> refined = maxima.parallelStream().map(ij -> refine(f, s, a, v, ij[0], ij[1])).toList();
        Point best = new Point(1, 1, Double.NEGATIVE_INFINITY);
        for (Point point : refined) {
            if (point.peak() > best.peak()) {
                best = point;
            }
        }
        return best;
    }

    /** Three rounds of alternating Brent searches from grid point (i, j) within its neighbours. */
    private static Point refine(DoubleBinaryOperator f, double[] s, double[] a, double[][] v, int i, int j) {
        double si = s[i];
        double aj = a[j];
        double value = v[i][j];
        double sLo = s[Math.max(i - 1, 0)];
        double sHi = s[Math.min(i + 1, s.length - 1)];
        double aLo = a[Math.max(j - 1, 0)];
        double aHi = a[Math.min(j + 1, a.length - 1)];
        for (int round = 0; round < 3; round++) {
            final double fixedA = aj;
            double[] rs = maximise(x -> f.applyAsDouble(x, fixedA), sLo, sHi, si, value);
            si = rs[0];
            value = rs[1];
            final double fixedS = si;
            double[] ra = maximise(x -> f.applyAsDouble(fixedS, x), aLo, aHi, aj, value);
            aj = ra[0];
            value = ra[1];
        }
        return new Point(si, aj, value);
    }

    private static boolean isLocalMax(double[][] v, int i, int j) {
        for (int di = -1; di <= 1; di++) {
            for (int dj = -1; dj <= 1; dj++) {
                int ii = i + di;
                int jj = j + dj;
                if ((di != 0 || dj != 0) && ii >= 0 && jj >= 0 && ii < v.length && jj < v[0].length
                        && v[ii][jj] > v[i][j]) {
                    return false;
                }
            }
        }
        return true;
    }

    /** @return {x, value} of the maximum on [lo, hi], never worse than the start point */
    private static double[] maximise(DoubleUnaryOperator f, double lo, double hi, double start,
            double startValue) {
        if (hi <= lo) {
            return new double[] {start, startValue};
        }
        UnivariatePointValuePair p = new BrentOptimizer(1e-10, 1e-14).optimize(new MaxEval(500),
                new UnivariateObjectiveFunction(f::applyAsDouble), GoalType.MAXIMIZE,
                new SearchInterval(lo, hi, Math.min(Math.max(start, lo), hi)));
        double[] best = p.getValue() > startValue ? new double[] {p.getPoint(), p.getValue()}
                : new double[] {start, startValue};
        // The interval ends are candidates too: Brent does not evaluate them.
        for (double end : new double[] {lo, hi}) {
            double v = f.applyAsDouble(end);
            if (v > best[1]) {
                best = new double[] {end, v};
            }
        }
        return best;
    }
}
