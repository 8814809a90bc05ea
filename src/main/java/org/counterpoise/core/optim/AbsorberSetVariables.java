package org.counterpoise.core.optim;

import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.system.AbsorberSensitivity;
import org.counterpoise.core.system.FactoredReceptance;

/**
 * The design variables of several absorbers on one mode, as the minimax solvers see them: a point p
 * in a box, the design it stands for, and the exact gradient of ln|H|^2 at a frozen frequency.
 * <ul>
 *   <li>uniform: p = (ln f_c, delta, ln zeta) with f_j = f_c (1 + delta c_j),
 *       c_j = j / (n - 1) - 1/2 (so delta = (f_max - f_min) / f_c), zeta_j = zeta; for one absorber
 *       p = (ln f, ln zeta);</li>
 *   <li>individual: p = (ln f_1 .. ln f_n, ln zeta_1 .. ln zeta_n).</li>
 * </ul>
 * Logarithms keep the variables dimensionless and of order one, and the damping above zero.
 *
 * <p>The point may be judged on a build off nominal (a scenario of {@link RobustSetVariables}): the
 * structure's natural frequency times a factor sigma (its stiffness by sigma^2; modal mass and
 * damping ratio kept; the response still per F / k1 of the nominal structure, so a stiffer
 * structure's smaller deflection counts) and every absorber's natural frequency times a common
 * factor alpha (one spring batch: spring rates by alpha^2, masses and dampers kept, so each damping
 * ratio becomes zeta_j / alpha). The variables stay those of the design as drawn.
 */
final class AbsorberSetVariables implements MinimaxVariables {
    private final AbsorberSetProblem problem;
    private final int n;
    private final boolean uniform;
    private final double structureFactor;
    private final double absorberFactor;

    AbsorberSetVariables(AbsorberSetProblem problem) {
        this(problem, 1.0, 1.0);
    }

    /**
     * @param problem the problem
     * @param structureFactor sigma, the structure's natural frequency over nominal
     * @param absorberFactor alpha, every absorber's natural frequency over nominal
     */
    AbsorberSetVariables(AbsorberSetProblem problem, double structureFactor, double absorberFactor) {
        this.problem = problem;
        this.n = problem.count();
        this.uniform = problem.tuning() == AbsorberSetTuning.UNIFORM;
        this.structureFactor = structureFactor;
        this.absorberFactor = absorberFactor;
    }

    AbsorberSetProblem problem() {
        return problem;
    }

    @Override
    public int dimension() {
        return uniform ? (n == 1 ? 2 : 3) : 2 * n;
    }

    @Override
    public double[] lower() {
        double[] out = new double[dimension()];
        for (int k = 0; k < out.length; k++) {
            out[k] = isSpread(k) ? 0.0 : isDamping(k) ? Math.log(AbsorberSetProblem.MIN_DAMPING)
                    : Math.log(AbsorberSetProblem.MIN_TUNING);
        }
        return out;
    }

    @Override
    public double[] upper() {
        double[] out = new double[dimension()];
        for (int k = 0; k < out.length; k++) {
            out[k] = isSpread(k) ? AbsorberSetProblem.MAX_SPREAD : isDamping(k) ? Math.log(AbsorberSetProblem.MAX_DAMPING)
                    : Math.log(AbsorberSetProblem.MAX_TUNING);
        }
        return out;
    }

    private boolean isSpread(int k) {
        return uniform && n > 1 && k == 1;
    }

    /** @return true when variable k is a (log) damping ratio */
    boolean isDamping(int k) {
        return uniform ? k == dimension() - 1 : k >= n;
    }

    /** c_j, the place of absorber j in the uniform spread. */
    private double place(int j) {
        return n == 1 ? 0.0 : (double) j / (n - 1) - 0.5;
    }

    AbsorberSetDesign design(double[] p) {
        double[] f = new double[n];
        double[] z = new double[n];
        for (int j = 0; j < n; j++) {
            if (uniform) {
                double spread = n == 1 ? 0.0 : p[1];
                f[j] = Math.exp(p[0]) * (1 + spread * place(j));
                z[j] = Math.exp(p[dimension() - 1]);
            } else {
                f[j] = Math.exp(p[j]);
                z[j] = Math.exp(p[n + j]);
            }
        }
        return problem.design(f, z);
    }

    /**
     * @param centre f_c (uniform) or the tuning of every absorber (individual)
     * @param spread delta (ignored by individual, which spreads its tunings the same way)
     * @param damping zeta for every absorber
     * @return the point
     */
    double[] point(double centre, double spread, double damping) {
        if (uniform) {
            return n == 1 ? new double[] {Math.log(centre), Math.log(damping)}
                    : new double[] {Math.log(centre), spread, Math.log(damping)};
        }
        double[] p = new double[2 * n];
        for (int j = 0; j < n; j++) {
            p[j] = Math.log(centre * (1 + spread * place(j)));
            p[n + j] = Math.log(damping);
        }
        return p;
    }

