package org.counterpoise.core.optim;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealVector;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.response.TuningSensitivity;

/**
 * Solves the optimality conditions of a minimax absorber design for one guessed active set by
 * Newton's method. Unknowns: the free design variables (f and/or zeta_a) and the frequency
 * (x = g^2) of each active interior peak. Equations:
 * <ul>
 *   <li>each active interior peak is stationary in frequency: x d/dx ln|H|^2 = 0;</li>
 *   <li>all active maxima are equally high: ln h_0 - ln h_j = 0;</li>
 *   <li>with one active maximum, its gradient in the free variables vanishes; with two active
 *       maxima and two free variables, their gradients are parallel (the determinant of the two
 *       gradients, normalised, vanishes).</li>
 * </ul>
 * The gradient of a peak value in the design variables is taken at its frozen frequency (the
 * envelope theorem: the peak's own movement does not change its value to first order), exactly
 * ({@link TuningSensitivity}). The Jacobian of the system is taken by forward differences. These are the
 * first-order conditions for a minimum of the largest of the active maxima (Demyanov and
 * Malozemov 1974, Introduction to Minimax, ch. 2); the caller verifies the sign of the
 * multipliers and that no other maximum is higher.
 *
 * <p>With the stroke limit active, the stroke's highest maximum over the run-up joins the set as
 * one more active maximum, tied to the limit instead of to the others: unknowns gain its frequency
 * (when interior), equations gain its stationarity and ln s - ln L = 0, and with one active
 * maximum of the objective and two free variables the objective's and the stroke's gradients are
 * parallel (the Karush-Kuhn-Tucker condition; the sign of the multiplier is checked by
 * {@link MinimaxCertificate}).
 */
final class ActiveSetNewton {
    private static final int MAX_ITERATIONS = 40;
    private static final double JACOBIAN_STEP = 1e-7;

    private final PeakProblem problem;
    private final boolean[] interior;
    private final double[] fixedX;
    private final boolean tuningFree;
    private final boolean dampingFree;
    /** true when the stroke limit is one of the active maxima */
    private final boolean stroke;
    private final boolean strokeInterior;
    private final double strokeX;
    private int evaluations;

    /**
     * @param problem the problem (fixed tuning or damping respected)
     * @param interior for each active maximum: true for an interior peak, false for a band end
     * @param x for each active maximum: its starting (interior) or fixed (band end) x = g^2
     */
    ActiveSetNewton(PeakProblem problem, boolean[] interior, double[] x) {
        this(problem, interior, x, false, false, Double.NaN);
    }

    /**
     * @param problem the problem, with a stroke limit
     * @param candidates candidate maxima of the objective {x, 1 for interior or 0 for a band end, value}
     * @param set indices of the active ones
     * @param strokeInterior true when the active stroke maximum is interior to the run-up, false
     *     for an end of it
     * @param strokeX its starting (interior) or fixed (end) x = g^2
     * @return the solver with the stroke limit active
     */
    static ActiveSetNewton withStroke(PeakProblem problem, List<double[]> candidates, int[] set,
            boolean strokeInterior, double strokeX) {
        return new ActiveSetNewton(problem, interiorOf(candidates, set), xOf(candidates, set), true, strokeInterior,
                strokeX);
    }

    /**
     * @param problem the problem
     * @param candidates candidate maxima {x, 1 for interior or 0 for a band end, value}
     * @param set indices of the active ones
     * @return the solver for that active set (no stroke limit)
     */
    static ActiveSetNewton of(PeakProblem problem, List<double[]> candidates, int[] set) {
        return new ActiveSetNewton(problem, interiorOf(candidates, set), xOf(candidates, set));
    }

    private static boolean[] interiorOf(List<double[]> candidates, int[] set) {
        boolean[] interior = new boolean[set.length];
        for (int i = 0; i < set.length; i++) {
            interior[i] = candidates.get(set[i])[1] > 0;
        }
        return interior;
    }

    private static double[] xOf(List<double[]> candidates, int[] set) {
        double[] x = new double[set.length];
        for (int i = 0; i < set.length; i++) {
            x[i] = candidates.get(set[i])[0];
        }
        return x;
    }

    private ActiveSetNewton(PeakProblem problem, boolean[] interior, double[] x, boolean stroke,
            boolean strokeInterior, double strokeX) {
        this.problem = problem;
        this.interior = interior.clone();
        this.fixedX = x.clone();
        this.tuningFree = Double.isNaN(problem.fixedTuning());
        this.dampingFree = Double.isNaN(problem.fixedDamping());
        this.stroke = stroke;
        this.strokeInterior = stroke && strokeInterior;
        this.strokeX = strokeX;
    }

    /** @return for each active maximum of the objective: true for an interior peak, false for a band end */
    boolean[] interior() {
        return interior.clone();
    }

    int evaluations() {
        return evaluations;
    }

    int freeCount() {
        return (tuningFree ? 1 : 0) + (dampingFree ? 1 : 0);
    }

    /** @return true when this active set gives a square system */
    boolean isSquare() {
        int k = interior.length;
        int d = freeCount();
        return d >= 1 && k >= 1 && k <= d + (stroke ? 0 : 1);
    }

