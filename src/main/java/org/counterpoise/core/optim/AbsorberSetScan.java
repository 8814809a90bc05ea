package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * The coarse global scan of the variables of several absorbers: every point with its exact peak,
 * lowest first. Uniform: a grid of {@value #TUNINGS} centre tunings log-spaced over the box, the
 * spreads {@link #SPREADS} and {@value #DAMPINGS} damping ratios log-spaced over the box.
 * Individual: {@value #RANDOM_POINTS} points drawn (seeded, so the same every run) log-uniformly in
 * every absorber's tuning and damping over the box. The scan's peaks come straight from the
 * polynomial peak search ({@code PeakFinder}, exact to about 1e-7 at a flat peak), searched only
 * where a cheap lower bound does not rule a point out of the two lowest ({@link #evaluate}); the
 * lowest is then taken again from the refined maxima before it is compared with an optimum.
 */
final class AbsorberSetScan {
    static final int TUNINGS = 20;
    static final int DAMPINGS = 8;
    /** Spreads of the uniform scan, in units of sqrt(mu) (capped at the box's largest spread). */
    static final double[] SPREADS = {0.0, 0.25, 0.5, 1.0, 2.0, 4.0};
    static final int RANDOM_POINTS = 512;
    /** A point whose lower bound is above this times the second-lowest peak is not searched. */
    static final double RULED_OUT = 1.25;
    /** Frequencies of {@link #sampledMaximum}'s sweep. */
    static final int SAMPLES = 48;
    private static final long SEED = 16L;

    private AbsorberSetScan() {
    }

    /**
     * @param v the variables
     * @param counter counts transfer functions built
     * @return {p..., peak} for every scan point, lowest peak first
     */
    static List<double[]> scan(AbsorberSetVariables v, EvaluationCounter counter) {
        return scan(v, v, counter);
    }

    /**
     * @param v the variables (the layout of the points)
     * @param judge what each point's peak is taken on, and whose box the scan covers (the same
     *     variables, or a robust problem's several scenarios above a damping floor)
     * @param counter counts transfer functions built
     * @return {p..., peak} for every scan point, lowest peak first
     */
    static List<double[]> scan(AbsorberSetVariables v, MinimaxVariables judge, EvaluationCounter counter) {
        List<double[]> points = new ArrayList<>();
        double[] lo = judge.lower();
        double[] hi = judge.upper();
        if (v.problem().tuning() == AbsorberSetTuning.UNIFORM) {
            double[] spreads = v.problem().count() == 1 ? new double[] {0.0} : SPREADS.clone();
            for (int i = 0; i < spreads.length; i++) {
                spreads[i] = Math.min(AbsorberSetProblem.MAX_SPREAD, spreads[i] * Math.sqrt(v.problem().massRatio()));
            }
            for (int i = 0; i < TUNINGS; i++) {
                double lnf = lo[0] + (hi[0] - lo[0]) * i / (TUNINGS - 1);
                for (double spread : spreads) {
                    for (int k = 0; k < DAMPINGS; k++) {
                        double lnz = lo[lo.length - 1] + (hi[hi.length - 1] - lo[lo.length - 1]) * k / (DAMPINGS - 1);
                        points.add(v.point(Math.exp(lnf), spread, Math.exp(lnz)));
                    }
                }
            }
        } else {
            points.addAll(random(judge));
        }
        return evaluate(judge, points, counter);
    }

    /**
     * @param v the variables
     * @return {@value #RANDOM_POINTS} points drawn (seeded) uniformly in the box of the variables
     *     (log-uniformly in each tuning and damping, as the variables are logarithms)
     */
    static List<double[]> random(MinimaxVariables v) {
        double[] lo = v.lower();
        double[] hi = v.upper();
        List<double[]> points = new ArrayList<>();
        Random random = new Random(SEED);
        for (int i = 0; i < RANDOM_POINTS; i++) {
            double[] p = new double[lo.length];
            for (int k = 0; k < p.length; k++) {
                p[k] = lo[k] + (hi[k] - lo[k]) * random.nextDouble();
            }
            points.add(p);
        }
        return points;
    }

    /**
     * The points' peaks, the lowest two exactly as the polynomial peak search gives them. A point is
     * searched only when it may be among the two lowest: first every point gets a cheap lower bound
     * on its peak ({@link MinimaxVariables#sampledPeak}, the factored |H| at a few frequencies of the
     * band), then the points are searched in the order of their bounds, and a point whose bound is
     * above {@value #RULED_OUT} times the second-lowest peak searched so far is not searched: its row
     * carries the bound. The margin covers the polynomial search's own error many times over (it has
     * been seen up to 0.3 % below the factored peak where close modes lose digits, docs/several-modes.md;
     * at most 0.08 % on the benchmark problems' scans), so the two lowest rows, their order (ties in the
     * points' order, as a stable sort of every point's search would give) and so the seeds, restarts and
     * certificate are those of searching every point; a point ruled out is above the lowest by a quarter
     * at least on the factored route itself. Until 5 Dec 2026 the polynomial search could miss a
     * point's real peak altogether (four light absorbers: 1.35 for a factored peak of 3365, where its
     * R = P'Q - PQ' was below round-off); it now detects that and searches |H|^2 itself
     * (docs/several-modes.md, "When the expanded derivative is lost").
     *
     * @param v the variables
     * @param points the scan's points
     * @param counter counts transfer functions built
     * @return {p..., peak} for every point, lowest first (past the second row a ruled-out point's
     *     peak is its lower bound); the lowest peak taken again on the factored route
     */
    static List<double[]> evaluate(MinimaxVariables v, List<double[]> points, EvaluationCounter counter) {
        int count = points.size();
        double[] bound = new double[count];
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            bound[i] = v.sampledPeak(points.get(i));
            order.add(i);
        }
        order.sort(Comparator.comparingDouble(i -> bound[i]));
        double[] peak = bound.clone();
        double lowest = Double.POSITIVE_INFINITY;
        double second = Double.POSITIVE_INFINITY;
        for (int i : order) {
            if (bound[i] > RULED_OUT * second) {
                break; // so is every later point's bound
            }
            peak[i] = v.polynomialPeak(points.get(i));
            counter.add(1);
            if (peak[i] < lowest) {
                second = lowest;
                lowest = peak[i];
            } else if (peak[i] < second) {
                second = peak[i];
            }
        }
        List<double[]> out = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            double[] p = points.get(i);
            double[] row = new double[p.length + 1];
            System.arraycopy(p, 0, row, 0, p.length);
            row[p.length] = peak[i];
            out.add(row);
        }
        out.sort(Comparator.comparingDouble(r -> r[r.length - 1]));
        double[] first = out.get(0);
        first[first.length - 1] = v.peak(Arrays.copyOf(first, first.length - 1));
        return out;
    }

    /**
     * The largest of a factored ln|H|^2 at {@value #SAMPLES} frequencies log-spaced over the band
     * within g = 0.01 to 100 and at the band's finite ends, then refined near the largest sample by
     * Brent's method (Commons Math, to 1e-4 in ln g): every value is |H|^2 at a frequency of the
     * band, so the result is a lower bound on the band's peak (close to it where the peak is not
     * narrower than the samples' spacing).
     *
     * @param lnSquared ln|H|^2 as a function of x = g^2
     * @param gLow the band's low end
     * @param gHigh its high end (+infinity for all frequencies)
     * @return the largest value found
     */
    static double sampledMaximum(DoubleUnaryOperator lnSquared, double gLow, double gHigh) {
        double best = lnSquared.applyAsDouble(gLow * gLow);
        if (Double.isFinite(gHigh)) {
            best = Math.max(best, lnSquared.applyAsDouble(gHigh * gHigh));
        }
        double a = Math.log(Math.max(gLow, 1e-2));
        double b = Math.log(Math.min(gHigh, 1e2));
        if (!(b > a)) {
            return best;
        }
        double step = (b - a) / (SAMPLES - 1);
        int top = -1;
        double topValue = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < SAMPLES; i++) {
            double value = lnSquared.applyAsDouble(Math.exp(2 * (a + step * i)));
            if (value > topValue) {
                topValue = value;
                top = i;
            }
        }
        if (top < 0) {
            return best; // no sample had a value (NaN): the ends alone
        }
        double refined = new BrentOptimizer(1e-4, 1e-10).optimize(new MaxEval(60),
                new UnivariateObjectiveFunction(u -> lnSquared.applyAsDouble(Math.exp(2 * u))), GoalType.MAXIMIZE,
                new SearchInterval(a + step * Math.max(0, top - 1), a + step * Math.min(SAMPLES - 1, top + 1),
                        a + step * top)).getValue();
        return Math.max(best, Math.max(topValue, refined));
    }
}
