package org.counterpoise.core.response;

import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.rational.RatioMaximum;
import org.counterpoise.core.rational.RealPolynomials;

/**
 * One response of the structure with a {@link HystereticAbsorber}, exactly, for every excitation
 * and response pair of the viscous model. Every response is affine in the absorber term K (see
 * {@link TransferFunctions}), H = (N0 + K N1) / (D0 + K D1) with N0, N1, D0, D1 real polynomials in
 * s that do not depend on the absorber ({@link TransferFunctions#affineInAbsorber}); the hysteretic
 * absorber puts the complex constant K = f^2 (1 + i eta) there. The spring force is
 * mu f^2 times the stroke and the "damper" (loss) force mu f^2 eta times it.
 *
 * <p>On the frequency axis s = i g each polynomial a(s) is a polynomial in g with complex
 * coefficients a_k i^k, so |N|^2 and |D|^2 are real polynomials P(g), Q(g) (with odd powers when
 * the structure is damped and eta &gt; 0) and the peak over a band is exact ({@link RatioMaximum}).
 * Gradients of ln|H|^2 in the design at a frozen frequency are exact:
 * d ln|H|^2 / dp = 2 Re[(N1/N - D1/D) dK/dp], with dK/d(ln f) = 2 K and dK/d eta = i f^2.
 * Immutable; safe to share.
 */
public final class HystereticResponse {
    private static final double[] REAL_OF_POWER = {1, 0, -1, 0};
    private static final double[] IMAGINARY_OF_POWER = {0, 1, 0, -1};

    /** {re, im} of N0, N1, D0, D1 as polynomials in g */
    private final double[][] n0;
    private final double[][] n1;
    private final double[][] d0;
    private final double[][] d1;
    private final ResponseKind response;
    private final double massRatio;

    private HystereticResponse(double[][][] parts, ResponseKind response, double massRatio) {
        this.n0 = parts[0];
        this.n1 = parts[1];
        this.d0 = parts[2];
        this.d1 = parts[3];
        this.response = response;
        this.massRatio = massRatio;
    }

    /**
     * @param excitation what drives the structure
     * @param response the response wanted (any the viscous model has)
     * @param structureDamping zeta1 (the structure stays viscously damped)
     * @param massRatio mu
     * @return the response, written out in the absorber term
     */
    public static HystereticResponse of(ExcitationKind excitation, ResponseKind response, double structureDamping,
            double massRatio) {
        boolean separateForce = response == ResponseKind.SPRING_FORCE || response == ResponseKind.DAMPER_FORCE;
        double[][] inS = TransferFunctions.affineInAbsorber(excitation, separateForce ? ResponseKind.STROKE : response,
                structureDamping, massRatio).polynomials();
        double[][][] parts = new double[4][][];
        for (int i = 0; i < 4; i++) {
            parts[i] = onFrequencyAxis(inS[i]);
        }
        return new HystereticResponse(parts, response, massRatio);
    }

    /** a(i g) as {Re, Im} polynomials in g: the coefficient a_k times i^k. */
    private static double[][] onFrequencyAxis(double[] a) {
        double[] re = new double[a.length];
        double[] im = new double[a.length];
        for (int k = 0; k < a.length; k++) {
            re[k] = a[k] * REAL_OF_POWER[k % 4];
            im[k] = a[k] * IMAGINARY_OF_POWER[k % 4];
        }
        return new double[][] {re, im};
    }

    /**
     * @param absorber the absorber (its mass ratio must be the one this response was built for)
     * @param g frequency ratio (&gt;= 0)
     * @return H(i g) as {real, imaginary}
     */
    public double[] value(HystereticAbsorber absorber, double g) {
        double f2 = absorber.tuningRatio() * absorber.tuningRatio();
        double kr = f2;
        double ki = f2 * absorber.lossFactor();
        double[] n = combine(n0, n1, kr, ki, g);
        double[] d = combine(d0, d1, kr, ki, g);
        double den = d[0] * d[0] + d[1] * d[1];
        double scale = forceScale(absorber);
        return new double[] {scale * (n[0] * d[0] + n[1] * d[1]) / den, scale * (n[1] * d[0] - n[0] * d[1]) / den};
    }

    /**
     * @param absorber the absorber
     * @param g frequency ratio
     * @return |H(i g)|
     */
    public double magnitude(HystereticAbsorber absorber, double g) {
        double[] h = value(absorber, g);
        return Math.hypot(h[0], h[1]);
    }