    /**
     * @param design a design of these variables' rule (uniform: equally spaced tunings, one damping)
     * @return its point: centre, spread and damping read back (uniform), or each tuning and damping
     */
    double[] pointOf(AbsorberSetDesign design) {
        if (!uniform) {
            return individualPoint(design);
        }
        double low = design.tuningRatios().get(0);
        double high = design.tuningRatios().get(n - 1);
        double centre = (low + high) / 2;
        return point(centre, n == 1 ? 0.0 : (high - low) / centre, design.dampingRatios().get(0));
    }

    /** @return the individual point of a design */
    double[] individualPoint(AbsorberSetDesign design) {
        double[] p = new double[2 * n];
        for (int j = 0; j < n; j++) {
            p[j] = Math.log(design.tuningRatios().get(j));
            p[n + j] = Math.log(design.dampingRatios().get(j));
        }
        return p;
    }

    /**
     * @param d the design as drawn
     * @return the absorbers as built in this scenario (tunings times alpha, damping ratios over alpha)
     */
    AbsorberSetDesign built(AbsorberSetDesign d) {
        if (absorberFactor == 1.0) {
            return d;
        }
        double[] f = new double[n];
        double[] z = new double[n];
        for (int j = 0; j < n; j++) {
            f[j] = d.tuningRatios().get(j) * absorberFactor;
            z[j] = d.dampingRatios().get(j) / absorberFactor;
        }
        return problem.design(f, z);
    }

    @Override
    public TransferFunction transferFunction(double[] p) {
        return problem.system(built(design(p)), structureFactor).transferFunction(problem.forcePoint(),
                problem.responsePoint());
    }

    /**
     * @param p the point
     * @param x squared frequency ratio of a maximum
     * @return d ln|H|^2 / dp at frozen x
     */
    @Override
    public double[] gradient(double[] p, double x) {
        // built: d ln f_j (as built) = d ln f_j (as drawn), and d ln zeta_j likewise, so the chain
        // rule only takes each damping ratio as built
        AbsorberSetDesign d = built(design(p));
        double[][] g = AbsorberSensitivity.gradient(problem.system(d, structureFactor), problem.forcePoint(),
                problem.responsePoint(), Math.sqrt(x));
        double[] out = new double[dimension()];
        for (int j = 0; j < n; j++) {
            double zeta = d.dampingRatios().get(j);
            if (uniform) {
                out[0] += g[j][0];
                if (n > 1) {
                    out[1] += g[j][0] * place(j) / (1 + p[1] * place(j));
                }
                out[dimension() - 1] += g[j][1] * zeta;
            } else {
                out[j] = g[j][0];
                out[n + j] = g[j][1] * zeta;
            }
        }
        return out;
    }

    @Override
    public DoubleUnaryOperator logMagnitudeSquared(double[] p) {
        AbsorberSetDesign d = built(design(p));
        if (problem.surroundings().isPresent()) {
            // the whole structure: the factored form of every modal and absorber term (as one absorber per mode)
            FactoredReceptance h = FactoredReceptance.of(problem.system(d, structureFactor), problem.forcePoint(),
                    problem.responsePoint());
            return x -> Math.log(h.magnitudeSquared(Math.sqrt(x)));
        }
        double[] f = tunings(d);
        double[] z = dampings(d);
        double zeta1 = problem.structureDamping();
        return x -> logMagnitudeSquared(f, z, x, zeta1);
    }

    @Override
    public double bandLow() {
        return problem.bandLow();
    }

    @Override
    public double bandHigh() {
        return problem.bandHigh();
    }

    /**
     * ln|H|^2 at s = i g, x = g^2, of H = 1 / (s^2 + 2 zeta1 sigma s + sigma^2 + sum_j mu_j s^2 K_j / (s^2 + K_j)),
     * K_j = f_j^2 + 2 zeta_j f_j s (the factored form of {@code ModalSystem}'s H for one mode,
     * {@link AbsorberSensitivity#value}, in primitive complex arithmetic: each term on its own, no
     * expanded polynomial).
     */
    private double logMagnitudeSquared(double[] f, double[] zeta, double x, double zeta1) {
        double g = Math.sqrt(x);
        double mu = problem.massRatio() / problem.count();
        double sigma = structureFactor;
        double re = sigma * sigma - x;
        double im = 2 * zeta1 * sigma * g;
        for (int j = 0; j < f.length; j++) {
            double kr = f[j] * f[j];
            double ki = 2 * zeta[j] * f[j] * g;
            // z = -mu x K / (K - x)
            double br = kr - x;
            double den = br * br + ki * ki;
            double qr = (kr * br + ki * ki) / den;
            double qi = (ki * br - kr * ki) / den;
            re -= mu * x * qr;
            im -= mu * x * qi;
        }
        return -Math.log(re * re + im * im);
    }

    private static double[] tunings(AbsorberSetDesign d) {
        return d.tuningRatios().stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static double[] dampings(AbsorberSetDesign d) {
        return d.dampingRatios().stream().mapToDouble(Double::doubleValue).toArray();
    }
}
