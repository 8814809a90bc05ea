package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Certifies a design of several absorbers, independently of how it was found (see
 * {@link AbsorberSetCertificate} for the four conditions). The first-order condition is that of
 * {@link MinimaxCertificate}, in d variables: with each variable scaled by its largest active
 * gradient component, the least-norm convex combination r of the active gradients
 * ({@link SimplexLeastNorm}) must have |r_k| small in a free variable, and r_k &gt;= 0 at a lower
 * bound, r_k &lt;= 0 at an upper bound (Demyanov and Malozemov 1974, ch. 2). Exhibiting such
 * multipliers is sufficient for the condition.
 */
final class AbsorberSetCheck {
    static final int PERTURBATIONS = 64;
    private static final double ACTIVE = 1e-6;
    private static final long SEED = 1992L;

    private AbsorberSetCheck() {
    }

    static AbsorberSetCertificate certify(MinimaxVariables v, double[] p, double peak, List<double[]> scan,
            EvaluationCounter counter) {
        counter.add(1);
        List<double[]> gradients = new ArrayList<>();
        double largest = 0;
        double smallest = Double.POSITIVE_INFINITY;
        for (double[] m : v.maxima(p)) {
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
        double least = perturbationLeast(v, p, peak, counter);
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
                scaled[i][k] = counts ? gradients.get(i)[k] / scale[k] : 0.0;
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
                    component += lambda[i] * gradients.get(i)[k] / scale[k];
                }
                violation = Math.max(violation, side[k] > 0 ? -component : component);
            }
        }
        return violation;
    }

    /** @return the least relative change of the peak over seeded random small moves inside the box */
    private static double perturbationLeast(MinimaxVariables v, double[] p, double peak, EvaluationCounter counter) {
        Random random = new Random(SEED);
        double[] lo = v.lower();
        double[] hi = v.upper();
        double least = Double.POSITIVE_INFINITY;
        for (int i = 0; i < PERTURBATIONS; i++) {
            double size = Math.pow(10, -2 - 4 * random.nextDouble());
            double[] q = p.clone();
            for (int k = 0; k < q.length; k++) {
                q[k] = Math.min(hi[k], Math.max(lo[k], q[k] + size * (2 * random.nextDouble() - 1)));
            }
            least = Math.min(least, v.peak(q) / peak - 1);
            counter.add(1);
        }
        return least;
    }
}
