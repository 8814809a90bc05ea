package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.rational.RealRoots;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.system.AbsorberSensitivity;
import org.counterpoise.core.system.FactoredPeaks;

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
 */
final class AbsorberSetVariables {
    private final AbsorberSetProblem problem;
    private final int n;
    private final boolean uniform;

    AbsorberSetVariables(AbsorberSetProblem problem) {
        this.problem = problem;
        this.n = problem.count();
        this.uniform = problem.tuning() == AbsorberSetTuning.UNIFORM;
    }

    AbsorberSetProblem problem() {
        return problem;
    }

    int dimension() {
        return uniform ? (n == 1 ? 2 : 3) : 2 * n;
    }

    double[] lower() {
        double[] out = new double[dimension()];
        for (int k = 0; k < out.length; k++) {
            out[k] = isSpread(k) ? 0.0 : isDamping(k) ? Math.log(AbsorberSetProblem.MIN_DAMPING)
                    : Math.log(AbsorberSetProblem.MIN_TUNING);
        }
        return out;
    }

    double[] upper() {
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

    private boolean isDamping(int k) {
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

    /** @return the individual point of a design */
    double[] individualPoint(AbsorberSetDesign design) {
        double[] p = new double[2 * n];
        for (int j = 0; j < n; j++) {
            p[j] = Math.log(design.tuningRatios().get(j));
            p[n + j] = Math.log(design.dampingRatios().get(j));
        }
        return p;
    }

    TransferFunction transferFunction(double[] p) {
        return problem.transferFunction(design(p));
    }

    /**
     * @param p the point
     * @param x squared frequency ratio of a maximum
     * @return d ln|H|^2 / dp at frozen x
     */
    double[] gradient(double[] p, double x) {
        AbsorberSetDesign d = design(p);
        double[][] g = AbsorberSensitivity.gradient(problem.system(d), AbsorberSetProblem.POINT,
                AbsorberSetProblem.POINT, Math.sqrt(x));
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

    /**
     * @param p the point
     * @param x squared frequency ratio
     * @return ln|H|^2 from the factored form, well conditioned (see {@link #logMagnitudeSquared(double[], double[], double, double)})
     */
    double logMagnitudeSquared(double[] p, double x) {
        AbsorberSetDesign d = design(p);
        return logMagnitudeSquared(tunings(d), dampings(d), x, problem.structureDamping());
    }

    /**
     * ln|H|^2 at s = i g, x = g^2, of H = 1 / (s^2 + 2 zeta1 s + 1 + sum_j mu_j s^2 K_j / (s^2 + K_j)),
     * K_j = f_j^2 + 2 zeta_j f_j s (the factored form of {@code ModalSystem}'s H for one mode,
     * {@link AbsorberSensitivity#value}, in primitive complex arithmetic: each term on its own, no
     * expanded polynomial).
     */
    private double logMagnitudeSquared(double[] f, double[] zeta, double x, double zeta1) {
        double g = Math.sqrt(x);
        double mu = problem.massRatio() / problem.count();
        double re = 1 - x;
        double im = 2 * zeta1 * g;
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

    /**
     * @param p the point
     * @param x squared frequency ratio (&gt; 0)
     * @return x d/dx ln|H|^2 (zero at an interior maximum), by central differences in ln x of the
     *     factored form (step 1e-5: truncation about 1e-10, round-off about 1e-11)
     */
    double slope(double[] p, double x) {
        AbsorberSetDesign d = design(p);
        double[] f = tunings(d);
        double[] z = dampings(d);
        double h = 1e-5;
        double zeta1 = problem.structureDamping();
        return (logMagnitudeSquared(f, z, x * Math.exp(h), zeta1) - logMagnitudeSquared(f, z, x * Math.exp(-h), zeta1))
                / (2 * h);
    }

    /**
     * @param p the point
     * @return the peak over the band from the expanded polynomials alone (for the coarse scan)
     */
    double polynomialPeak(double[] p) {
        return PeakFinder.over(transferFunction(p), problem.bandLow(), problem.bandHigh()).magnitude();
    }

    /**
     * The exact peak over the band: the largest of {@link #maxima}.
     *
     * @param p the point
     * @return max |H| over the band
     */
    double peak(double[] p) {
        return Math.exp(MinimaxTrustRegion.level(maxima(p)) / 2);
    }

    /**
     * The smooth pieces of the peak: every interior local maximum of |H|^2 in the band and the band's
     * finite ends, the maxima located by {@link FactoredPeaks} (brackets from the poles, a sweep and
     * the polynomial roots, each refined by Brent's method on the factored ln|H|^2; the expanded
     * polynomials alone lose digits at flat or close peaks) and their values from the factored form.
     *
     * @param p the point
     * @return {x = g^2, 1 for interior or 0 for a band end, ln|H|^2}
     */
    List<double[]> maxima(double[] p) {
        return pieces(p, false);
    }

    /**
     * The maxima and, with {@code shoulders}, also every root of R' in the band (where a peak is
     * about to be born from a shoulder as the design moves): each is |H|^2 at a frozen frequency, a
     * lower bound of the peak, so adding them to a linear model of the peak only makes it truer. Without them the trust
     * region collapses where a new peak rises that the model cannot see (three individually tuned
     * absorbers on a light structure do this).
     *
     * @param p the point
     * @param shoulders true to add the shoulders (marked 2 in the second column)
     * @return {x, 1 interior maximum / 0 band end / 2 shoulder, ln|H|^2}
     */
    List<double[]> pieces(double[] p, boolean shoulders) {
        AbsorberSetDesign d = design(p);
        TransferFunction h = problem.transferFunction(d);
        double[] f = tunings(d);
        double[] z = dampings(d);
        double zeta1 = problem.structureDamping();
        double low = problem.bandLow() * problem.bandLow();
        double high = problem.bandHigh() * problem.bandHigh();
        List<double[]> out = new ArrayList<>(FactoredPeaks.maxima(h, x -> logMagnitudeSquared(f, z, x, zeta1), low, high));
        double[] r = RealPolynomials.quotientDerivativeNumerator(h.magnitudeNumeratorInX(), h.magnitudeDenominatorInX());
        if (shoulders) {
            double[] dr = new double[Math.max(1, r.length - 1)];
            for (int i = 1; i < r.length; i++) {
                dr[i - 1] = i * r[i];
            }
            for (double x : RealRoots.roots(dr, low, Math.min(high, Double.MAX_VALUE))) {
                if (x > low && x < high) {
                    out.add(new double[] {x, 2, logMagnitudeSquared(f, z, x, zeta1)});
                }
            }
        }
        // the low end always (at zero frequency the static response, which no absorber changes)
        out.add(new double[] {low, 0, logMagnitudeSquared(f, z, low, zeta1)});
        if (Double.isFinite(high)) {
            out.add(new double[] {high, 0, logMagnitudeSquared(f, z, high, zeta1)});
        }
        return out;
    }
}
