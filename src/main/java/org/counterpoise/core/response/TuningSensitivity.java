package org.counterpoise.core.response;

import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.model.Tuning;

/**
 * ln |H(i g)|^2 and its exact derivatives in the tuning ratio f and the absorber damping ratio
 * zeta_a, at a given frequency. Every response the optimiser uses is affine in the absorber
 * polynomial K(s) = f^2 + 2 zeta_a f s: H = (N0 + K N1) / (D0 + K D1). Hence
 * d ln|H|^2 / dp = 2 Re[(N1/N - D1/D) dK/dp] with dK/df = 2 f + 2 zeta_a s and dK/dzeta_a = 2 f s,
 * evaluated at s = i g. Built by {@link TransferFunctions#sensitivity}.
 */
public final class TuningSensitivity {
    private final double[] numerator;
    private final double[] denominator;
    private final double[] numeratorPerK;
    private final double[] denominatorPerK;
    private final double f;
    private final double zeta;

    TuningSensitivity(double[] numerator, double[] denominator, double[] numeratorPerK, double[] denominatorPerK,
            Tuning tuning) {
        this.numerator = numerator;
        this.denominator = denominator;
        this.numeratorPerK = numeratorPerK;
        this.denominatorPerK = denominatorPerK;
        this.f = tuning.tuningRatio();
        this.zeta = tuning.dampingRatio();
    }

    /**
     * @param x squared frequency ratio g^2 (&gt; 0)
     * @return {d ln|H|^2 / df, d ln|H|^2 / dzeta_a} at that frequency
     */
    public double[] gradient(double x) {
        double g = Math.sqrt(x);
        double[] n = RealPolynomials.valueOnImaginaryAxis(numerator, g);
        double[] d = RealPolynomials.valueOnImaginaryAxis(denominator, g);
        double[] n1 = RealPolynomials.valueOnImaginaryAxis(numeratorPerK, g);
        double[] d1 = RealPolynomials.valueOnImaginaryAxis(denominatorPerK, g);
        double[] ratio = subtract(divide(n1, n), divide(d1, d));
        // dK/df = 2 f + i 2 zeta g ; dK/dzeta = i 2 f g
        double[] perF = multiply(ratio, new double[] {2 * f, 2 * zeta * g});
        double[] perZeta = multiply(ratio, new double[] {0, 2 * f * g});
        return new double[] {2 * perF[0], 2 * perZeta[0]};
    }

    private static double[] divide(double[] a, double[] b) {
        double den = b[0] * b[0] + b[1] * b[1];
        return new double[] {(a[0] * b[0] + a[1] * b[1]) / den, (a[1] * b[0] - a[0] * b[1]) / den};
    }

    private static double[] multiply(double[] a, double[] b) {
        return new double[] {a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]};
    }

    private static double[] subtract(double[] a, double[] b) {
        return new double[] {a[0] - b[0], a[1] - b[1]};
    }
}