    /**
     * @param f tuning ratio
     * @param eta loss factor
     * @return {P, Q}: |H(i g)|^2 = P(g) / Q(g), ascending powers of g
     */
    public double[][] squaredMagnitude(double f, double eta) {
        double kr = f * f;
        double ki = f * f * eta;
        double[] nr = RealPolynomials.add(n0[0], RealPolynomials.add(RealPolynomials.scale(n1[0], kr),
                RealPolynomials.scale(n1[1], -ki)));
        double[] ni = RealPolynomials.add(n0[1], RealPolynomials.add(RealPolynomials.scale(n1[1], kr),
                RealPolynomials.scale(n1[0], ki)));
        double[] dr = RealPolynomials.add(d0[0], RealPolynomials.add(RealPolynomials.scale(d1[0], kr),
                RealPolynomials.scale(d1[1], -ki)));
        double[] di = RealPolynomials.add(d0[1], RealPolynomials.add(RealPolynomials.scale(d1[1], kr),
                RealPolynomials.scale(d1[0], ki)));
        double s = forceScale(new HystereticAbsorber(massRatio, f, eta));
        double[] p = RealPolynomials.scale(RealPolynomials.add(RealPolynomials.multiply(nr, nr),
                RealPolynomials.multiply(ni, ni)), s * s);
        double[] q = RealPolynomials.add(RealPolynomials.multiply(dr, dr), RealPolynomials.multiply(di, di));
        // common powers of g come only from exact shifts (a drive over s^2 and a response times s^2):
        // cancel them, as TransferFunction does in s, so that |H| at g = 0 is its limit, not 0/0
        int common = Math.min(RealPolynomials.lowestPower(p), RealPolynomials.lowestPower(q));
        return new double[][] {RealPolynomials.trim(RealPolynomials.unshift(p, common)),
            RealPolynomials.trim(RealPolynomials.unshift(q, common))};
    }

    /**
     * The exact peak of |H| over a band of frequency ratios.
     * @param absorber the absorber
     * @param gLow low end (&gt;= 0)
     * @param gHigh high end (&gt;= gLow; +infinity for all frequencies above gLow)
     * @return the peak and where it is; unbounded where there is no finite maximum
     */
    public Peak peak(HystereticAbsorber absorber, double gLow, double gHigh) {
        double[][] pq = squaredMagnitude(absorber.tuningRatio(), absorber.lossFactor());
        return RatioMaximum.over(pq[0], pq[1], gLow, gHigh);
    }

    /**
     * Exact gradient of ln|H(i g)|^2 in (ln f, eta) at a frozen frequency (the response of the
     * structure, the stroke or the absorber force; not the spring or loss force alone).
     * @param f tuning ratio
     * @param eta loss factor
     * @param g frequency ratio
     * @return {d/d(ln f), d/d eta}
     */
    public double[] gradient(double f, double eta, double g) {
        if (response == ResponseKind.SPRING_FORCE || response == ResponseKind.DAMPER_FORCE) {
            throw new IllegalArgumentException(response + " depends on the spring and its loss separately");
        }
        double kr = f * f;
        double ki = f * f * eta;
        // at g = 0 a common factor of g in N and D (a base-acceleration drive) makes the formula 0/0:
        // take the limit, a ten-millionth of the structure's frequency above zero
        double at = Math.max(g, 1e-7);
        double[] n = combine(n0, n1, kr, ki, at);
        double[] d = combine(d0, d1, kr, ki, at);
        double[] a1 = evaluate(n1, at);
        double[] b1 = evaluate(d1, at);
        // w = N1/N - D1/D
        double[] w = subtract(divide(a1, n), divide(b1, d));
        // dK/d(ln f) = 2 K = 2 (kr + i ki); dK/d eta = i f^2
        double dLnF = 2 * (w[0] * 2 * kr - w[1] * 2 * ki);
        double dEta = 2 * (-w[1] * kr);
        return new double[] {dLnF, dEta};
    }

    /** N0 + K N1 at g, K = kr + i ki. */
    private static double[] combine(double[][] a0, double[][] a1, double kr, double ki, double g) {
        double[] x0 = evaluate(a0, g);
        double[] x1 = evaluate(a1, g);
        return new double[] {x0[0] + kr * x1[0] - ki * x1[1], x0[1] + kr * x1[1] + ki * x1[0]};
    }

    private static double[] evaluate(double[][] a, double g) {
        return new double[] {RealPolynomials.value(a[0], g), RealPolynomials.value(a[1], g)};
    }

    private static double[] divide(double[] a, double[] b) {
        double den = b[0] * b[0] + b[1] * b[1];
        return new double[] {(a[0] * b[0] + a[1] * b[1]) / den, (a[1] * b[0] - a[0] * b[1]) / den};
    }

    private static double[] subtract(double[] a, double[] b) {
        return new double[] {a[0] - b[0], a[1] - b[1]};
    }

    /** The spring force is mu f^2 times the stroke, the loss force mu f^2 eta times it; 1 otherwise. */
    private double forceScale(HystereticAbsorber absorber) {
        double f2 = absorber.tuningRatio() * absorber.tuningRatio();
        return switch (response) {
            case SPRING_FORCE -> massRatio * f2;
            case DAMPER_FORCE -> massRatio * f2 * absorber.lossFactor();
            default -> 1.0;
        };
    }

    /** @return the mass ratio this response was built for */
    public double massRatio() {
        return massRatio;
    }
}
