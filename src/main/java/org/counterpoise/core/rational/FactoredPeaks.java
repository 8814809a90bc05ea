package org.counterpoise.core.rational;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * The interior maxima of |H|^2 over a band for several absorbers (on one mode, or on a structure of
 * several modes: ModalPeak in core.system), located robustly.
 *
 * <p>Why not the roots of R = P'Q - PQ' alone ({@code PeakFinder})? With three lightly damped
 * absorbers on a light structure the expanded |H|^2 = P(x)/Q(x) loses every digit of R between
 * close modes: R is computed as about 1e-12 with no sign change where |H| has a peak (a case in
 * the tests: the polynomial peak 8.6791, a dense sweep 8.7036). So each maximum is bracketed from
 * three sources and refined once by Brent's method (to 1e-11 in ln x) on the factored ln|H|^2 (every modal
 * and absorber term evaluated on its own, well conditioned):
 * <ol>
 *   <li>a sweep of {@value #SWEEP} frequencies log-spaced from half the lowest to twice the highest
 *       natural frequency: each sampled local maximum brackets one between its neighbours;</li>
 *   <li>where the sweep found none, the system's poles (the roots of the denominator in s, by
 *       Laguerre's method, Commons Math): a pole of natural frequency w_n and damping ratio zeta
 *       gives the bracket [w_n (1 - 5 zeta), w_n (1 + 5 zeta)] (widened by 1e-3), where a resonance
 *       too narrow for the sweep lies;</li>
 *   <li>where neither did, the real roots of R where R falls through zero (the polynomial route).</li>
 * </ol>
 * A refined point counts as a maximum only when it is higher than both its neighbours at a relative
 * frequency step of 1e-6; maxima closer than 1e-6 (relative) are one. Checked against dense sweeps of
 * the dense matrix solve in the tests.
 */
public final class FactoredPeaks {
    public static final int SWEEP = 240;

    private FactoredPeaks() {
    }

    /**
     * @param h the expanded transfer function (its denominator gives the poles; its R the third source)
     * @param logMagnitudeSquared the factored ln|H|^2 as a function of x = g^2
     * @param low low end of the band in x
     * @param high high end of the band in x (may be +infinity)
     * @return {x, 1, ln|H|^2} for each interior maximum, ascending in x
     */
    public static List<double[]> maxima(TransferFunction h, DoubleUnaryOperator logMagnitudeSquared, double low, double high) {
        List<double[]> poleBrackets = new ArrayList<>();
        double lowest = Double.POSITIVE_INFINITY;
        double highest = 0;
        for (Complex pole : poles(h.denominator())) {
            double wn = pole.abs();
            if (!(pole.getImaginary() > 0) || !(wn > 0)) {
                continue;
            }
            double zeta = Math.max(0.0, -pole.getReal() / wn);
            double width = 5 * zeta + 1e-3;
            poleBrackets.add(new double[] {sq(wn * Math.max(0.05, 1 - width)), sq(wn * (1 + width))});
            lowest = Math.min(lowest, wn);
            highest = Math.max(highest, wn);
        }
        // The sweep brackets every maximum wider than its spacing, ln(4 w_max / w_min) / (SWEEP - 1) in
        // ln frequency (0.6 % for poles together, 1.1 % for a spread of 2, 1.6 % for 10); a pole or a
        // root of R adds a bracket only where the sweep found none, so each maximum is refined once.
        List<double[]> brackets = new ArrayList<>();
        if (!(highest > 0) && high < Double.POSITIVE_INFINITY && high > 0) {
            // no pole found at all: sweep the band itself (x = g^2, so its square roots)
            lowest = Math.sqrt(Math.max(low, 1e-6 * high)) * 2;
            highest = Math.sqrt(high) / 2;
        }
        if (highest > 0) {
            double a = Math.log(0.5 * lowest);
            double b = Math.log(2 * highest);
            double[] value = new double[SWEEP];
            double[] x = new double[SWEEP];
            for (int i = 0; i < SWEEP; i++) {
                x[i] = sq(Math.exp(a + (b - a) * i / (SWEEP - 1)));
                value[i] = logMagnitudeSquared.applyAsDouble(x[i]);
            }
            for (int i = 1; i + 1 < SWEEP; i++) {
                if (value[i] >= value[i - 1] && value[i] >= value[i + 1]) {
                    brackets.add(new double[] {x[i - 1], x[i + 1], x[i]});
                }
            }
        }
        for (double[] b : poleBrackets) {
            addUnlessCovered(brackets, b[0], b[1]);
        }
        double[] r = RealPolynomials.quotientDerivativeNumerator(h.magnitudeNumeratorInX(), h.magnitudeDenominatorInX());
        double[] roots = RealRoots.roots(r, low, Math.min(high, Double.MAX_VALUE));
        for (int i = 0; i < roots.length; i++) {
            if (RealPolynomials.derivativeValue(r, roots[i]) < 0) {
                addUnlessCovered(brackets, i > 0 ? roots[i - 1] : roots[i] / 2,
                        i + 1 < roots.length ? roots[i + 1] : 2 * roots[i] + 1);
            }
        }
        List<double[]> out = new ArrayList<>();
        for (double[] bracket : brackets) {
            double b = Math.min(bracket[1], high);
            // a bracket from 0 (a root of R at x = 0: a stroke or a force from rest) starts just above it,
            // where the logarithmic search can begin
            double a = Math.max(Math.max(bracket[0], low), 1e-12 * b);
            if (!(b > a)) {
                continue;
            }
            double t = new BrentOptimizer(1e-11, 1e-300).optimize(new MaxEval(400),
                    new UnivariateObjectiveFunction(u -> logMagnitudeSquared.applyAsDouble(Math.exp(u))), GoalType.MAXIMIZE,
                    new SearchInterval(Math.log(a), Math.log(b))).getPoint();
            double xm = Math.exp(t);
            double v = logMagnitudeSquared.applyAsDouble(xm);
            if (v >= logMagnitudeSquared.applyAsDouble(xm * (1 + 1e-6))
                    && v >= logMagnitudeSquared.applyAsDouble(xm * (1 - 1e-6)) && xm > low && xm < high) {
                out.add(new double[] {xm, 1, v});
            }
        }
        out.sort(Comparator.comparingDouble(m -> m[0]));
        List<double[]> distinct = new ArrayList<>();
        for (double[] m : out) {
            double[] last = distinct.isEmpty() ? null : distinct.get(distinct.size() - 1);
            if (last != null && m[0] - last[0] <= 1e-6 * m[0]) {
                if (m[2] > last[2]) {
                    distinct.set(distinct.size() - 1, m);
                }
            } else {
                distinct.add(m);
            }
        }
        return distinct;
    }

    /** Adds the bracket [a, b] unless a bracket already found contains a maximum inside it. */
    private static void addUnlessCovered(List<double[]> brackets, double a, double b) {
        for (double[] k : brackets) {
            double inside = k.length > 2 ? k[2] : 0.5 * (k[0] + k[1]);
            if (inside >= a && inside <= b) {
                return;
            }
        }
        brackets.add(new double[] {a, b});
    }

    private static double sq(double v) {
        return v * v;
    }

    /**
     * Laguerre steps allowed for all the poles together. Commons Math's two-argument
     * {@code solveAllComplex} allows unlimited steps, and on a polynomial whose roots it cannot
     * resolve to the accuracy asked (three individually tuned absorbers with a second mode, degree
     * 14) it never returned; a few dozen steps per root are ample when it converges.
     */
    static final int POLE_STEPS = 100_000;

    /**
     * The roots of the denominator: Laguerre's method, or where it does not converge to the accuracy
     * asked (clustered poles of four or more light absorbers: a degree-12 denominator in the tests),
     * the eigenvalues of its companion matrix (Commons Math's eigen-decomposition of a real
     * non-symmetric matrix; Golub and Van Loan 2013, <i>Matrix Computations</i>, 4th ed., section
     * 7.4.6): accurate enough for what the poles are used for, the sweep's range and the brackets.
     * Until 5 Dec 2026 a failure left no poles, so no sweep either, and two maxima could share one
     * wide bracket of the polynomial route, where Brent's method kept the lower.
     */
    static Complex[] poles(double[] denominator) {
        try {
            return new LaguerreSolver(1e-14, 1e-14).solveAllComplex(denominator, 1.0, POLE_STEPS);
        } catch (RuntimeException noConvergence) {
            return companionEigenvalues(denominator);
        }
    }

    private static Complex[] companionEigenvalues(double[] coefficients) {
        int n = coefficients.length - 1;
        while (n > 0 && coefficients[n] == 0.0) {
            n--;
        }
        if (n < 1) {
            return new Complex[0];
        }
        RealMatrix companion = new Array2DRowRealMatrix(n, n);
        for (int i = 1; i < n; i++) {
            companion.setEntry(i, i - 1, 1.0);
        }
        for (int i = 0; i < n; i++) {
            companion.setEntry(i, n - 1, -coefficients[i] / coefficients[n]);
        }
        try {
            EigenDecomposition eigen = new EigenDecomposition(companion);
            Complex[] roots = new Complex[n];
            for (int i = 0; i < n; i++) {
                roots[i] = new Complex(eigen.getRealEigenvalue(i), eigen.getImagEigenvalue(i));
            }
            return roots;
        } catch (RuntimeException noConvergence) {
            return new Complex[0]; // the band's sweep and the polynomial roots still bracket the maxima
        }
    }
}
