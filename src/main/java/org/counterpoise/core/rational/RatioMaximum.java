package org.counterpoise.core.rational;

import java.util.Arrays;

/**
 * Exact global maximum of a ratio of real polynomials P(t) / Q(t) (P, Q &gt;= 0 on the range) over a
 * closed range of t &gt;= 0, by the same argument as {@link PeakFinder}: interior maxima are among the
 * real roots of R = P'Q - PQ' (and, for a root R only touches through round-off, among the roots of
 * R'), so the candidates are those roots, the range ends and the limit as t -&gt; infinity.
 *
 * <p>{@link PeakFinder} works in x = g^2 because a transfer function with real coefficients has an
 * |H|^2 that is even in g. A hysteretic (complex-stiffness) element gives N(i g) complex coefficients
 * that are not of the form E(g^2) + i g O(g^2), so on a viscously damped structure |H|^2 is a ratio
 * of real polynomials in g itself, with odd powers: this class takes t = g.
 */
public final class RatioMaximum {

    private RatioMaximum() {
    }

    /**
     * @param p P, ascending powers of t (P &gt;= 0 on the range)
     * @param q Q, ascending powers of t (Q &gt;= 0 on the range)
     * @param low low end of the range (&gt;= 0)
     * @param high high end (&gt;= low; may be +infinity)
     * @return where the maximum of sqrt(P/Q) is and its value; +infinity where Q vanishes in the
     *     range, or where P outgrows Q on an open range
     */
    public static Peak over(double[] p, double[] q, double low, double high) {
        if (!(low >= 0) || !(high >= low)) {
            throw new IllegalArgumentException("range must satisfy 0 <= low <= high, got " + low + ", " + high);
        }
        double[] pt = RealPolynomials.trim(p);
        double[] qt = RealPolynomials.trim(q);
        if (Double.isInfinite(high) && pt.length > qt.length) {
            return new Peak(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY);
        }
        double zero = zeroOfDenominator(qt, low, high);
        if (!Double.isNaN(zero)) {
            return new Peak(zero, Double.POSITIVE_INFINITY);
        }
        double bestT = low;
        double best = value(pt, qt, low);
        if (Double.isFinite(high)) {
            double v = value(pt, qt, high);
            if (v > best) {
                best = v;
                bestT = high;
            }
        } else if (pt.length == qt.length) {
            double limit = pt[pt.length - 1] / qt[qt.length - 1];
            if (limit > best) {
                best = limit;
                bestT = Double.POSITIVE_INFINITY;
            }
        }
        if (high > low) {
            double[] r = RealPolynomials.quotientDerivativeNumerator(pt, qt);
            for (double t : stationaryCandidates(r, low, high, true)) {
                if (t > low && t < high) {
                    double v = value(pt, qt, t);
                    if (v > best) {
                        best = v;
                        bestT = t;
                    }
                }
            }
        }
        return new Peak(bestT, Math.sqrt(best));
    }

    /**
     * The roots and critical points of R in [low, high], searched on [low, min(high, 1)] in t and on
     * [max(low, 1), high] in u = 1/t (the reversed polynomial u^n R(1/u)): both searches then run on
     * ranges of length at most 1. Searched in t alone up to Cauchy's bound (about 10^9 here, a degree
     * of 13 and more in g), the derivative cascade lost a resonance at g = 0.91 of a stiff, lossy
     * absorber; on the two unit ranges it does not.
     */
    private static double[] stationaryCandidates(double[] r, double low, double high, boolean withCritical) {
        double[] near = low >= 1 ? new double[0] : withCritical
                ? RealRoots.rootsAndCriticalPoints(r, low, Math.min(high, 1.0)) : RealRoots.roots(r, low, Math.min(high, 1.0));
        double[] far = new double[0];
        if (high > 1) {
            double[] reversed = new double[r.length];
            for (int i = 0; i < r.length; i++) {
                reversed[i] = r[r.length - 1 - i];
            }
            far = withCritical ? RealRoots.rootsAndCriticalPoints(reversed, 1 / high, 1 / Math.max(low, 1.0))
                    : RealRoots.roots(reversed, 1 / high, 1 / Math.max(low, 1.0));
            for (int i = 0; i < far.length; i++) {
                far[i] = far[i] > 0 ? 1 / far[i] : Double.POSITIVE_INFINITY;
            }
        }
        double[] all = Arrays.copyOf(near, near.length + far.length);
        System.arraycopy(far, 0, all, near.length, far.length);
        return all;
    }

    /**
     * @param p P, ascending powers of t
     * @param q Q, ascending powers of t
     * @param low low end of the range
     * @param high high end (may be +infinity)
     * @return the interior local maxima of P/Q strictly inside the range (roots of R where P/Q is not
     *     below its values a relative 1e-6 either side), ascending
     */
    public static double[] interiorMaxima(double[] p, double[] q, double low, double high) {
        double[] r = RealPolynomials.quotientDerivativeNumerator(p, q);
        double[] candidates = stationaryCandidates(r, low, high, false);
        Arrays.sort(candidates);
        double[] out = new double[candidates.length];
        int n = 0;
        for (double t : candidates) {
            boolean fresh = n == 0 || t - out[n - 1] > 1e-12 * t;
            if (t > low && t < high && fresh && isLocalMaximum(p, q, t)) {
                out[n++] = t;
            }
        }
        return Arrays.copyOf(out, n);
    }

    /**
     * @param p P
     * @param q Q
     * @param t the variable
     * @return P(t) / Q(t), with a round-off negative P read as zero; +infinity where Q vanishes
     */
    public static double value(double[] p, double[] q, double t) {
        double qv = RealPolynomials.value(q, t);
        double pv = Math.max(RealPolynomials.value(p, t), 0.0);
        return qv > 0 ? pv / qv : Double.POSITIVE_INFINITY;
    }

    /** P/Q is at a local maximum at t: not below its values a relative 1e-6 either side. */
    private static boolean isLocalMaximum(double[] p, double[] q, double t) {
        double v = value(p, q, t);
        double h = 1e-6 * t;
        return v >= value(p, q, t - h) && v >= value(p, q, t + h);
    }

    /** Q &gt;= 0 touches zero only at a double root, a root of Q': a pole on the range, or NaN. */
    private static double zeroOfDenominator(double[] q, double low, double high) {
        if (RealPolynomials.value(q, low) <= 0) {
            return low;
        }
        double[] dq = RealPolynomials.quotientDerivativeNumerator(q, new double[] {1.0});
        for (double t : RealRoots.rootsAndCriticalPoints(dq, low, high)) {
            if (t >= low && t <= high && RealPolynomials.value(q, t) <= 1e-12 * absoluteSum(q, t)) {
                return t;
            }
        }
        return Double.NaN;
    }

    private static double absoluteSum(double[] q, double t) {
        double sum = 0.0;
        double power = 1.0;
        for (double c : q) {
            sum += Math.abs(c) * power;
            power *= t;
        }
        return sum;
    }
}
