package org.counterpoise.core.optim;

import java.util.List;
import org.apache.commons.math3.linear.RealVector;

/**
 * The optimality conditions of the hysteretic minimax problem for one guessed active set, solved by
 * Newton's method: the same conditions as the viscous {@link ActiveSetNewton} (Demyanov and
 * Malozemov 1974, Introduction to Minimax, ch. 2), in the unknowns ln f, eta (when free) and the
 * frequency g of each active interior peak:
 * <ul>
 *   <li>each active interior peak is stationary in frequency: g d/dg ln|H|^2 = 0;</li>
 *   <li>the active maxima are equally high: ln h_0 - ln h_j = 0;</li>
 *   <li>one active maximum: its gradient in the free variables vanishes; two active maxima and two
 *       free variables: their gradients are parallel (normalised determinant zero).</li>
 * </ul>
 * Gradients at frozen frequencies are exact (envelope theorem, {@code HystereticResponse#gradient});
 * the Jacobian is taken by forward differences; a backtracking line search keeps each step a
 * decrease of the residual. The caller checks the multipliers' signs and that no other maximum is
 * higher ({@link HystereticCertificate}).
 */
final class HystereticActiveSet {
    private static final int MAX_ITERATIONS = 40;
    private static final double JACOBIAN_STEP = 1e-7;

    private final HystereticProblem problem;
    private final boolean[] interior;
    private final double[] fixedG;

    /**
     * @param problem the problem (eta free or held)
     * @param candidates candidate maxima {g, 1 interior or 0 band end, value}
     * @param set indices of the active ones
     */
    HystereticActiveSet(HystereticProblem problem, List<double[]> candidates, int[] set) {
        this.problem = problem;
        this.interior = new boolean[set.length];
        this.fixedG = new double[set.length];
        for (int i = 0; i < set.length; i++) {
            interior[i] = candidates.get(set[i])[1] > 0;
            fixedG[i] = candidates.get(set[i])[0];
        }
    }

    /** @return true when this active set gives a square system */
    boolean isSquare() {
        return interior.length >= 1 && interior.length <= problem.freeCount() + 1;
    }

    /**
     * @param f starting tuning ratio
     * @param eta starting loss factor (ignored when held)
     * @return {f, eta} solving the conditions, or null when Newton does not converge
     */
    double[] solve(double f, double eta) {
        double[] u = initial(f, eta);
        double[] residual = residual(u);
        if (residual == null) {
            return null;
        }
        double norm = ForwardDifferenceNewton.norm(residual);
        for (int iteration = 0; iteration < MAX_ITERATIONS && norm >= 1e-13; iteration++) {
            if (iteration >= 12 && norm > 1e-3) {
                return null;
            }
            RealVector step = ForwardDifferenceNewton.step(this::residual, u, residual, JACOBIAN_STEP);
            if (step == null) {
                return null;
            }
            ForwardDifferenceNewton.Accepted accepted = ForwardDifferenceNewton.backtrack(this::residual, u, step, norm);
            if (accepted != null) {
                u = accepted.u();
                residual = accepted.residual();
                norm = ForwardDifferenceNewton.norm(residual);
            } else {
                break;
            }
        }
        return norm < 1e-9 ? design(u) : null;
    }

    private double[] initial(double f, double eta) {
        int free = problem.freeCount();
        double[] u = new double[free + countInterior()];
        u[0] = Math.log(f);
        if (free == 2) {
            u[1] = eta;
        }
        int n = free;
        for (int i = 0; i < interior.length; i++) {
            if (interior[i]) {
                u[n++] = fixedG[i];
            }
        }
        return u;
    }

    private int countInterior() {
        int c = 0;
        for (boolean b : interior) {
            c += b ? 1 : 0;
        }
        return c;
    }

    private double[] design(double[] u) {
        return new double[] {Math.exp(u[0]), problem.freeCount() == 2 ? u[1] : problem.eta()};
    }

    /** The residual of the conditions, or null outside the box. */
    private double[] residual(double[] u) {
        double[] design = design(u);
        double f = design[0];
        double eta = design[1];
        if (!problem.inBox(f, eta)) {
            return null;
        }
        int k = interior.length;
        double[] g = new double[k];
        int n = problem.freeCount();
        for (int i = 0; i < k; i++) {
            g[i] = interior[i] ? u[n++] : fixedG[i];
            if (!(g[i] >= problem.gLow()) || !(g[i] <= problem.gHigh()) || !Double.isFinite(g[i])) {
                return null;
            }
        }
        double[] out = new double[u.length];
        int m = 0;
        double[] logValue = new double[k];
        for (int i = 0; i < k; i++) {
            logValue[i] = problem.logSquared(f, eta, g[i]);
            if (!Double.isFinite(logValue[i])) {
                return null;
            }
            if (interior[i]) {
                out[m++] = problem.frequencySlope(f, eta, g[i]);
            }
        }
        for (int j = 1; j < k; j++) {
            out[m++] = logValue[0] - logValue[j];
        }
        int d = problem.freeCount();
        if (k == 1) {
            for (double component : problem.scaledGradient(f, eta, g[0])) {
                out[m++] = component;
            }
        } else if (k == 2 && d == 2) {
            double[] g0 = problem.scaledGradient(f, eta, g[0]);
            double[] g1 = problem.scaledGradient(f, eta, g[1]);
            double scale = Math.hypot(g0[0], g0[1]) * Math.hypot(g1[0], g1[1]);
            out[m++] = scale > 0 ? (g0[0] * g1[1] - g0[1] * g1[0]) / scale : 0.0;
        }
        return out;
    }
}
