package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;

/**
 * Certifies a design of several absorbers, independently of how it was found (see
 * {@link AbsorberSetCertificate} for the four conditions). The first-order condition is that of
 * {@link MinimaxCertificate}, in d variables: with each variable scaled by its largest active
 * gradient component (at least {@value #FLAT} of the largest over all variables), the least-norm convex combination r of the active gradients
 * ({@link SimplexLeastNorm}) must have |r_k| small in a free variable, and r_k &gt;= 0 at a lower
 * bound, r_k &lt;= 0 at an upper bound (Demyanov and Malozemov 1974, ch. 2). Exhibiting such
 * multipliers is sufficient for the condition.
 */
final class AbsorberSetCheck {
    static final int PERTURBATIONS = 64;
    private static final double ACTIVE = 1e-6;
    private static final long SEED = 1992L;
    /** A move whose lower bound is above the least peak found by this, relative, is not searched. */
    private static final double SETTLED = 1e-7;
    /**
     * The least scale a variable is judged on, relative to the steepest variable's: below it the
     * certificate asks a slope under STATIONARY x FLAT = 1e-6 of the steepest (common practice in
     * scaling optimality tests, no source).
     */
    static final double FLAT = 1e-2;

    private AbsorberSetCheck() {
    }

    static AbsorberSetCertificate certify(MinimaxVariables v, double[] p, double peak, List<double[]> scan,
            EvaluationCounter counter) {
        counter.add(1);
        List<double[]> gradients = new ArrayList<>();
        double largest = 0;
        double smallest = Double.POSITIVE_INFINITY;
        List<double[]> maxima = v.maxima(p);
        for (double[] m : maxima) {
            double value = Math.exp(m[2] / 2);
            if (value >= peak * (1 - ACTIVE)) {
                gradients.add(v.gradient(p, MinimaxVariables.scenario(m), m[0]));
                largest = Math.max(largest, value);
                smallest = Math.min(smallest, value);
            }
        }
        double spread = gradients.isEmpty() ? 0.0 : 1 - smallest / largest;
        double stationarity = stationarity(v, p, gradients);
        double scanBest = scan.get(0)[scan.get(0).length - 1];
        double least = perturbationLeast(v, p, peak, maxima, counter);
        boolean certified = gradients.size() > 0 && spread <= AbsorberSetCertificate.EQUAL_PEAKS
                && stationarity <= AbsorberSetCertificate.STATIONARY
                && scanBest >= peak * (1 - AbsorberSetCertificate.NOT_BEATEN)
                && least >= -AbsorberSetCertificate.NOT_BEATEN;
        return new AbsorberSetCertificate(gradients.size(), spread, stationarity, scan.size(), scanBest, PERTURBATIONS,
                least, certified);
    }

    private static double stationarity(MinimaxVariables v, double[] p, List<double[]> gradients) {
        if (gradients.isEmpty()) {
            return Double.POSITIVE_INFINITY;
        }
        int d = p.length;
        double[] scale = new double[d];
        for (double[] g : gradients) {
            for (int k = 0; k < d; k++) {
                scale[k] = Math.max(scale[k], Math.abs(g[k]));
            }
        }
        double overall = 0;
        for (double s : scale) {
            overall = Math.max(overall, s);
        }
        if (overall < 1e-12) {
            return 0.0; // the peak does not depend on the design to first order
        }
        // A variable the peak barely depends on is judged on a floor of FLAT times the steepest one's
        // scale, not on its own: on its own scale the round-off in the maxima's located frequencies
        // alone reads as a violation (one joint optimum's absorber damping, a slope 1.3e-5 of the
        // steepest: 1.27e-4 on its own scale, a possible gain of 2e-8 in ln|H|^2 per unit ln zeta).
        double[] judged = new double[d];
        for (int k = 0; k < d; k++) {
            judged[k] = Math.max(scale[k], FLAT * overall);
        }
        double[] lo = v.lower();
        double[] hi = v.upper();
        int[] side = new int[d];
        for (int k = 0; k < d; k++) {
            side[k] = p[k] - lo[k] <= 1e-9 ? 1 : hi[k] - p[k] <= 1e-9 ? -1 : 0;
        }
        // Only free variables enter the least-norm combination; at a bound the sign is checked after.
        double[][] scaled = new double[gradients.size()][d];
        for (int i = 0; i < scaled.length; i++) {
            for (int k = 0; k < d; k++) {
                boolean counts = side[k] == 0 && scale[k] > 1e-14 * overall;
                scaled[i][k] = counts ? gradients.get(i)[k] / judged[k] : 0.0;
            }
        }
        double[] lambda = SimplexLeastNorm.weights(scaled);
        double[] r = SimplexLeastNorm.combination(scaled, lambda);
        double violation = 0;
        for (int k = 0; k < d; k++) {
            violation = Math.max(violation, Math.abs(r[k]));
            if (side[k] != 0 && scale[k] > 1e-14 * overall) {
                double component = 0;
                for (int i = 0; i < lambda.length; i++) {
                    component += lambda[i] * gradients.get(i)[k] / judged[k];
                }
                violation = Math.max(violation, side[k] > 0 ? -component : component);
            }
        }
        return violation;
    }

    /**
     * The least relative change of the peak over {@value #PERTURBATIONS} seeded random small moves
     * inside the box. Only the least counts, so a move's exact peak is searched only when it may be
     * the least: every move first gets a lower bound on its peak, ln|H|^2 at the optimum's own
     * pieces (its maxima's frequencies and the band ends, frozen; a moved maximum is at least as high
     * as its curve at the old frequency), and the moves are searched in the order of their bounds
     * until a bound is above the least peak found by {@value #SETTLED} relative (the bound and the
     * peak are the same factored |H|, so the least is the one searching every move gives).
     *
     * @param v the variables
     * @param p the optimum
     * @param peak its peak
     * @param maxima its pieces ({@link MinimaxVariables#maxima})
     * @param counter counts transfer functions built
     * @return min over the moves q of peak(q) / peak - 1
     */
    private static double perturbationLeast(MinimaxVariables v, double[] p, double peak, List<double[]> maxima,
            EvaluationCounter counter) {
        Random random = new Random(SEED);
        double[] lo = v.lower();
        double[] hi = v.upper();
        List<double[]> moves = new ArrayList<>();
        List<Integer> order = new ArrayList<>();
        double[] bound = new double[PERTURBATIONS];
        for (int i = 0; i < PERTURBATIONS; i++) {
            double size = Math.pow(10, -2 - 4 * random.nextDouble());
            double[] q = p.clone();
            for (int k = 0; k < q.length; k++) {
                q[k] = Math.min(hi[k], Math.max(lo[k], q[k] + size * (2 * random.nextDouble() - 1)));
            }
            moves.add(q);
            order.add(i);
            bound[i] = Double.NEGATIVE_INFINITY;
            for (double[] m : maxima) {
                bound[i] = Math.max(bound[i], v.logMagnitudeSquared(q, MinimaxVariables.scenario(m), m[0]));
            }
        }
        order.sort(Comparator.comparingDouble(i -> bound[i]));
        double least = Double.POSITIVE_INFINITY;
        for (int i : order) {
            if (Math.exp(bound[i] / 2) > peak * (1 + least) * (1 + SETTLED)) {
                break; // so is every later move's bound: none of them is the least
            }
            least = Math.min(least, v.peak(moves.get(i)) / peak - 1);
            counter.add(1);
        }
        return least;
    }
}
