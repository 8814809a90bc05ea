package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The first-order minimax conditions of a hysteretic design, checked as the viscous
 * {@link MinimaxCertificate} checks them: with the active maxima those within
 * {@link #ACTIVE_SHARE} relative of the peak, some convex combination of their exact gradients (in
 * ln f and max(eta, 0.01) eta, each variable divided by its largest active component) must vanish
 * in a free variable, be &gt;= 0 where the variable sits on its lower bound and &lt;= 0 on its upper
 * bound (Karush-Kuhn-Tucker with nonnegative multipliers; Clarke 1983, Optimization and Nonsmooth
 * Analysis, section 6.1). The violation is the distance of the convex hull of the gradients from
 * that cone, found by projected gradient descent on the simplex of weights (a convex problem in at
 * most four weights).
 */
final class HystereticCertificate {
    /** Maxima within this relative share of the peak count as active. */
    static final double ACTIVE_SHARE = 1e-6;
    /** The largest first-order violation a certified optimum may have. */
    static final double VIOLATION_LIMIT = 1e-4;

    private HystereticCertificate() {
    }

    /**
     * @param p the problem
     * @param f tuning ratio
     * @param eta loss factor
     * @return the first-order violation (0 when a combination of the active gradients vanishes)
     */
    static double violation(HystereticProblem p, double f, double eta) {
        List<double[]> candidates = p.candidates(f, eta);
        double top = candidates.get(0)[2];
        if (!Double.isFinite(top)) {
            return Double.POSITIVE_INFINITY;
        }
        double peak = p.peak(f, eta);
        if (peak * peak > top * (1 + 1e-9)) {
            return 0.0; // only approached at infinite frequency: a limit the design does not change
        }
        List<double[]> gradients = new ArrayList<>();
        for (double[] c : candidates) {
            if (c[2] >= top * (1 - 2 * ACTIVE_SHARE) && gradients.size() < 4) {
                gradients.add(p.scaledGradient(f, eta, c[0]));
            }
        }
        int d = p.freeCount();
        int[] side = new int[d];
        side[0] = f <= p.fMin() * (1 + 1e-9) ? -1 : f >= p.fMax() * (1 - 1e-9) ? 1 : 0;
        if (d == 2) {
            side[1] = eta <= 1e-12 ? -1 : eta >= HystereticProblem.MAX_LOSS_FACTOR * (1 - 1e-9) ? 1 : 0;
        }
        for (int j = 0; j < d; j++) {
            double largest = 0;
            for (double[] g : gradients) {
                largest = Math.max(largest, Math.abs(g[j]));
            }
            if (largest > 0) {
                for (double[] g : gradients) {
                    g[j] /= largest;
                }
            }
        }
        return distanceFromCone(gradients, side);
    }

    /** min over convex weights of the distance of sum w_i g_i from the allowed cone. */
    private static double distanceFromCone(List<double[]> gradients, int[] side) {
        int n = gradients.size();
        double[] w = new double[n];
        Arrays.fill(w, 1.0 / n);
        double lipschitz = 0;
        for (double[] g : gradients) {
            for (double c : g) {
                lipschitz += c * c;
            }
        }
        double step = 0.5 / Math.max(lipschitz, 1e-300);
        double best = Double.POSITIVE_INFINITY;
        for (int iteration = 0; iteration < 3000; iteration++) {
            double[] r = excess(combination(gradients, w), side);
            double value = dot(r, r);
            best = Math.min(best, value);
            if (value < 1e-20) {
                break;
            }
            double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                y[i] = w[i] - step * 2 * dot(gradients.get(i), r);
            }
            w = ontoSimplex(y);
        }
        return Math.sqrt(best);
    }

    private static double[] combination(List<double[]> gradients, double[] w) {
        double[] v = new double[gradients.get(0).length];
        for (int i = 0; i < w.length; i++) {
            for (int j = 0; j < v.length; j++) {
                v[j] += w[i] * gradients.get(i)[j];
            }
        }
        return v;
    }

    /** The part of v outside the cone: all of a free component, the wrong-signed part at a bound. */
    private static double[] excess(double[] v, int[] side) {
        double[] r = new double[v.length];
        for (int j = 0; j < v.length; j++) {
            r[j] = side[j] == 0 ? v[j] : side[j] < 0 ? Math.min(v[j], 0) : Math.max(v[j], 0);
        }
        return r;
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int j = 0; j < a.length; j++) {
            s += a[j] * b[j];
        }
        return s;
    }

    /** Euclidean projection onto the simplex (Held, Wolfe and Crowder 1974; sort-based). */
    private static double[] ontoSimplex(double[] y) {
        double[] sorted = y.clone();
        Arrays.sort(sorted);
        double sum = 0;
        double theta = 0;
        for (int i = sorted.length - 1; i >= 0; i--) {
            sum += sorted[i];
            double t = (sum - 1) / (sorted.length - i);
            if (i == 0 || sorted[i - 1] <= t) {
                theta = t;
                break;
            }
        }
        double[] w = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            w[i] = Math.max(y[i] - theta, 0);
        }
        return w;
    }
}
