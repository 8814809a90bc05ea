package org.counterpoise.core.rational;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;

/**
 * The exact mean square of a response to white noise: J = (1 / 2 pi) times the integral over all
 * real g of |H(i g)|^2 (unit two-sided spectral density of the non-dimensional input).
 *
 * <p>For a strictly proper H = N/D with D monic of degree n, the controllable canonical
 * realisation (A companion of D, B = e_n, C = the coefficients of N) gives J = C P C^T, where P
 * solves the Lyapunov equation A P + P A^T + B B^T = 0 (e.g. Crandall and Mark 1963, ch. 2;
 * Astrom 1970, Introduction to Stochastic Control Theory, ch. 5). The equation is solved as the
 * linear system (I (x) A + A (x) I) vec P = -vec(B B^T) by LU decomposition, exact up to
 * round-off (relative error about 1e-14 for these orders).
 */
public final class MeanSquare {
    private MeanSquare() {
    }

    /**
     * @param h the transfer function
     * @return J, or +infinity when the integral diverges (H not strictly proper, a pole at g = 0,
     *     or an undamped pole on the frequency axis)
     */
    public static double of(TransferFunction h) {
        double[] num = h.numerator();
        double[] den = h.denominator();
        int n = den.length - 1;
        if (num.length - 1 >= n || h.unboundedAtZero() || h.undamped()) {
            return Double.POSITIVE_INFINITY;
        }
        double lead = den[n];
        for (double c : den) {
            if (!(c / lead > 0)) {
                // Not all coefficients of one sign: D is not stable (Stodola's necessary condition).
                return Double.POSITIVE_INFINITY;
            }
        }
        RealMatrix a = new Array2DRowRealMatrix(n, n);
        for (int i = 0; i + 1 < n; i++) {
            a.setEntry(i, i + 1, 1.0);
        }
        for (int j = 0; j < n; j++) {
            a.setEntry(n - 1, j, -den[j] / lead);
        }
        double[] c = new double[n];
        for (int j = 0; j < num.length; j++) {
            c[j] = num[j] / lead;
        }
        int size = n * n;
        RealMatrix kron = new Array2DRowRealMatrix(size, size);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                // vec index: row i, column j -> i + n j ; (A P)_{ij} = sum_k A_ik P_kj ; (P A^T)_{ij} = sum_k P_ik A_jk
                int row = i + n * j;
                for (int k = 0; k < n; k++) {
                    kron.addToEntry(row, k + n * j, a.getEntry(i, k));
                    kron.addToEntry(row, i + n * k, a.getEntry(j, k));
                }
            }
        }
        RealVector rhs = new ArrayRealVector(size);
        rhs.setEntry((n - 1) + n * (n - 1), -1.0);
        // The Lyapunov operator of a stable A is never singular (no two eigenvalues sum to zero),
        // but its entries scale with the poles, so LU's default ABSOLUTE pivot threshold (1e-11)
        // called it singular for slow poles. Use a threshold relative to the operator's size.
        double size1 = 0;
        for (int r = 0; r < size; r++) {
            for (int s = 0; s < size; s++) {
                size1 = Math.max(size1, Math.abs(kron.getEntry(r, s)));
            }
        }
        DecompositionSolver solver =
                new LUDecomposition(kron, 1e-14 * size1).getSolver();
        if (!solver.isNonSingular()) {
            return Double.POSITIVE_INFINITY; // a pole on (or numerically at) the frequency axis
        }
        RealVector p = solver.solve(rhs);
        double j = 0;
        for (int r = 0; r < n; r++) {
            for (int s = 0; s < n; s++) {
                j += c[r] * p.getEntry(r + n * s) * c[s];
            }
        }
        return j;
    }
}
