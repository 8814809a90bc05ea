package org.counterpoise.core.response;

import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;

/**
 * The one place where the algebra of the structure-absorber system lives. Every response, in
 * physical or non-dimensional form, with or without the absorber, is built here.
 *
 * <p>Model (Den Hartog 1956, ch. 3; Warburton 1982, eqs. 1-4): structure m1, k1, c1 to the base;
 * absorber m2 with k2, c2 to the structure. With mu = m2/m1, f = omega_a/omega1,
 * zeta_a = c2/(2 m2 omega_a), zeta1 = c1/(2 sqrt(k1 m1)), g = omega/omega1, s = i g:
 * <pre>
 *   K(s) = f^2 + 2 zeta_a f s,   C1(s) = 1 + 2 zeta1 s,   D1(s) = s^2 + C1(s)
 *   Delta(s) = D1(s) (s^2 + K(s)) + mu s^2 K(s)
 *   (D1 + mu K) X1 - mu K X2 = W,   -mu K X1 + mu (s^2 + K) X2 = 0
 * </pre>
 * where W is the normalised drive: P = F/k1 for a force, (m_u e / m1) g^2 = -(m_u e/m1) s^2 for
 * an unbalance, C1 U for a base displacement U, and C1 (A/omega1^2)/s^2 for a base acceleration A.
 * Hence X1 = A1 W / Den, X2 = A2 W / Den with A1 = s^2 + K, A2 = K, Den = Delta; for the bare
 * structure A1 = 1, A2 = 0, Den = D1. The relative displacement under base motion is
 * Z = X1 - U = -s^2 (A1 + mu A2) U / Den (the C1 terms cancel). Stroke X2 - X1 = -s^2 W / Den.
 * Force transmitted to the base: k1 C1 Z (k1 C1 X1 for a force drive). Force in the absorber:
 * k1 mu K (X2 - X1). See {@link ResponseScale} for the SI reference of each response.
 */
public final class TransferFunctions {
    private TransferFunctions() {
    }

    /**
     * @param excitation what drives the structure
     * @param response the response wanted
     * @param structureDamping zeta1
     * @param tuning the absorber (mu, f, zeta_a), or null for the bare structure
     * @return the non-dimensional transfer function
     * @throws IllegalArgumentException when the response needs an absorber and there is none
     */
    public static TransferFunction of(ExcitationKind excitation, ResponseKind response,
            double structureDamping, Tuning tuning) {
        if (tuning == null && response.needsAbsorber()) {
            throw new IllegalArgumentException(response + " has no meaning without an absorber");
        }
        double[][] nd = tuning == null
                ? build(excitation, response, structureDamping, 0.0, null)
                : build(excitation, response, structureDamping, tuning.massRatio(), absorberPolynomial(tuning));
        return TransferFunction.of(nd[0], nd[1]);
    }

    /**
     * The same response with its derivatives in the tuning ratio and the absorber damping ratio.
     * @param excitation what drives the structure
     * @param response the response wanted
     * @param structureDamping zeta1
     * @param tuning the absorber
     * @return the sensitivity evaluator
     */
    public static TuningSensitivity sensitivity(ExcitationKind excitation, ResponseKind response,
            double structureDamping, Tuning tuning) {
        if (response == ResponseKind.SPRING_FORCE || response == ResponseKind.DAMPER_FORCE) {
            throw new IllegalArgumentException(response + " depends on the spring and damper separately");
        }
        double[] k = absorberPolynomial(tuning);
        double[][] nd = build(excitation, response, structureDamping, tuning.massRatio(), k);
        // Every response is affine in K(s) (see the class comment), so raising K by the constant 1
        // changes N and D by exactly their K-coefficient polynomials dN/dK and dD/dK.
        double[] kPlusOne = {k[0] + 1.0, k[1]};
        double[][] shifted = build(excitation, response, structureDamping, tuning.massRatio(), kPlusOne);
        return new TuningSensitivity(nd[0], nd[1], RealPolynomials.add(shifted[0], RealPolynomials.scale(nd[0], -1.0)),
                RealPolynomials.add(shifted[1], RealPolynomials.scale(nd[1], -1.0)), tuning);
    }

