package org.counterpoise.core.robust;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.DoubleBinaryOperator;
import java.util.function.DoubleUnaryOperator;
import java.util.function.ToDoubleFunction;
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
 * in [1 - ds, 1 + ds] times nominal, the absorber's in [1 - da, 1 + da] and the absorber's damping
 * coefficient in [1 - dc, 1 + dc] ({@link ToleranceRanges}).
 *
 * <p>Frequencies: the worst point can be inside the range (a coupled resonance sweeping into the
 * band), not only at its corners, so the range is sampled on a grid (25 points in one dimension,
 * 13 x 13 in two) and every grid point that is at least as high as its neighbours is refined: by
 * Brent's method in one dimension, by three rounds of alternating Brent searches in two, each to
 * 1e-10 relative in the factor. A local maximum narrower than a grid cell could in principle be
 * missed; against a dense brute force (tests) the worst case agrees to 1e-9.
 *
 * <p>Damping: for fixed frequencies the band peak is quasi-convex in the damping factor, so its
 * maximum over an interval is at one of the ends, and the three-range worst case is the larger of
 * two frequency worst cases, at 1 - dc and at 1 + dc. Why: for an undamped structure |H(i w)|^2 at
 * each forcing frequency is (A + c^2 B) / (C + c^2 D), monotone in c (Den Hartog 1956, section 3.3,
 * the origin of the fixed points), and the band peak is the larger of an increasing and a decreasing
 * function of c (the maxima over the frequencies where |H| rises and where it falls), which is
 * quasi-convex. With structural damping |H| at one frequency is the modulus of a Moebius map of c
 * and need not be monotone, so the property was measured: 8000 random cases (structure damping 0
 * to 0.3, mass ratio 0.005 to 0.255, absorber damping ratio 0.002 to 0.5, tuning 0.8 to 1.2,
 * frequency factors within +/-30 % and +/-20 %, damping ranges up to +/-90 %, bands and single
 * speeds, six excitation and response pairs, 201 damping factors each) showed no interior
 * maximum (falling then rising to 1e-13 relative) in any; WorstCaseTest checks the reduction
 * against a dense three-dimensional brute force.
 */
public final class WorstCase {
    private static final int POINTS_1D = 25;
    private static final int POINTS_2D = 13;
    private static final int POINTS_BOX = 9;

    private WorstCase() {
    }

    /**
     * Where the worst case is and how bad.
     *
     * @param structureFactor structure frequency factor of the worst case
     * @param absorberFactor absorber frequency factor of the worst case
     * @param dampingFactor absorber damping coefficient factor of the worst case
     * @param peak the worst peak response over the band, SI
     */
    public record Point(double structureFactor, double absorberFactor, double dampingFactor, double peak) {
    }

    /**
     * The worst case over the frequency ranges only (damping as designed).
     *
     * @param m the mistuning model
     * @param absorber the absorber
     * @param structureRange ds, fraction (0 for none)
     * @param absorberRange da, fraction (0 for none)
     * @return the worst case
     */
    public static Point of(Mistuning m, Absorber absorber, double structureRange, double absorberRange) {
        return of(m, absorber, structureRange, absorberRange, 0.0);
    }

    /**
     * @param m the mistuning model
     * @param absorber the absorber
     * @param ranges the three ranges
     * @return the worst case over all three
     */
    public static Point of(Mistuning m, Absorber absorber, ToleranceRanges ranges) {
        return of(m, absorber, ranges.structure(), ranges.absorber(), ranges.damping());
    }

