package org.counterpoise.core.rational;

import java.util.Arrays;


/**
 * Exact global maximum of |H(i g)| over a closed band of g, or over all g &gt;= 0.
 *
 * <p>|H|^2 = P(x)/Q(x) with x = g^2 is rational, so its interior maxima are among the real roots
 * of R(x) = P'(x) Q(x) - P(x) Q'(x) (degree at most about 11 here). The candidates are those roots
 * in the band, the band ends, and the limit as g -&gt; infinity; the largest candidate value is the
 * peak. The real roots are isolated exactly by {@link RealRoots} (derivative cascade and
 * safeguarded Newton-bisection), and the roots of R' are tried too, so a maximum where R only
 * touches zero through round-off is not lost: every candidate is a real frequency in the band,
 * so extra candidates can never over-state the peak. The peak value is evaluated from P/Q by
 * Horner's rule, so its relative accuracy is a few ulps times the condition of P/Q; a location
 * error dx costs only O(dx^2) in the value.
 *
 * <p>Where R's computed values are below their own round-off somewhere in the band
 * ({@link DerivativeRoundOff}: several light absorbers on one mode), its roots can miss the highest
 * maximum altogether (a peak of 1.35 reported where |H| reaches 3365), so the maxima are then also
 * bracketed and refined on |H|^2 itself by {@link FactoredPeaks} (sweep, poles, Brent's method) and
 * the largest candidate of both routes is the peak: a real frequency in the band each, so never above
 * the true peak beyond the evaluation's round-off, and at most about 1e-9 below it in the seeded
 * random cases of PeakFinderRoundOffTest (the value itself then carries the expanded P/Q's error, up
 * to about 1e-5 relative there; callers with a factored form evaluate that instead).
 */
public final class PeakFinder {

    private PeakFinder() {
    }

    /**
     * @param h the transfer function
     * @return the peak over all frequencies g in [0, infinity)
     */
    public static Peak overAllFrequencies(TransferFunction h) {
        return over(h, 0.0, Double.POSITIVE_INFINITY);
    }

    /**
     * @param h the transfer function
     * @param gLow low end of the band (&gt;= 0)
     * @param gHigh high end of the band (&gt;= gLow; may be +infinity)
     * @return the peak over the closed band
     */
    public static Peak over(TransferFunction h, double gLow, double gHigh) {
        return over(h, gLow, gHigh, false);
    }

    /**
     * The same peak with the route for a derivative lost in round-off always taken as well: the maxima
     * also bracketed and refined on |H|^2 itself, and every candidate valued from N(i g) and D(i g). For
     * a final check of one design where the expanded route may have lost its accuracy (very light
     * absorbers: at a mass ratio of 1e-5 the expanded route valued the optimum's peak 1.1e-5 low);
     * several times the cost of {@link #over}.
     *
     * @param h the transfer function
     * @param gLow low end of the band (&gt;= 0)
     * @param gHigh high end of the band (&gt;= gLow; may be +infinity)
     * @return the peak over the closed band
     */
    public static Peak overChecked(TransferFunction h, double gLow, double gHigh) {
        return over(h, gLow, gHigh, true);
    }