    /**
     * The response written out in the absorber polynomial K(s), for cheap evaluation of many
     * designs: the same algebra as {@link #sensitivity}, with K = 0 and K = 1.
     * @param excitation what drives the structure
     * @param response the response wanted (not the spring or damper force alone)
     * @param structureDamping zeta1
     * @param massRatio mu
     * @return N0, N1, D0, D1 with H = (N0 + K N1) / (D0 + K D1)
     */
    public static AbsorberAffineResponse affineInAbsorber(ExcitationKind excitation, ResponseKind response,
            double structureDamping, double massRatio) {
        if (response == ResponseKind.SPRING_FORCE || response == ResponseKind.DAMPER_FORCE) {
            throw new IllegalArgumentException(response + " depends on the spring and damper separately");
        }
        double[][] zero = build(excitation, response, structureDamping, massRatio, new double[] {0.0, 0.0});
        double[][] one = build(excitation, response, structureDamping, massRatio, new double[] {1.0, 0.0});
        return new AbsorberAffineResponse(zero[0], RealPolynomials.add(one[0], RealPolynomials.scale(zero[0], -1.0)),
                zero[1], RealPolynomials.add(one[1], RealPolynomials.scale(zero[1], -1.0)));
    }

    /** K(s) = f^2 + 2 zeta_a f s, the absorber's normalised spring and damper. */
    private static double[] absorberPolynomial(Tuning tuning) {
        return new double[] {tuning.tuningRatio() * tuning.tuningRatio(), 2.0 * tuning.dampingRatio() * tuning.tuningRatio()};
    }

    /** @return {numerator, denominator} in ascending powers of s; k null for the bare structure */
    private static double[][] build(ExcitationKind excitation, ResponseKind response, double structureDamping,
            double mu, double[] absorber) {
        double[] c1 = {1.0, 2.0 * structureDamping};
        double[] d1 = {1.0, 2.0 * structureDamping, 1.0};
        boolean bare = absorber == null;
        double[] k = bare ? new double[] {0.0, 0.0} : absorber;
        double[] a1;
        double[] a2;
        double[] den;
        if (bare) {
            a1 = new double[] {1.0};
            a2 = new double[] {0.0};
            den = d1;
        } else {
            a1 = RealPolynomials.add(RealPolynomials.shift(new double[] {1.0}, 2), k);
            a2 = k;
            den = RealPolynomials.add(RealPolynomials.multiply(d1, a1),
                    RealPolynomials.scale(RealPolynomials.shift(k, 2), mu));
        }
        double[] driveNumerator;
        double[] driveDenominator;
        switch (excitation) {
            case FORCE -> {
                driveNumerator = new double[] {1.0};
                driveDenominator = new double[] {1.0};
            }
            case UNBALANCE -> {
                driveNumerator = new double[] {0.0, 0.0, -1.0};
                driveDenominator = new double[] {1.0};
            }
            case BASE_DISPLACEMENT -> {
                driveNumerator = c1;
                driveDenominator = new double[] {1.0};
            }
            case BASE_ACCELERATION -> {
                driveNumerator = c1;
                driveDenominator = new double[] {0.0, 0.0, 1.0};
            }
            default -> throw new IllegalStateException("unknown excitation " + excitation);
        }
        double[] x1 = RealPolynomials.multiply(a1, driveNumerator);
        double[] stroke = RealPolynomials.shift(RealPolynomials.scale(driveNumerator, -1.0), 2);
        double[] relative = excitation.isBaseMotion()
                ? RealPolynomials.shift(RealPolynomials.scale(
                        RealPolynomials.add(a1, RealPolynomials.scale(a2, mu)), -1.0), 2)
                : x1;
        double[] numerator = switch (response) {
            case DISPLACEMENT -> x1;
            case VELOCITY -> RealPolynomials.shift(x1, 1);
            case ACCELERATION -> RealPolynomials.shift(x1, 2);
            case RELATIVE_DISPLACEMENT -> relative;
            case STROKE -> stroke;
            case TRANSMITTED_FORCE -> RealPolynomials.multiply(c1, relative);
            case ABSORBER_FORCE -> RealPolynomials.multiply(RealPolynomials.scale(k, mu), stroke);
            case SPRING_FORCE -> RealPolynomials.scale(stroke, mu * k[0]);
            case DAMPER_FORCE -> RealPolynomials.shift(RealPolynomials.scale(stroke, mu * k[1]), 1);
        };
        return new double[][] {numerator, RealPolynomials.multiply(den, driveDenominator)};
    }
}
