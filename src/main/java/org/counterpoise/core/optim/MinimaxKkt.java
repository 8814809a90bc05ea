package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.apache.commons.math3.linear.RealVector;

/**
 * Solves the first-order conditions of the minimax for one guessed active set by Newton's method,
 * in any number of variables (the d-variable form of {@link ActiveSetNewton}). Unknowns: the free
 * variables p, the frequency x_i of each active interior maximum, a multiplier lambda_i per active
 * maximum and the common level t. Equations: x_i d/dx ln|H|^2 = 0 for each interior maximum;
 * ln|H|^2(p, x_i) = t for each; sum_i lambda_i grad_p ln|H|^2(p, x_i) = 0 in the free variables;
 * sum_i lambda_i = 1. That is d + k_interior + k + 1 equations in as many unknowns, whatever the
 * active set (Demyanov and Malozemov 1974, Introduction to Minimax, ch. 2: at a minimax point a
 * convex combination of the active gradients vanishes). The Jacobian is taken by forward
 * differences of the exact gradients. The caller checks that no other maximum is higher and that
 * the multipliers are not negative.
 */
final class MinimaxKkt {
    private static final int MAX_ITERATIONS = 40;
    private static final double JACOBIAN_STEP = 1e-7;
    /**
     * Where Newton can go no further: at a sharp peak the stationarity x d/dx ln|H|^2 is a
     * difference of two large terms and stalls near 1e-9 (a frequency error that costs its square
     * in the peak's value). The caller keeps the point only if its exact peak is not higher, and
     * the certificate checks the equal peaks and the first-order conditions on their own.
     */
    private static final double ROUND_OFF = 1e-6;

    private final MinimaxVariables v;
    private final double[] base;
    private final boolean[] free;
    private final double[][] active;

    private MinimaxKkt(MinimaxVariables v, double[] base, boolean[] free, double[][] active) {
        this.v = v;
        this.base = base;
        this.free = free;
        this.active = active;
    }

    /**
     * @param v the variables
     * @param p a point near the optimum (from {@link MinimaxTrustRegion})
     * @param tolerance a maximum is taken as active when its ln|H|^2 is within this of the peak's
     * @param counter counts transfer functions built
     * @return the solved point, or null when Newton did not converge for this active set
     */
    static double[] polish(MinimaxVariables v, double[] p, double tolerance, EvaluationCounter counter) {
        double[] lo = v.lower();
        double[] hi = v.upper();
        boolean[] free = new boolean[p.length];
        int freeCount = 0;
        for (int k = 0; k < p.length; k++) {
            free[k] = p[k] - lo[k] > 1e-9 && hi[k] - p[k] > 1e-9;
            freeCount += free[k] ? 1 : 0;
        }
        List<double[]> maxima = v.maxima(p);
        counter.add(1);
        double level = MinimaxTrustRegion.level(maxima);
        List<double[]> chosen = new ArrayList<>();
        for (double[] m : maxima) {
            if (m[2] >= level - tolerance) {
                chosen.add(m);
            }
        }
        chosen.sort(Comparator.comparingDouble((double[] m) -> -m[2]));
        while (chosen.size() > freeCount + 1) {
            chosen.remove(chosen.size() - 1);
        }
        MinimaxKkt kkt = new MinimaxKkt(v, p.clone(), free, chosen.toArray(new double[0][]));
        double[] u = kkt.start(level);
        return u == null ? null : kkt.solve(u, counter);
    }

    /** Starting unknowns; the multipliers from the least-norm convex combination of the gradients. */
    private double[] start(double level) {
        int k = active.length;
        double[][] g = new double[k][];
        for (int i = 0; i < k; i++) {
            g[i] = freePart(v.gradient(base, MinimaxVariables.scenario(active[i]), active[i][0]));
        }
        double[] lambda = SimplexLeastNorm.weights(g);
        List<Double> u = new ArrayList<>();
        for (int j = 0; j < base.length; j++) {
            if (free[j]) {
                u.add(base[j]);
            }
        }
        for (double[] m : active) {
            if (m[1] > 0) {
                u.add(m[0]);
            }
        }
        for (double l : lambda) {
            u.add(l);
        }
        u.add(level);
        return u.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private double[] freePart(double[] g) {
        double[] out = new double[count(free)];
        int n = 0;
        for (int j = 0; j < g.length; j++) {
            if (free[j]) {
                out[n++] = g[j];
            }
        }
        return out;
    }

    private static int count(boolean[] b) {
        int c = 0;
        for (boolean x : b) {
            c += x ? 1 : 0;
        }
        return c;
    }

    private double[] point(double[] u) {
        double[] p = base.clone();
        int n = 0;
        for (int j = 0; j < p.length; j++) {
            if (free[j]) {
                p[j] = u[n++];
            }
        }
        return p;
    }

    private double[] solve(double[] u, EvaluationCounter counter) {
        double[] residual = residual(u, counter);
        if (residual == null) {
            return null;
        }
        double norm = ForwardDifferenceNewton.norm(residual);
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            if (norm < 1e-12) {
                return point(u);
            }
            if (iteration >= 15 && norm > 1e-3) {
                return null;
            }
            RealVector step = ForwardDifferenceNewton.step(x -> residual(x, counter), u, residual, JACOBIAN_STEP);
            if (step == null) {
                return null;
            }
            ForwardDifferenceNewton.Accepted accepted = ForwardDifferenceNewton.backtrack(x -> residual(x, counter), u, step, norm);
            if (accepted != null) {
                u = accepted.u();
                residual = accepted.residual();
                norm = ForwardDifferenceNewton.norm(residual);
            } else {
                return norm < ROUND_OFF ? point(u) : null;
            }
        }
        return norm < ROUND_OFF ? point(u) : null;
    }

    /** The residual of the optimality system, or null outside the box or the valid domain. */
    private double[] residual(double[] u, EvaluationCounter counter) {
        double[] p = point(u);
        double[] lo = v.lower();
        double[] hi = v.upper();
        for (int j = 0; j < p.length; j++) {
            if (!(p[j] >= lo[j] && p[j] <= hi[j])) {
                return null;
            }
        }
        counter.add(1);
        int n = count(free);
        int k = active.length;
        double t = u[u.length - 1];
        double[] out = new double[u.length];
        int e = 0;
        double[] combination = new double[n];
        double lambdaSum = 0;
        int lambdaStart = u.length - 1 - k;
        for (int i = 0; i < k; i++) {
            double x = active[i][1] > 0 ? u[n + interiorIndex(i)] : active[i][0];
            if (!(x >= 0)) {
                return null;
            }
            int scenario = MinimaxVariables.scenario(active[i]);
            double value = v.logMagnitudeSquared(p, scenario, x);
            if (!Double.isFinite(value)) {
                return null;
            }
            if (active[i][1] > 0) {
                out[e++] = v.slope(p, scenario, x);
            }
            out[e++] = value - t;
            double lambda = u[lambdaStart + i];
            lambdaSum += lambda;
            double[] g = freePart(v.gradient(p, scenario, x));
            for (int j = 0; j < n; j++) {
                combination[j] += lambda * g[j];
            }
        }
        for (int j = 0; j < n; j++) {
            out[e++] = combination[j];
        }
        out[e] = lambdaSum - 1;
        return out;
    }

    private int interiorIndex(int i) {
        int c = 0;
        for (int j = 0; j < i; j++) {
            c += active[j][1] > 0 ? 1 : 0;
        }
        return c;
    }
}
