package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.response.TuningSensitivity;

/**
 * First-order optimality check of a minimax (H-infinity) design, independent of how the design
 * was found. At a minimum of F(p) = max_i h_i(p) over a box, some convex combination of the
 * gradients of the active maxima h_i (those within {@link #ACTIVE} of the peak) lies in the
 * normal cone of the box (Demyanov and Malozemov 1974, Introduction to Minimax, ch. 2; Clarke's
 * stationarity for a pointwise maximum): there are multipliers lambda_i &gt;= 0, sum 1, with
 * r = sum lambda_i grad ln h_i having r_j = 0 for a free variable inside the box, r_j &gt;= 0 for a
 * variable at its lower bound and r_j &lt;= 0 at its upper bound. The measure returned is the least
 * violation over the simplex, each variable relative to its largest active gradient component;
 * it is found by projected
 * gradient descent on the simplex (a small convex problem; 4000 steps, far beyond what two
 * variables and a handful of maxima need).
 *
 * <p>Gradients are exact ({@link TuningSensitivity}) at the frozen frequency of each maximum (the
 * envelope theorem), in the variables (ln f, zeta_a / max(zeta_a, 0.01)) so that both are
 * dimensionless and of order one.
 *
 * <p>With a stroke limit on its bound (the run-up stroke within {@link #ACTIVE} of the limit) the
 * constraint s(p) &lt;= L enters as in the Karush-Kuhn-Tucker conditions: the gradients of the
 * stroke's active maxima over the run-up join with multipliers nu_j &gt;= 0 of any size, r = sum
 * lambda_i grad ln h_i + sum nu_j grad ln s_j (a minimax of the objective subject to a minimax
 * constraint, Demyanov and Malozemov 1974, ch. 2; Clarke 1983, Optimization and Nonsmooth
 * Analysis, section 6.1). A limit that is not reached adds nothing.
 */
final class MinimaxCertificate {
    /** A maximum is active when within this relative distance of the peak. */
    static final double ACTIVE = 1e-6;
    /** Largest relative violation of the stationarity condition that certifies a design. */
    static final double STATIONARY = 1e-4;
    private static final int STEPS = 4000;

    private MinimaxCertificate() {
    }

    /**
     * @param p the problem (fixed variables and the search box respected)
     * @param f tuning ratio of the design
     * @param zeta absorber damping ratio of the design
     * @return the relative violation of the first-order conditions (0 when exactly stationary),
     *     or +infinity when the peak is not finite
     */
    static double violation(PeakProblem p, double f, double zeta) {
        return violation(p, f, zeta, 0.0);
    }

    /**
     * Whether a design is {@link #STATIONARY}: the least violation is searched only until it is
     * known to be below that bound, so a certified design costs a few steps, not {@value #STEPS}.
     *
     * @param p the problem
     * @param f tuning ratio of the design
     * @param zeta absorber damping ratio of the design
     * @return true when the first-order conditions hold to {@link #STATIONARY}
     */
    static boolean isStationary(PeakProblem p, double f, double zeta) {
        return violation(p, f, zeta, STATIONARY) <= STATIONARY;
    }

