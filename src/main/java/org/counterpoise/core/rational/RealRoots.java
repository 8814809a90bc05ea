package org.counterpoise.core.rational;

import java.util.Arrays;

/**
 * Real roots of a real polynomial in a closed interval, isolated exactly by the derivative
 * cascade: between two consecutive real roots of p' the polynomial p is monotone (Rolle), so it
 * has at most one root there, found by safeguarded Newton-bisection to full double precision.
 * The roots of p' come from the same method one degree down. No starting guesses, no complex
 * arithmetic, no convergence failure: the cost is bounded by the degree.
 *
 * <p>A double root, where p touches zero without changing sign, is a root of p' and so is
 * returned among the critical points; callers that look for extrema of a function whose
 * stationary points are the roots of p use both lists (see {@link PeakFinder}).
 */
public final class RealRoots {
    private static final int MAX_ITERATIONS = 200;
    /** Enough halvings to take any finite bracket of doubles down to a few ulps. */
    private static final int BISECTIONS = 2100;

    private RealRoots() {
    }

    /**
     * @param p coefficients, ascending powers
     * @param lo interval start
     * @param hi interval end (may be +infinity: replaced by Cauchy's bound on the roots)
     * @return the sign-changing roots of p in [lo, hi] followed by the roots of p' in it
     */
    public static double[] rootsAndCriticalPoints(double[] p, double lo, double hi) {
        double[] poly = RealPolynomials.trim(p);
        double top = Math.min(hi, cauchyBound(poly));
        if (!(top >= lo)) {
            return new double[0];
        }
        double[] critical = roots(derivative(poly), lo, top);
        double[] own = rootsBetween(poly, critical, lo, top);
        double[] out = Arrays.copyOf(own, own.length + critical.length);
        System.arraycopy(critical, 0, out, own.length, critical.length);
        return out;
    }

    /** @return sorted real roots of p in [lo, hi] where p changes sign or vanishes exactly */
    public static double[] roots(double[] p, double lo, double hi) {
        double[] poly = RealPolynomials.trim(p);
        int degree = poly.length - 1;
        if (degree < 1) {
            return new double[0];
        }
        if (degree == 1) {
            double r = -poly[0] / poly[1];
            return r >= lo && r <= hi ? new double[] {r} : new double[0];
        }
        double top = Math.min(hi, cauchyBound(poly));
        if (!(top >= lo)) {
            return new double[0];
        }
        return rootsBetween(poly, roots(derivative(poly), lo, top), lo, top);
    }

    private static double[] rootsBetween(double[] poly, double[] critical, double lo, double hi) {
        double[] points = new double[critical.length + 2];
        points[0] = lo;
        System.arraycopy(critical, 0, points, 1, critical.length);
        points[points.length - 1] = hi;
        double[] out = new double[points.length];
        int n = 0;
        double fa = RealPolynomials.value(poly, lo);
        if (fa == 0.0) {
            out[n++] = lo;
        }
        for (int i = 0; i + 1 < points.length; i++) {
            double a = points[i];
            double b = points[i + 1];
            double fb = RealPolynomials.value(poly, b);
            if (fb == 0.0) {
                if (b > a || n == 0) {
                    out[n++] = b;
                }
            } else if (fa != 0.0 && (fa < 0) != (fb < 0)) {
                out[n++] = refine(poly, a, b, fa);
            }
            fa = fb;
        }
        return Arrays.copyOf(out, n);
    }

    /** Safeguarded Newton-bisection on a bracket [a, b] with p(a) of sign fa. */
    private static double refine(double[] p, double a, double b, double fa) {
        double lo = a;
        double hi = b;
        boolean riseFromLo = fa < 0;
        double x = 0.5 * (lo + hi);
        double[] valueAndSlope = new double[2];
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            RealPolynomials.valueAndDerivative(p, x, valueAndSlope);
            double fx = valueAndSlope[0];
            if (fx == 0.0) {
                return x;
            }
            if ((fx < 0) == riseFromLo) {
                lo = x;
            } else {
                hi = x;
            }
            double d = valueAndSlope[1];
            double next = d != 0.0 ? x - fx / d : Double.NaN;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (next == x || hi - lo <= 2 * Math.ulp(Math.max(Math.abs(lo), Math.abs(hi)))) {
                return next;
            }
            x = next;
        }
        // Newton from far outside (a bracket up to Cauchy's bound, a high degree) can shrink the
        // bracket by only a factor (d - 1)/d per step and run out of steps far from the root; the
        // bracket is still valid, so finish by bisection, which halves it every step.
        for (int i = 0; i < BISECTIONS && hi - lo > 2 * Math.ulp(Math.max(Math.abs(lo), Math.abs(hi))); i++) {
            double mid = 0.5 * (lo + hi);
            double fm = RealPolynomials.value(p, mid);
            if (fm == 0.0) {
                return mid;
            }
            if ((fm < 0) == riseFromLo) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    private static double[] derivative(double[] p) {
        if (p.length <= 1) {
            return new double[] {0.0};
        }
        double[] d = new double[p.length - 1];
        for (int i = 1; i < p.length; i++) {
            d[i - 1] = i * p[i];
        }
        return d;
    }

    /** Cauchy's bound: every root has modulus below 1 + max |p_i / p_n|. */
    private static double cauchyBound(double[] p) {
        double lead = Math.abs(p[p.length - 1]);
        double max = 0.0;
        for (int i = 0; i + 1 < p.length; i++) {
            max = Math.max(max, Math.abs(p[i]) / lead);
        }
        return 1.0 + max;
    }
}
