package org.counterpoise.core.response;

/**
 * One response of the structure with an absorber, written out in the absorber polynomial
 * K(s) = f^2 + 2 zeta_a f s for a fixed excitation and response pair, structure damping and mass
 * ratio: H(s) = (N0(s) + K(s) N1(s)) / (D0(s) + K(s) D1(s)). Every response the optimisers use is
 * affine in K (see {@link TransferFunctions}'s class comment), so the four polynomials do not
 * depend on the design. |H(i g)| of any design (f, zeta_a) then costs four short Horner sums in
 * complex arithmetic and no allocation: the optimisers use it for cheap lower bounds on a band
 * peak (a value at one frequency of the band is never above the peak over the band). Built by
 * {@link TransferFunctions#affineInAbsorber}. Immutable.
 */
public final class AbsorberAffineResponse {
    private final double[] n0;
    private final double[] n1;
    private final double[] d0;
    private final double[] d1;

    AbsorberAffineResponse(double[] n0, double[] n1, double[] d0, double[] d1) {
        this.n0 = n0;
        this.n1 = n1;
        this.d0 = d0;
        this.d1 = d1;
    }

    /**
     * @param f tuning ratio
     * @param zeta absorber damping ratio
     * @param g frequency ratio (&gt; 0)
     * @return |H(i g)|^2 of the design (f, zeta); +infinity where the denominator vanishes, NaN
     *     where numerator and denominator both vanish
     */
    public double magnitudeSquared(double f, double zeta, double g) {
        // K(i g) = f^2 + i 2 zeta f g
        double kr = f * f;
        double ki = 2 * zeta * f * g;
        double nr = real(n0, g) + kr * real(n1, g) - ki * imaginary(n1, g);
        double ni = imaginary(n0, g) + kr * imaginary(n1, g) + ki * real(n1, g);
        double dr = real(d0, g) + kr * real(d1, g) - ki * imaginary(d1, g);
        double di = imaginary(d0, g) + kr * imaginary(d1, g) + ki * real(d1, g);
        return (nr * nr + ni * ni) / (dr * dr + di * di);
    }

    /** @return {N0, N1, D0, D1}, ascending powers of s (the arrays themselves: callers in this package copy) */
    double[][] polynomials() {
        return new double[][] {n0, n1, d0, d1};
    }

    /** Re a(i g) = a0 - a2 g^2 + a4 g^4 - ... */
    private static double real(double[] a, double g) {
        double x = -g * g;
        double v = 0.0;
        for (int k = (a.length - 1) & ~1; k >= 0; k -= 2) {
            v = v * x + a[k];
        }
        return v;
    }

    /** Im a(i g) = g (a1 - a3 g^2 + a5 g^4 - ...) */
    private static double imaginary(double[] a, double g) {
        double x = -g * g;
        double v = 0.0;
        int top = a.length - 1;
        for (int k = (top & 1) == 1 ? top : top - 1; k >= 1; k -= 2) {
            v = v * x + a[k];
        }
        return g * v;
    }
}
