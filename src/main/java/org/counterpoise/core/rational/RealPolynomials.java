package org.counterpoise.core.rational;

import java.util.Arrays;

/**
 * Arithmetic on real polynomials held as coefficient arrays in ascending powers
 * (c[0] + c[1] s + c[2] s^2 ...). Multiplying by s is an exact shift, so factors of s that cancel
 * between numerator and denominator leave exact zeros that {@link #lowestPower} can count.
 */
public final class RealPolynomials {
    private RealPolynomials() {
    }

    public static double[] multiply(double[] a, double[] b) {
        double[] out = new double[a.length + b.length - 1];
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < b.length; j++) {
                out[i + j] += a[i] * b[j];
            }
        }
        return out;
    }

    public static double[] add(double[] a, double[] b) {
        double[] out = new double[Math.max(a.length, b.length)];
        for (int i = 0; i < out.length; i++) {
            out[i] = (i < a.length ? a[i] : 0.0) + (i < b.length ? b[i] : 0.0);
        }
        return out;
    }

    public static double[] scale(double[] a, double factor) {
        double[] out = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            out[i] = a[i] * factor;
        }
        return out;
    }

    /** @return a times s^power (an exact shift) */
    public static double[] shift(double[] a, int power) {
        double[] out = new double[a.length + power];
        System.arraycopy(a, 0, out, power, a.length);
        return out;
    }

    /** @return the power of the lowest non-zero coefficient (a.length for the zero polynomial) */
    public static int lowestPower(double[] a) {
        int k = 0;
        while (k < a.length && a[k] == 0.0) {
            k++;
        }
        return k;
    }

    /** @return a divided by s^power, where the lowest power coefficients are exact zeros */
    public static double[] unshift(double[] a, int power) {
        return Arrays.copyOfRange(a, power, a.length);
    }

    /** @return a without leading (highest power) exact zeros; at least one coefficient */
    public static double[] trim(double[] a) {
        int n = a.length;
        while (n > 1 && a[n - 1] == 0.0) {
            n--;
        }
        return n == a.length ? a : Arrays.copyOf(a, n);
    }

    /** Horner evaluation at a real point. */
    public static double value(double[] a, double x) {
        double v = 0.0;
        for (int i = a.length - 1; i >= 0; i--) {
            v = v * x + a[i];
        }
        return v;
    }

    /** Horner evaluation of the derivative at a real point. */
    public static double derivativeValue(double[] a, double x) {
        double v = 0.0;
        for (int i = a.length - 1; i >= 1; i--) {
            v = v * x + i * a[i];
        }
        return v;
    }

    /**
     * Both Horner chains of {@link #value} and {@link #derivativeValue} in one pass: the same
     * operations in the same order, so the same bits, with the two independent chains interleaved
     * (the root refinement asks both at every step).
     *
     * @param a coefficients, ascending powers
     * @param x the point
     * @param out receives {value, derivative}
     */
    public static void valueAndDerivative(double[] a, double x, double[] out) {
        double v = 0.0;
        double d = 0.0;
        for (int i = a.length - 1; i >= 1; i--) {
            v = v * x + a[i];
            d = d * x + i * a[i];
        }
        out[0] = a.length == 0 ? v : v * x + a[0];
        out[1] = d;
    }

    /**
     * Evaluates the polynomial at s = i g.
     * @return {real part, imaginary part}
     */
    public static double[] valueOnImaginaryAxis(double[] a, double g) {
        // Horner in complex arithmetic with s = i g.
        double re = 0.0;
        double im = 0.0;
        for (int i = a.length - 1; i >= 0; i--) {
            double nr = -im * g + a[i];
            double ni = re * g;
            re = nr;
            im = ni;
        }
        return new double[] {re, im};
    }

    /**
     * |N(i g)|^2 as a polynomial in x = g^2: with E(x) = sum_j n_2j (-1)^j x^j and
     * O(x) = sum_j n_(2j+1) (-1)^j x^j, N(i g) = E + i g O, so |N|^2 = E^2 + x O^2.
     */
    public static double[] magnitudeSquaredInX(double[] n) {
        int half = (n.length + 1) / 2;
        double[] even = new double[half];
        double[] odd = new double[half];
        for (int k = 0; k < n.length; k++) {
            double sign = ((k / 2) % 2 == 0) ? 1.0 : -1.0;
            if (k % 2 == 0) {
                even[k / 2] = sign * n[k];
            } else {
                odd[k / 2] = sign * n[k];
            }
        }
        return trim(add(multiply(even, even), shift(multiply(odd, odd), 1)));
    }

    /**
     * The numerator of d/dx (P/Q): R = P'Q - PQ', with coefficients
     * r_k = sum over i + j = k + 1 of (i - j) p_i q_j. Written this way the top coefficient
     * cancels exactly when deg P = deg Q, instead of leaving round-off that would add a spurious
     * huge root.
     */
    public static double[] quotientDerivativeNumerator(double[] p, double[] q) {
        int size = Math.max(1, p.length + q.length - 2);
        double[] r = new double[size];
        for (int i = 0; i < p.length; i++) {
            for (int j = 0; j < q.length; j++) {
                int k = i + j - 1;
                if (k >= 0 && i != j) {
                    r[k] += (i - j) * p[i] * q[j];
                }
            }
        }
        return trim(r);
    }
}
