package org.counterpoise.core.rational;

/**
 * Whether the computed R = P'Q - PQ' of an expanded |H|^2 = P(x)/Q(x) still carries its sign over a
 * band, so that {@link PeakFinder}'s roots of R can be trusted to hold every interior maximum.
 *
 * <p>R's coefficients are sums of products of P's and Q's, which are themselves sums of products of
 * the coefficients of N(s) and D(s): each is exact to a few unit round-offs of the sum of the
 * absolute values of its terms. Where the true R is smaller than that (several light absorbers on
 * one mode: four absorbers at damping ratio 1e-4 on a light structure give |R| about 1e-13 against
 * a round-off of about 1e-12, and R shows no sign change where |H| has five peaks from 14.0 to 16.8),
 * its roots mean nothing. The test: at {@value #SAMPLES} frequencies log-spaced over the band (within
 * g = 1e-3 to 1e3) |R(x)| must exceed {@value #UNITS} unit round-offs times the same sum with every
 * term taken absolutely. A simple root of R passes except within a sliver about it, so the test is
 * rarely wrong that way, and being wrong that way only costs the safe fallback's time.
 */
final class DerivativeRoundOff {
    /** Frequencies tried. */
    static final int SAMPLES = 400;
    /**
     * The least degree of D(s) checked. Systems of two degrees of freedom (degree 4: one absorber on one
     * mode, or two modes without absorbers) keep the route their checks certified before the test
     * existed (one absorber: its peaks against dense sweeps to 1e-9, docs/optimiser.md; two bare modes:
     * SpilloverTest), and there the check cost six times the search itself (PeakSearchCpuTime: 7.0
     * against 1.2 us per search, docs/performance.md); the swamped cases found have three degrees of
     * freedom or more (degree 6 and up).
     */
    static final int SMALLEST_CHECKED_DEGREE = 5;
    /** Unit round-offs of the absolute sum below which R is taken as lost (common practice, no source). */
    static final double UNITS = 64;

    private DerivativeRoundOff() {
    }

    /**
     * @param h the transfer function
     * @param gLow low end of the band
     * @param gHigh high end (may be +infinity)
     * @return true when R is below its round-off somewhere in the band
     */
    static boolean swamped(TransferFunction h, double gLow, double gHigh) {
        if (h.denominator().length - 1 < SMALLEST_CHECKED_DEGREE) {
            return false;
        }
        double a = Math.log(Math.max(gLow, 1e-3));
        double b = Math.log(Math.min(gHigh, 1e3));
        if (!(b > a)) {
            return false;
        }
        double[] r = RealPolynomials.quotientDerivativeNumerator(h.magnitudeNumeratorInX(), h.magnitudeDenominatorInX());
        double[] bound = absoluteDerivativeNumerator(absoluteSquare(h.numerator()), absoluteSquare(h.denominator()));
        double unit = UNITS * Math.ulp(1.0);
        // x = g^2 log-spaced: each sample the last times one ratio (no exp per sample)
        double step = Math.exp(2 * (b - a) / (SAMPLES - 1));
        double x = Math.exp(2 * a);
        for (int i = 0; i < SAMPLES; i++, x *= step) {
            if (!(Math.abs(RealPolynomials.value(r, x)) > unit * RealPolynomials.value(bound, x))) {
                return true;
            }
        }
        return false;
    }

    /** |N(i g)|^2 = E^2 + x O^2 as in RealPolynomials.magnitudeSquaredInX, every term taken absolutely. */
    private static double[] absoluteSquare(double[] n) {
        int half = (n.length + 1) / 2;
        double[] even = new double[half];
        double[] odd = new double[half];
        for (int k = 0; k < n.length; k++) {
            if (k % 2 == 0) {
                even[k / 2] = Math.abs(n[k]);
            } else {
                odd[k / 2] = Math.abs(n[k]);
            }
        }
        return RealPolynomials.add(RealPolynomials.multiply(even, even), RealPolynomials.shift(RealPolynomials.multiply(odd, odd), 1));
    }

    /** R's coefficients as RealPolynomials.quotientDerivativeNumerator forms them, every term taken absolutely. */
    private static double[] absoluteDerivativeNumerator(double[] p, double[] q) {
        double[] r = new double[Math.max(1, p.length + q.length - 2)];
        for (int i = 0; i < p.length; i++) {
            for (int j = 0; j < q.length; j++) {
                int k = i + j - 1;
                if (k >= 0 && i != j) {
                    r[k] += Math.abs(i - j) * p[i] * q[j];
                }
            }
        }
        return r;
    }
}