    /**
     * @param enough the search for the least violation stops once it is at or below this
     * @return as {@link #violation(PeakProblem, double, double)}, but any value at or below
     *     {@code enough} may stand for a smaller one
     */
    private static double violation(PeakProblem p, double f, double zeta, double enough) {
        TransferFunction h = p.transferFunction(f, zeta);
        List<Double> xs = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        for (double g : PeakFinder.interiorMaxima(h, p.bandLow(), p.bandHigh())) {
            xs.add(g * g);
            values.add(h.magnitude(g));
        }
        if (p.bandLow() > 0) {
            xs.add(p.bandLow() * p.bandLow());
            values.add(h.magnitude(p.bandLow()));
        }
        if (Double.isFinite(p.bandHigh())) {
            xs.add(p.bandHigh() * p.bandHigh());
            values.add(h.magnitude(p.bandHigh()));
        }
        double peak = PeakFinder.over(h, p.bandLow(), p.bandHigh()).magnitude();
        if (!Double.isFinite(peak) || !(peak > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        boolean tuningFree = Double.isNaN(p.fixedTuning());
        boolean dampingFree = Double.isNaN(p.fixedDamping());
        if (!tuningFree && !dampingFree) {
            return 0.0;
        }
        TuningSensitivity sensitivity = p.sensitivity(f, zeta);
        List<double[]> gradients = new ArrayList<>();
        double largest = 0;
        for (int i = 0; i < xs.size(); i++) {
            if (values.get(i) >= peak * (1 - ACTIVE)) {
                double[] full = sensitivity.gradient(xs.get(i));
                double[] g = {tuningFree ? f * full[0] : 0.0, dampingFree ? Math.max(zeta, 1e-2) * full[1] : 0.0};
                if (!Double.isFinite(g[0]) || !Double.isFinite(g[1])) {
                    return Double.POSITIVE_INFINITY;
                }
                gradients.add(g);
                largest = Math.max(largest, Math.hypot(g[0], g[1]));
            }
        }
        List<double[]> strokeGradients = p.hasStrokeLimit() ? strokeGradients(p, f, zeta, tuningFree, dampingFree)
                : List.of();
        if (strokeGradients == null) {
            return Double.POSITIVE_INFINITY;
        }
        if (gradients.isEmpty()) {
            // The peak is only approached towards infinite frequency. There the absorber's spring
            // and damper (K(s) = f^2 + 2 zeta_a f s, of degree one) drop out of the leading terms of
            // N and D, so the limit is the same for every (f, zeta_a): no design does better.
            return 0.0;
        }
        if (largest < 1e-12) {
            return 0.0; // the peak does not depend on the design to first order
        }
        // sign of the allowed residual per variable: 0 free interior, +1 at lower bound, -1 at upper bound
        int[] side = {boundSide(tuningFree, f, p.minTuning(), p.maxTuning()),
            boundSide(dampingFree, zeta, 0.0, PeakProblem.MAX_DAMPING)};
        int k = gradients.size();
        // Each variable is scaled by its own largest active component (a diagonal change of
        // variables leaves the conditions unchanged): a violation in a variable whose gradients
        // are small (the damping near zeta_a = 0 beside a sharp peak in f) is not drowned by the other.
        double[] scale = new double[2];
        for (double[] gi : gradients) {
            scale[0] = Math.max(scale[0], Math.abs(gi[0]));
            scale[1] = Math.max(scale[1], Math.abs(gi[1]));
        }
        double[][] g = new double[k][];
        double lipschitz = 0;
        for (int i = 0; i < k; i++) {
            g[i] = new double[2];
            for (int j = 0; j < 2; j++) {
                g[i][j] = scale[j] > 1e-14 * largest && scale[j] > 1e-300 ? gradients.get(i)[j] / scale[j] : 0.0;
            }
            lipschitz += g[i][0] * g[i][0] + g[i][1] * g[i][1];
        }
        // stroke generators in the same scaled variables, each of unit length (its multiplier is
        // unbounded, so only its direction matters)
        int m = strokeGradients.size();
        double[][] s = new double[m][];
        for (int j = 0; j < m; j++) {
            s[j] = new double[2];
            for (int c = 0; c < 2; c++) {
                s[j][c] = scale[c] > 1e-14 * largest && scale[c] > 1e-300 ? strokeGradients.get(j)[c] / scale[c] : 0.0;
            }
            double length = Math.hypot(s[j][0], s[j][1]);
            if (length > 0) {
                s[j][0] /= length;
                s[j][1] /= length;
            }
            lipschitz += 1.0;
        }
        double step = 0.5 / Math.max(lipschitz, 1e-12);
        double[] lambda = new double[k];
        Arrays.fill(lambda, 1.0 / k);
        double[] nu = new double[m];
        double[] sorted = new double[k];
        double best = Double.POSITIVE_INFINITY;
        for (int iteration = 0; iteration < STEPS; iteration++) {
            double r0 = 0;
            double r1 = 0;
            for (int i = 0; i < k; i++) {
                r0 += lambda[i] * g[i][0];
                r1 += lambda[i] * g[i][1];
            }
            for (int j = 0; j < m; j++) {
                r0 += nu[j] * s[j][0];
                r1 += nu[j] * s[j][1];
            }
            double v0 = allowedPart(r0, side[0]);
            double v1 = allowedPart(r1, side[1]);
            best = Math.min(best, Math.hypot(v0, v1));
            if (best < 1e-15 || best <= enough) {
                break;
            }
            for (int i = 0; i < k; i++) {
                lambda[i] = lambda[i] - step * 2 * (v0 * g[i][0] + v1 * g[i][1]);
            }
            for (int j = 0; j < m; j++) {
                nu[j] = Math.max(0.0, nu[j] - step * 2 * (v0 * s[j][0] + v1 * s[j][1]));
            }
            projectOntoSimplex(lambda, sorted);
        }
        return best;
    }

    /**
     * @return the gradients (in the free variables, unscaled) of the stroke's maxima over the
     *     run-up that are within {@link #ACTIVE} of the limit; empty when the limit is not reached;
     *     null when a gradient is not finite
     */
    private static List<double[]> strokeGradients(PeakProblem p, double f, double zeta, boolean tuningFree,
            boolean dampingFree) {
        TransferFunction stroke = p.strokeTransferFunction(f, zeta);
        List<Double> xs = new ArrayList<>();
        for (double g : PeakFinder.interiorMaxima(stroke, 0.0, p.strokeTop())) {
            xs.add(g * g);
        }
        xs.add(0.0);
        if (Double.isFinite(p.strokeTop())) {
            xs.add(p.strokeTop() * p.strokeTop());
        }
        List<double[]> out = new ArrayList<>();
        double level = p.strokeLimit() * (1 - ACTIVE);
        TuningSensitivity sensitivity = null;
        for (double x : xs) {
            double value = stroke.magnitude(Math.sqrt(x));
            if (!(value >= level) || x == 0.0 && !(value > 0)) {
                continue;
            }
            if (sensitivity == null) {
                sensitivity = p.strokeSensitivity(f, zeta);
            }
            double[] full = sensitivity.gradient(x);
            double[] g = {tuningFree ? f * full[0] : 0.0, dampingFree ? Math.max(zeta, 1e-2) * full[1] : 0.0};
            if (!Double.isFinite(g[0]) || !Double.isFinite(g[1])) {
                return null;
            }
            out.add(g);
        }
        return out;
    }

    private static int boundSide(boolean free, double value, double low, double high) {
        if (!free) {
            return 2; // fixed: no condition on this component
        }
        if (value <= low * (1 + 1e-9) + (low == 0 ? 1e-12 : 0)) {
            return 1;
        }
        if (value >= high * (1 - 1e-9)) {
            return -1;
        }
        return 0;
    }

    /** The part of a residual component that violates its condition (see the class comment). */
    private static double allowedPart(double r, int side) {
        return switch (side) {
            case 0 -> r;
            case 1 -> Math.min(r, 0.0);
            case -1 -> Math.max(r, 0.0);
            default -> 0.0;
        };
    }

    /**
     * Euclidean projection onto the probability simplex (sort-based; Held, Wolfe and Crowder 1974),
     * in place; {@code sorted} is scratch space of the same length.
     */
    static void projectOntoSimplex(double[] y, double[] sorted) {
        System.arraycopy(y, 0, sorted, 0, y.length);
        Arrays.sort(sorted);
        double cumulative = 0;
        double theta = 0;
        for (int i = sorted.length - 1; i >= 0; i--) {
            cumulative += sorted[i];
            double t = (cumulative - 1) / (sorted.length - i);
            if (i == 0 || sorted[i - 1] <= t) {
                theta = t;
                break;
            }
        }
        for (int i = 0; i < y.length; i++) {
            y[i] = Math.max(y[i] - theta, 0.0);
        }
    }
}