    private static Peak over(TransferFunction h, double gLow, double gHigh, boolean alwaysDirect) {
        if (!(gLow >= 0) || !(gHigh >= gLow)) {
            throw new IllegalArgumentException("band must satisfy 0 <= low <= high, got " + gLow + ", " + gHigh);
        }
        if (gLow == 0.0 && h.unboundedAtZero()) {
            return new Peak(0.0, Double.POSITIVE_INFINITY);
        }
        if (Double.isInfinite(gHigh) && h.unboundedAtInfinity()) {
            return new Peak(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY);
        }
        double xLow = gLow * gLow;
        double xHigh = gHigh * gHigh;
        double[] p = h.magnitudeNumeratorInX();
        double[] q = h.magnitudeDenominatorInX();
        if (h.undamped()) {
            Peak resonance = undampedResonanceIn(q, xLow, xHigh);
            if (resonance != null) {
                return resonance;
            }
        }
        // where R's sign is lost the expanded P and Q may have lost theirs too (Q below zero by
        // round-off would read as a pole), so every candidate is then valued from N(i g) and D(i g)
        boolean swamped = xHigh > xLow && (alwaysDirect || DerivativeRoundOff.swamped(h, gLow, gHigh));
        Best best = new Best(h, swamped);
        best.offer(xLow);
        if (Double.isFinite(xHigh)) {
            best.offer(xHigh);
        } else {
            double limit = h.limitAtInfinity();
            if (limit * limit > best.value) {
                best.value = limit * limit;
                best.x = Double.POSITIVE_INFINITY;
            }
        }
        if (xHigh > xLow) {
            double[] r = RealPolynomials.quotientDerivativeNumerator(p, q);
            for (double root : RealRoots.rootsAndCriticalPoints(r, xLow, xHigh)) {
                if (root > xLow && root < xHigh) {
                    best.offer(root);
                }
            }
            if (swamped) {
                // R's sign is lost somewhere in the band: bracket the maxima on |H|^2 itself
                for (double[] maximum : FactoredPeaks.maxima(h, x -> Math.log(direct(h, x)), xLow, xHigh)) {
                    best.offer(maximum[0]);
                }
            }
        }
        return new Peak(Math.sqrt(best.x), Math.sqrt(best.value));
    }

    /**
     * The interior local maxima of |H| strictly inside a band: roots of R = P'Q - PQ' where R
     * falls through zero.
     * @param h the transfer function
     * @param gLow low end of the band
     * @param gHigh high end (may be +infinity)
     * @return the frequency ratios g of the local maxima, ascending
     */
    public static double[] interiorMaxima(TransferFunction h, double gLow, double gHigh) {
        double xLow = gLow * gLow;
        double xHigh = gHigh * gHigh;
        double[] r = RealPolynomials.quotientDerivativeNumerator(h.magnitudeNumeratorInX(), h.magnitudeDenominatorInX());
        double[] roots = RealRoots.roots(r, xLow, Math.min(xHigh, Double.MAX_VALUE));
        double[] out = new double[roots.length];
        int n = 0;
        for (double x : roots) {
            if (x > xLow && x < xHigh && RealPolynomials.derivativeValue(r, x) < 0) {
                out[n++] = Math.sqrt(x);
            }
        }
        return Arrays.copyOf(out, n);
    }

    /** With no damping Q = E(x)^2; a root of E in the band is a resonance: unbounded. */
    private static Peak undampedResonanceIn(double[] q, double xLow, double xHigh) {
        double[] dq = RealPolynomials.quotientDerivativeNumerator(q, new double[] {1.0});
        for (double root : RealRoots.rootsAndCriticalPoints(dq, xLow, xHigh)) {
            if (root >= xLow && root <= xHigh && RealPolynomials.value(q, root) <= 1e-10 * absoluteSum(q, root)) {
                return new Peak(Math.sqrt(root), Double.POSITIVE_INFINITY);
            }
        }
        return null;
    }

    private static double absoluteSum(double[] q, double x) {
        double sum = 0.0;
        double power = 1.0;
        for (double c : q) {
            sum += Math.abs(c) * power;
            power *= x;
        }
        return sum;
    }

    /**
     * |H|^2 as |N(i g)|^2 / |D(i g)|^2 from the complex values of N and D: never negative, and free of
     * the cancellation in the expanded P and Q (which can leave Q below zero near clustered light modes).
     */
    private static double direct(TransferFunction h, double x) {
        double[] v = h.value(Math.sqrt(x));
        return v[0] * v[0] + v[1] * v[1];
    }

    private static final class Best {
        private final TransferFunction h;
        private final boolean direct;
        private double x;
        private double value = -1.0;

        Best(TransferFunction h, boolean direct) {
            this.h = h;
            this.direct = direct;
        }

        void offer(double candidate) {
            double v = direct ? direct(h, candidate) : h.magnitudeSquared(candidate);
            if (v > value) {
                value = v;
                x = candidate;
            }
        }
    }
}