    /**
     * @param m the mistuning model
     * @param absorber the absorber
     * @param structureRange ds, fraction (0 for none)
     * @param absorberRange da, fraction (0 for none)
     * @param dampingRange dc, fraction of the damping coefficient (0 for none, below 1)
     * @return the worst case over the three ranges
     */
    public static Point of(Mistuning m, Absorber absorber, double structureRange, double absorberRange,
            double dampingRange) {
        if (dampingRange == 0 || absorber.damping() == 0) {
            return atDamping(m, absorber, structureRange, absorberRange, 1.0);
        }
        // quasi-convex in the damping factor (class comment): the worst case is at one of its ends
        Point low = atDamping(m, absorber, structureRange, absorberRange, 1 - dampingRange);
        Point high = atDamping(m, absorber, structureRange, absorberRange, 1 + dampingRange);
        return high.peak() > low.peak() ? high : low;
    }

    /** The worst case over the frequency ranges with the damping coefficient scaled by c. */
    private static Point atDamping(Mistuning m, Absorber absorber, double structureRange, double absorberRange,
            double c) {
        return over((s, a) -> m.peak(absorber, s, a, c), structureRange, absorberRange, c);
    }

    /**
     * The same search over the two frequency factors for any peak function (several absorbers on
     * one mode share it: the structure's factor and one common factor of the absorbers'): a grid
     * and Brent refinement of every local maximum, as described above.
     *
     * @param peak the peak response over the band at (structure factor, absorber factor)
     * @param structureRange ds, fraction (0 for none)
     * @param absorberRange da, fraction (0 for none)
     * @return the worst case (damping factor 1)
     */
    public static Point over(DoubleBinaryOperator peak, double structureRange, double absorberRange) {
        return over(peak, structureRange, absorberRange, 1.0);
    }

    private static Point over(DoubleBinaryOperator peak, double structureRange, double absorberRange, double c) {
        if (structureRange == 0 && absorberRange == 0) {
            return new Point(1, 1, c, peak.applyAsDouble(1, 1));
        }
        if (absorberRange == 0) {
            return oneDimension(s -> peak.applyAsDouble(s, 1), structureRange, true, c);
        }
        if (structureRange == 0) {
            return oneDimension(a -> peak.applyAsDouble(1, a), absorberRange, false, c);
        }
        return twoDimensions(peak, structureRange, absorberRange, c);
    }

    private static Point oneDimension(DoubleUnaryOperator f, double range, boolean structure, double c) {
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
        return structure ? new Point(bestX, 1, c, best) : new Point(1, bestX, c, best);
    }

    private static Point twoDimensions(DoubleBinaryOperator f, double sRange, double aRange, double c) {
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
        List<Point> refined = maxima.parallelStream().map(ij -> refine(f, s, a, v, ij[0], ij[1], c)).toList();
        Point best = new Point(1, 1, c, Double.NEGATIVE_INFINITY);
        for (Point point : refined) {
            if (point.peak() > best.peak()) {
                best = point;
            }
        }
        return best;
    }

