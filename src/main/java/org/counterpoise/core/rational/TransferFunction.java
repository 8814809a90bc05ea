package org.counterpoise.core.rational;

/**
 * A non-dimensional frequency response H(s) = N(s) / D(s) in s = i g, g = omega / omega1, with
 * real coefficients. Immutable. Values are complex pairs {re, im}.
 */
public final class TransferFunction {
    private final double[] numerator;
    private final double[] denominator;
    private final double[] magnitudeNumerator;
    private final double[] magnitudeDenominator;

    /**
     * @param numerator coefficients of N(s), lowest power first
     * @param denominator coefficients of D(s), lowest power first
     * @return N(s) / D(s), with common factors of s cancelled
     */
    public static TransferFunction of(double[] numerator, double[] denominator) {
        return new TransferFunction(numerator.clone(), denominator.clone());
    }

    private TransferFunction(double[] numerator, double[] denominator) {
        // Cancel common factors of s exactly; they come only from exact shifts.
        int common = Math.min(RealPolynomials.lowestPower(numerator), RealPolynomials.lowestPower(denominator));
        this.numerator = RealPolynomials.trim(RealPolynomials.unshift(numerator, common));
        this.denominator = RealPolynomials.trim(RealPolynomials.unshift(denominator, common));
        this.magnitudeNumerator = RealPolynomials.magnitudeSquaredInX(this.numerator);
        this.magnitudeDenominator = RealPolynomials.magnitudeSquaredInX(this.denominator);
    }

    /**
     * @param g frequency ratio omega / omega1 (&gt;= 0)
     * @return H(i g) as {real, imaginary}
     */
    public double[] value(double g) {
        double[] n = RealPolynomials.valueOnImaginaryAxis(numerator, g);
        double[] d = RealPolynomials.valueOnImaginaryAxis(denominator, g);
        double den = d[0] * d[0] + d[1] * d[1];
        return new double[] {(n[0] * d[0] + n[1] * d[1]) / den, (n[1] * d[0] - n[0] * d[1]) / den};
    }

    /**
     * @param g frequency ratio
     * @return |H(i g)|, computed as sqrt(P(x)/Q(x)) with x = g^2; +infinity at a pole
     */
    public double magnitude(double g) {
        return Math.sqrt(magnitudeSquared(g * g));
    }

    /**
     * @param x squared frequency ratio g^2
     * @return |H|^2 = P(x)/Q(x); +infinity where Q vanishes
     */
    public double magnitudeSquared(double x) {
        double q = RealPolynomials.value(magnitudeDenominator, x);
        // P = |N|^2 >= 0; at an exact zero of N (an undamped absorber's notch) round-off in the
        // expanded polynomial can leave a tiny negative value, which must read as zero.
        double p = Math.max(RealPolynomials.value(magnitudeNumerator, x), 0.0);
        return q > 0 ? p / q : Double.POSITIVE_INFINITY;
    }

    /**
     * @param x squared frequency ratio g^2 (&gt; 0)
     * @return ln |H|^2 = ln P(x) - ln Q(x)
     */
    public double logMagnitudeSquared(double x) {
        return Math.log(RealPolynomials.value(magnitudeNumerator, x)) - Math.log(RealPolynomials.value(magnitudeDenominator, x));
    }

    /**
     * @param x squared frequency ratio g^2 (&gt; 0)
     * @return d/dx ln |H|^2 = P'/P - Q'/Q, zero at every interior peak
     */
    public double logMagnitudeSquaredSlope(double x) {
        return RealPolynomials.derivativeValue(magnitudeNumerator, x) / RealPolynomials.value(magnitudeNumerator, x)
                - RealPolynomials.derivativeValue(magnitudeDenominator, x) / RealPolynomials.value(magnitudeDenominator, x);
    }

    /** @return P(x), coefficients in ascending powers of x = g^2 (a copy) */
    public double[] magnitudeNumeratorInX() {
        return magnitudeNumerator.clone();
    }

    /** @return Q(x), coefficients in ascending powers of x = g^2 (a copy) */
    public double[] magnitudeDenominatorInX() {
        return magnitudeDenominator.clone();
    }

    /** @return N(s), ascending powers of s (a copy) */
    public double[] numerator() {
        return numerator.clone();
    }

    /** @return D(s), ascending powers of s (a copy) */
    public double[] denominator() {
        return denominator.clone();
    }

    /** @return true when |H| grows without bound as g -&gt; 0 (a pole at s = 0) */
    public boolean unboundedAtZero() {
        return denominator[0] == 0.0;
    }

    /** @return true when |H| grows without bound as g -&gt; infinity */
    public boolean unboundedAtInfinity() {
        return numerator.length > denominator.length;
    }

    /** @return lim |H| as g -&gt; infinity (finite when not {@link #unboundedAtInfinity()}) */
    public double limitAtInfinity() {
        if (unboundedAtInfinity()) {
            return Double.POSITIVE_INFINITY;
        }
        if (numerator.length < denominator.length) {
            return 0.0;
        }
        return Math.abs(numerator[numerator.length - 1] / denominator[denominator.length - 1]);
    }

    /** @return true when every damping term is zero, so poles lie on the frequency axis */
    public boolean undamped() {
        for (int k = 1; k < denominator.length; k += 2) {
            if (denominator[k] != 0.0) {
                return false;
            }
        }
        return true;
    }
}
