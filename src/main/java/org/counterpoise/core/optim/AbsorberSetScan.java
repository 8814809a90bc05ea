package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Random;

/**
 * The coarse global scan of the variables of several absorbers: every point with its exact peak,
 * lowest first. Uniform: a grid of {@value #TUNINGS} centre tunings log-spaced over the box, the
 * spreads {@link #SPREADS} and {@value #DAMPINGS} damping ratios log-spaced over the box.
 * Individual: {@value #RANDOM_POINTS} points drawn (seeded, so the same every run) log-uniformly in
 * every absorber's tuning and damping over the box. The scan's peaks come straight from the
 * polynomial peak search ({@code PeakFinder}, exact to about 1e-7 at a flat peak); the lowest is
 * then taken again from the refined maxima before it is compared with an optimum.
 */
final class AbsorberSetScan {
    static final int TUNINGS = 20;
    static final int DAMPINGS = 8;
    /** Spreads of the uniform scan, in units of sqrt(mu) (capped at the box's largest spread). */
    static final double[] SPREADS = {0.0, 0.25, 0.5, 1.0, 2.0, 4.0};
    static final int RANDOM_POINTS = 512;
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
     * @param v the variables
     * @param points the scan's points
     * @param counter counts transfer functions built
     * @return {p..., peak} for every point, lowest peak first; the lowest peak taken again on the
     *     factored route
     */
    static List<double[]> evaluate(MinimaxVariables v, List<double[]> points, EvaluationCounter counter) {
        List<double[]> out = new ArrayList<>();
        for (double[] p : points) {
            double[] row = new double[p.length + 1];
            System.arraycopy(p, 0, row, 0, p.length);
            row[p.length] = v.polynomialPeak(p);
            counter.add(1);
            out.add(row);
        }
        out.sort(Comparator.comparingDouble(r -> r[r.length - 1]));
        double[] lowest = out.get(0);
        lowest[lowest.length - 1] = v.peak(Arrays.copyOf(lowest, lowest.length - 1));
        return out;
    }
}