    /** Three rounds of alternating Brent searches from grid point (i, j) within its neighbours. */
    private static Point refine(DoubleBinaryOperator f, double[] s, double[] a, double[][] v, int i, int j,
            double c) {
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
        return new Point(si, aj, c, value);
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

    /**
     * The same search over any number of factors (one absorber per mode: each designed mode's
     * natural frequency by its own factor and the absorbers' by a common one): a grid of 25 points
     * in one varied factor, 13 in each of two, 9 in each of three or more, every grid point at least
     * as high as all its neighbours (diagonals too) refined by three rounds of Brent's method along
     * each varied factor in turn, within its neighbours, to 1e-10 relative. A local maximum narrower
     * than a grid cell could in principle be missed (tests: against a dense brute force).
     *
     * @param peak the peak response over the band at the factors (each 1 as nominal)
     * @param ranges each factor's range, a fraction (0 where it stays 1)
     * @return {the worst case's factors..., its peak}
     */
    public static double[] overBox(ToDoubleFunction<double[]> peak, double[] ranges) {
        int[] varied = IntStream.range(0, ranges.length).filter(d -> ranges[d] > 0).toArray();
        double[] nominal = new double[ranges.length];
        Arrays.fill(nominal, 1.0);
        if (varied.length == 0) {
            return withPeak(nominal, peak.applyAsDouble(nominal));
        }
        int points = varied.length == 1 ? POINTS_1D : varied.length == 2 ? POINTS_2D : POINTS_BOX;
        double[][] axes = new double[varied.length][];
        for (int k = 0; k < varied.length; k++) {
            axes[k] = Sensitivity.factors(ranges[varied[k]], points);
        }
        int cells = (int) Math.pow(points, varied.length);
        double[] values = new double[cells];
        // independent grid values on all cores, each into its own cell (the result does not depend on the thread count)
        IntStream.range(0, cells).parallel().forEach(c -> values[c] = peak.applyAsDouble(at(nominal, varied, axes,
                indices(c, points, varied.length))));
        List<int[]> maxima = new ArrayList<>();
        for (int c = 0; c < cells; c++) {
            int[] index = indices(c, points, varied.length);
            if (isLocalMax(values, index, points)) {
                maxima.add(index);
            }
        }
        // each local maximum refined on its own; the highest wins, the first in grid order among equals
        List<double[]> refined = maxima.parallelStream().map(index -> refine(peak, nominal, varied, axes, index,
                values[cell(index, points)])).toList();
        double[] best = withPeak(nominal, Double.NEGATIVE_INFINITY);
        for (double[] r : refined) {
            if (r[r.length - 1] > best[best.length - 1]) {
                best = r;
            }
        }
        return best;
    }

    /** Three rounds of Brent's method along each varied factor in turn, from a grid point within its neighbours. */
    private static double[] refine(ToDoubleFunction<double[]> peak, double[] nominal, int[] varied, double[][] axes,
            int[] index, double startValue) {
        double[] x = at(nominal, varied, axes, index);
        double value = startValue;
        for (int round = 0; round < 3; round++) {
            for (int k = 0; k < varied.length; k++) {
                int d = varied[k];
                double[] axis = axes[k];
                double lo = axis[Math.max(index[k] - 1, 0)];
                double hi = axis[Math.min(index[k] + 1, axis.length - 1)];
                double[] base = x;
                double[] r = maximise(f -> {
                    double[] y = base.clone();
                    y[d] = f;
                    return peak.applyAsDouble(y);
                }, lo, hi, x[d], value);
                x = x.clone();
                x[d] = r[0];
                value = r[1];
            }
        }
        return withPeak(x, value);
    }

    private static boolean isLocalMax(double[] values, int[] index, int points) {
        double v = values[cell(index, points)];
        int neighbours = (int) Math.pow(3, index.length);
        for (int n = 0; n < neighbours; n++) {
            int[] other = index.clone();
            boolean inside = true;
            boolean moved = false;
            for (int k = 0, rest = n; k < index.length; k++, rest /= 3) {
                int step = rest % 3 - 1;
                other[k] += step;
                moved |= step != 0;
                inside &= other[k] >= 0 && other[k] < points;
            }
            if (moved && inside && values[cell(other, points)] > v) {
                return false;
            }
        }
        return true;
    }

    private static int[] indices(int cell, int points, int dimensions) {
        int[] index = new int[dimensions];
        for (int k = dimensions - 1; k >= 0; k--) {
            index[k] = cell % points;
            cell /= points;
        }
        return index;
    }

    private static int cell(int[] index, int points) {
        int c = 0;
        for (int i : index) {
            c = c * points + i;
        }
        return c;
    }

    private static double[] at(double[] nominal, int[] varied, double[][] axes, int[] index) {
        double[] x = nominal.clone();
        for (int k = 0; k < varied.length; k++) {
            x[varied[k]] = axes[k][index[k]];
        }
        return x;
    }

    private static double[] withPeak(double[] factors, double peak) {
        double[] out = Arrays.copyOf(factors, factors.length + 1);
        out[factors.length] = peak;
        return out;
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