    /**
     * @param f starting tuning ratio
     * @param zeta starting damping ratio
     * @return the solution {f, zeta, x_0, ..., x_k-1} (and the stroke's x last when the stroke is
     *     active), or null when Newton did not converge
     */
    double[] solve(double f, double zeta) {
        double[] u = initialUnknowns(f, zeta);
        double[] residual = residual(u);
        if (residual == null) {
            return null;
        }
        double norm = ForwardDifferenceNewton.norm(residual);
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            if (norm < 1e-13) {
                return solution(u);
            }
            if (iteration >= 12 && norm > 1e-3) {
                return null; // far from converging: this active set is not the one
            }
            RealVector step = ForwardDifferenceNewton.step(this::residual, u, residual, JACOBIAN_STEP);
            if (step == null) {
                return null;
            }
            ForwardDifferenceNewton.Accepted accepted = ForwardDifferenceNewton.backtrack(this::residual, u, step, norm);
            if (accepted == null) {
                return norm < 1e-9 ? solution(u) : null;
            }
            u = accepted.u();
            residual = accepted.residual();
            double stepSize = accepted.alpha() * step.getNorm();
            norm = ForwardDifferenceNewton.norm(residual);
            if (stepSize < 1e-14 * (1 + new ArrayRealVector(u).getNorm())) {
                return norm < 1e-8 ? solution(u) : null;
            }
        }
        return norm < 1e-9 ? solution(u) : null;
    }

    private double[] initialUnknowns(double f, double zeta) {
        double[] u = new double[freeCount() + countInterior() + (strokeInterior ? 1 : 0)];
        int n = 0;
        if (tuningFree) {
            u[n++] = f;
        }
        if (dampingFree) {
            u[n++] = zeta;
        }
        for (int i = 0; i < interior.length; i++) {
            if (interior[i]) {
                u[n++] = fixedX[i];
            }
        }
        if (strokeInterior) {
            u[n] = strokeX;
        }
        return u;
    }

    private int countInterior() {
        int c = 0;
        for (boolean b : interior) {
            if (b) {
                c++;
            }
        }
        return c;
    }

    /** @return {f, zeta, x_0..x_k-1} */
    private double[] solution(double[] u) {
        double[] out = new double[2 + interior.length + (stroke ? 1 : 0)];
        int n = 0;
        out[0] = tuningFree ? u[n++] : problem.fixedTuning();
        out[1] = dampingFree ? u[n++] : problem.fixedDamping();
        for (int i = 0; i < interior.length; i++) {
            out[2 + i] = interior[i] ? u[n++] : fixedX[i];
        }
        if (stroke) {
            out[2 + interior.length] = strokeInterior ? u[n] : strokeX;
        }
        return out;
    }

    /** The residual of the optimality system, or null outside the valid domain. */
    private double[] residual(double[] u) {
        double[] s = solution(u);
        double f = s[0];
        double zeta = s[1];
        if (!(f > 0) || !(zeta >= 0) || !problem.inBox(f, zeta)) {
            return null;
        }
        int k = interior.length;
        double[] x = Arrays.copyOfRange(s, 2, 2 + k);
        for (int i = 0; i < k; i++) {
            if (!(x[i] > 0)) {
                return null;
            }
        }
        TransferFunction h = build(f, zeta);
        TuningSensitivity sensitivity = problem.sensitivity(f, zeta);
        double[] out = new double[u.length];
        int n = 0;
        double[] logValue = new double[k];
        for (int i = 0; i < k; i++) {
            logValue[i] = h.logMagnitudeSquared(x[i]);
            if (!Double.isFinite(logValue[i])) {
                return null;
            }
            if (interior[i]) {
                out[n++] = x[i] * h.logMagnitudeSquaredSlope(x[i]);
            }
        }
        for (int j = 1; j < k; j++) {
            out[n++] = logValue[0] - logValue[j];
        }
        int d = freeCount();
        if (stroke) {
            double xs = s[2 + k];
            if (!(xs >= 0)) {
                return null;
            }
            TransferFunction strokeFunction = problem.strokeTransferFunction(f, zeta);
            double logStroke = strokeFunction.logMagnitudeSquared(xs);
            if (!Double.isFinite(logStroke)) {
                return null;
            }
            if (strokeInterior) {
                out[n++] = xs * strokeFunction.logMagnitudeSquaredSlope(xs);
            }
            out[n++] = logStroke - 2 * Math.log(problem.strokeLimit());
            if (k == 1 && d == 2) {
                double[] g0 = gradient(sensitivity, f, zeta, x[0]);
                double[] gs = gradient(problem.strokeSensitivity(f, zeta), f, zeta, xs);
                double scale = Math.hypot(g0[0], g0[1]) * Math.hypot(gs[0], gs[1]);
                out[n++] = scale > 0 ? (g0[0] * gs[1] - g0[1] * gs[0]) / scale : 0.0;
            }
            return out;
        }
        if (k == 1) {
            for (double component : gradient(sensitivity, f, zeta, x[0])) {
                out[n++] = component;
            }
        } else if (k == 2 && d == 2) {
            double[] g0 = gradient(sensitivity, f, zeta, x[0]);
            double[] g1 = gradient(sensitivity, f, zeta, x[1]);
            double scale = Math.hypot(g0[0], g0[1]) * Math.hypot(g1[0], g1[1]);
            out[n++] = scale > 0 ? (g0[0] * g1[1] - g0[1] * g1[0]) / scale : 0.0;
        }
        return out;
    }

    /**
     * Exact gradient of ln|H|^2 at frozen x in the free variables, each times a scale of that
     * variable (so the equations are dimensionless).
     */
    private double[] gradient(TuningSensitivity sensitivity, double f, double zeta, double x) {
        double[] full = sensitivity.gradient(x);
        double[] g = new double[freeCount()];
        int n = 0;
        if (tuningFree) {
            g[n++] = f * full[0];
        }
        if (dampingFree) {
            g[n++] = Math.max(zeta, 1e-2) * full[1];
        }
        return g;
    }

    private TransferFunction build(double f, double zeta) {
        evaluations++;
        return problem.transferFunction(f, zeta);
    }
}
