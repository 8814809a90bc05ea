package org.counterpoise.testing;

import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.response.ResponseKind;

/**
 * An independent route to the hysteretic absorber's harmonic response: the physical equations of
 * motion with a complex absorber stiffness k2 (1 + i eta), in absolute coordinates, solved as a 2x2
 * complex linear system by Cramer's rule in Commons Math's Complex; nothing from the production
 * algebra.
 * Non-dimensional: m1 = k1 = 1, so omega = g, c1 = 2 zeta1, m2 = mu, k2 = mu f^2.
 *
 * <pre>
 *   (1 + 2 i zeta1 g + k2* - g^2) X1 - k2* X2 = P + (1 + 2 i zeta1 g) U
 *   -k2* X1 + (k2* - mu g^2) X2 = 0,          k2* = mu f^2 (1 + i eta)
 * </pre>
 * Drives (per their reference length): force P = 1; unbalance P = g^2; base displacement U = 1;
 * base acceleration U = -1/g^2.
 */
public final class HystereticDirectSolve {
    private HystereticDirectSolve() {
    }

    /**
     * @return the complex response of the pair at g
     */
    public static Complex response(ExcitationKind excitation, ResponseKind response, double zeta1, double mu, double f,
            double eta, double g) {
        Complex k2 = new Complex(mu * f * f, mu * f * f * eta);
        Complex c1 = new Complex(1, 2 * zeta1 * g);
        Complex force = Complex.ZERO;
        Complex base = Complex.ZERO;
        switch (excitation) {
            case FORCE -> force = Complex.ONE;
            case UNBALANCE -> force = new Complex(g * g, 0);
            case BASE_DISPLACEMENT -> base = Complex.ONE;
            case BASE_ACCELERATION -> base = new Complex(-1 / (g * g), 0);
            default -> throw new IllegalArgumentException(excitation.name());
        }
        // the 2x2 complex system by Cramer's rule (right-hand side zero on the absorber's row)
        Complex a11 = c1.add(k2).subtract(g * g);
        Complex a22 = k2.subtract(mu * g * g);
        Complex b1 = force.add(c1.multiply(base));
        Complex det = a11.multiply(a22).subtract(k2.multiply(k2));
        Complex x1 = b1.multiply(a22).divide(det);
        Complex x2 = b1.multiply(k2).divide(det);
        Complex stroke = x2.subtract(x1);
        Complex relative = x1.subtract(base);
        return switch (response) {
            case DISPLACEMENT -> x1;
            case VELOCITY -> x1.multiply(new Complex(0, g));
            case ACCELERATION -> x1.multiply(-g * g);
            case RELATIVE_DISPLACEMENT -> relative;
            case STROKE -> stroke;
            case TRANSMITTED_FORCE -> c1.multiply(relative);
            case ABSORBER_FORCE -> k2.multiply(stroke);
            case SPRING_FORCE -> stroke.multiply(mu * f * f);
            case DAMPER_FORCE -> stroke.multiply(mu * f * f * eta);
        };
    }

    /**
     * The peak of |H| over [gLow, gHigh] by dense sampling (n points, log-spaced) refined by golden
     * section around the best three samples.
     */
    public static double peak(ExcitationKind excitation, ResponseKind response, double zeta1, double mu, double f,
            double eta, double gLow, double gHigh, int n) {
        double[] g = new double[n];
        double[] v = new double[n];
        double lo = Math.max(gLow, 1e-3);
        for (int i = 0; i < n; i++) {
            g[i] = lo * Math.pow(gHigh / lo, i / (n - 1.0));
            v[i] = response(excitation, response, zeta1, mu, f, eta, g[i]).abs();
        }
        double best = 0;
        for (int i = 0; i < n; i++) {
            best = Math.max(best, v[i]);
            if (i > 0 && i < n - 1 && v[i] >= v[i - 1] && v[i] >= v[i + 1]) {
                double a = g[i - 1];
                double b = g[i + 1];
                for (int k = 0; k < 50; k++) {
                    double m1 = b - 0.618033988749895 * (b - a);
                    double m2 = a + 0.618033988749895 * (b - a);
                    if (response(excitation, response, zeta1, mu, f, eta, m1).abs()
                            >= response(excitation, response, zeta1, mu, f, eta, m2).abs()) {
                        b = m2;
                    } else {
                        a = m1;
                    }
                }
                best = Math.max(best, response(excitation, response, zeta1, mu, f, eta, 0.5 * (a + b)).abs());
            }
        }
        return best;
    }
}
