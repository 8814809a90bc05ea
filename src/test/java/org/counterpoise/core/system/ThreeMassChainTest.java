package org.counterpoise.core.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.complex.ComplexField;
import org.apache.commons.math3.linear.Array2DRowFieldMatrix;
import org.apache.commons.math3.linear.ArrayFieldVector;
import org.apache.commons.math3.linear.FieldLUDecomposition;
import org.apache.commons.math3.linear.FieldMatrix;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.rational.TransferFunction;
import org.junit.jupiter.api.Test;

/**
 * The {@link LinearSystem} interface takes more than one mode: a hand-made three-mass chain
 * (ground - k1,c1 - m1 - k2,c2 - m2 - k3,c3 - m3; an invented example) implements it with the exact
 * H(s) = adj(Z)_re / det Z, Z(s) = M s^2 + C s + K, in polynomial arithmetic. Checked against two
 * independent routes: a direct complex LU solve of Z(i omega) X = F at many frequencies, and a dense
 * brute-force scan (refined by Brent's method) of that direct solve, which the band peak found
 * through {@link BandPeak} must match. The white-noise mean square through
 * {@link WhiteNoiseMeanSquare} is checked against numerical quadrature of |H|^2.
 */
class ThreeMassChainTest {
    private static final double[] MASS = {400, 150, 60};
    private static final double[] STIFFNESS = {4.0e6, 1.2e6, 5.0e5};
    private static final double[] DAMPING = {1200, 300, 150};

    /** Excitation: a unit force on mass e; response: displacement of mass r (indices 0 to 2). */
    private record Point(int index) {
    }

    /** The chain, its variable scaled by omega_ref and its matrices by k_ref (both as a model would). */
    private static final class ThreeMassChain implements LinearSystem<Point, Point> {
        private final double omegaRef = Math.sqrt(STIFFNESS[0] / MASS[0]);
        private final double kRef = STIFFNESS[0];

        /** Z(s) / kRef with s = i omega / omegaRef: entries as polynomials in s, lowest power first. */
        private double[][][] impedance() {
            double[][][] z = new double[3][3][];
            double w2 = omegaRef * omegaRef;
            for (int i = 0; i < 3; i++) {
                double k = STIFFNESS[i] + (i < 2 ? STIFFNESS[i + 1] : 0);
                double c = DAMPING[i] + (i < 2 ? DAMPING[i + 1] : 0);
                z[i][i] = new double[] {k / kRef, c * omegaRef / kRef, MASS[i] * w2 / kRef};
                for (int j = 0; j < 3; j++) {
                    if (Math.abs(i - j) == 1) {
                        int spring = Math.max(i, j);
                        z[i][j] = new double[] {-STIFFNESS[spring] / kRef, -DAMPING[spring] * omegaRef / kRef};
                    } else if (i != j) {
                        z[i][j] = new double[] {0.0};
                    }
                }
            }
            return z;
        }

        @Override
        public double referenceFrequency() {
            return omegaRef;
        }

        @Override
        public TransferFunction transferFunction(Point excitation, Point response) {
            double[][][] z = impedance();
            // H_re = adj(Z)_re / det Z, adj(Z)_re = (-1)^(r+e) times the minor of Z without row e, column r.
            double[] minor = minor(z, excitation.index(), response.index());
            double[] cofactor = (excitation.index() + response.index()) % 2 == 0 ? minor
                    : RealPolynomials.scale(minor, -1.0);
            double[] det = new double[] {0.0};
            for (int j = 0; j < 3; j++) {
                double[] term = RealPolynomials.multiply(z[0][j], minor(z, 0, j));
                det = RealPolynomials.add(det, j % 2 == 0 ? term : RealPolynomials.scale(term, -1.0));
            }
            return TransferFunction.of(cofactor, det);
        }

        @Override
        public double responseScale(Point excitation, double amplitude, Point response) {
            return amplitude / kRef;
        }

        private static double[] minor(double[][][] z, int row, int column) {
            int[] rows = others(row);
            int[] cols = others(column);
            return RealPolynomials.add(RealPolynomials.multiply(z[rows[0]][cols[0]], z[rows[1]][cols[1]]),
                    RealPolynomials.scale(RealPolynomials.multiply(z[rows[0]][cols[1]], z[rows[1]][cols[0]]), -1.0));
        }

        private static int[] others(int i) {
            return i == 0 ? new int[] {1, 2} : i == 1 ? new int[] {0, 2} : new int[] {0, 1};
        }
    }

    /** The independent route: Z(i omega) X = F solved by complex LU; X of mass r per unit force at e. */
    private static Complex directSolve(double omega, int e, int r) {
        FieldMatrix<Complex> z = new Array2DRowFieldMatrix<>(ComplexField.getInstance(), 3, 3);
        for (int i = 0; i < 3; i++) {
            double k = STIFFNESS[i] + (i < 2 ? STIFFNESS[i + 1] : 0);
            double c = DAMPING[i] + (i < 2 ? DAMPING[i + 1] : 0);
            z.setEntry(i, i, new Complex(k - MASS[i] * omega * omega, c * omega));
            if (i < 2) {
                Complex coupling = new Complex(-STIFFNESS[i + 1], -DAMPING[i + 1] * omega);
                z.setEntry(i, i + 1, coupling);
                z.setEntry(i + 1, i, coupling);
            }
        }
        Complex[] force = {Complex.ZERO, Complex.ZERO, Complex.ZERO};
        force[e] = Complex.ONE;
        return new FieldLUDecomposition<>(z).getSolver().solve(new ArrayFieldVector<>(force)).getEntry(r);
    }

    private static final int[][] PAIRS = {{0, 0}, {0, 2}, {2, 1}, {2, 2}};

    @Test
    void transferFunctionsAgreeWithTheDirectComplexSolve() {
        ThreeMassChain chain = new ThreeMassChain();
        for (int[] pair : PAIRS) {
            TransferFunction h = chain.transferFunction(new Point(pair[0]), new Point(pair[1]));
            assertEquals(6, h.denominator().length - 1, "three masses give a sixth-degree denominator");
            double scale = chain.responseScale(new Point(pair[0]), 1.0, new Point(pair[1]));
            for (int i = 0; i <= 500; i++) {
                double omega = 2.0 + 400.0 * i / 500; // rad/s, across all three modes
                double[] v = h.value(omega / chain.referenceFrequency());
                Complex viaInterface = new Complex(v[0], v[1]).multiply(scale);
                Complex direct = directSolve(omega, pair[0], pair[1]);
                assertEquals(0.0, viaInterface.subtract(direct).abs(), 1e-9 * direct.abs(),
                        "force at " + pair[0] + ", response at " + pair[1] + ", " + omega + " rad/s");
            }
        }
    }

    @Test
    void bandPeakThroughTheObjectiveMatchesADenseBruteForceScan() {
        ThreeMassChain chain = new ThreeMassChain();
        double[] natural = undampedNaturalFrequencies();
        assertTrue(natural[0] > 20 && natural[2] < 300, "the three modes lie in the scanned range");
        double[][] bands = {{1.0, 400.0}, {natural[0] * 1.1, natural[2] * 1.2}, {natural[1] * 1.05, natural[2] * 0.9}};
        for (int[] pair : PAIRS) {
            for (double[] b : bands) {
                BandPeak band = new BandPeak(b[0], b[1]);
                Point e = new Point(pair[0]);
                Point r = new Point(pair[1]);
                double scale = chain.responseScale(e, 1.0, r);
                Peak exact = band.peakOf(chain.transferFunction(e, r), chain.referenceFrequency());
                double exactSi = exact.magnitude() * scale;
                double brute = bruteForcePeak(b[0], b[1], pair[0], pair[1]);
                String where = "force at " + pair[0] + ", response at " + pair[1] + ", band " + b[0] + " to " + b[1];
                assertTrue(brute <= exactSi * (1 + 1e-9), where + ": the scan never exceeds the exact peak");
                assertEquals(exactSi, brute, 1e-8 * exactSi, where);
                assertEquals(exact.magnitude(), band.of(chain, e, r), 0.0, where + ": objective = peak magnitude");
            }
        }
    }

    @Test
    void whiteNoiseMeanSquareThroughTheObjectiveMatchesQuadrature() {
        ThreeMassChain chain = new ThreeMassChain();
        for (int[] pair : PAIRS) {
            TransferFunction h = chain.transferFunction(new Point(pair[0]), new Point(pair[1]));
            double j = WhiteNoiseMeanSquare.INSTANCE.of(chain, new Point(pair[0]), new Point(pair[1]));
            // J = (1/2 pi) integral over all real g of |H(i g)|^2 = (1/pi) integral over g >= 0.
            UnivariateFunction squared = g -> h.magnitudeSquared(g * g);
            double integral = 0;
            GaussIntegratorFactory rules = new GaussIntegratorFactory();
            for (int i = 0; i < 20_000; i++) { // composite 10-point Gauss-Legendre, [0, 10] in steps of 0.0005
                integral += rules.legendre(10, i * 0.0005, (i + 1) * 0.0005).integrate(squared);
            }
            for (int i = 0; i < 3_800; i++) { // then [10, 200] in steps of 0.05
                integral += rules.legendre(10, 10 + i * 0.05, 10 + (i + 1) * 0.05).integrate(squared);
            }
            // The tail beyond g = 200 by the substitution g = 1/t: integral over t in (0, 1/200] of |H(1/t)|^2 / t^2.
            UnivariateFunction tail = t -> squared.value(1 / t) / (t * t);
            for (int i = 0; i < 10; i++) {
                integral += rules.legendre(10, i * 0.0005, (i + 1) * 0.0005).integrate(tail);
            }
            assertEquals(j, integral / Math.PI, 1e-9 * j, "force at " + pair[0] + ", response at " + pair[1]);
        }
    }

    private static double bruteForcePeak(double low, double high, int e, int r) {
        int points = 40_000;
        double best = directSolve(low, e, r).abs();
        int bestIndex = 0;
        for (int i = 1; i <= points; i++) {
            double value = directSolve(low + (high - low) * i / points, e, r).abs();
            if (value > best) {
                best = value;
                bestIndex = i;
            }
        }
        double step = (high - low) / points;
        double a = Math.max(low, low + (bestIndex - 1) * step);
        double b = Math.min(high, low + (bestIndex + 1) * step);
        if (b > a) {
            double refined = new BrentOptimizer(1e-14, 1e-14).optimize(new MaxEval(500),
                    new UnivariateObjectiveFunction(w -> directSolve(w, e, r).abs()), GoalType.MAXIMIZE,
                    new SearchInterval(a, b)).getValue();
            best = Math.max(best, refined);
        }
        return best;
    }

    /** Eigenvalues of M^-1 K by Commons Math, to place the bands across the modes. */
    private static double[] undampedNaturalFrequencies() {
        double[][] mk = new double[3][3];
        for (int i = 0; i < 3; i++) {
            mk[i][i] = (STIFFNESS[i] + (i < 2 ? STIFFNESS[i + 1] : 0)) / MASS[i];
            if (i < 2) {
                mk[i][i + 1] = -STIFFNESS[i + 1] / MASS[i];
                mk[i + 1][i] = -STIFFNESS[i + 1] / MASS[i + 1];
            }
        }
        double[] eig = new org.apache.commons.math3.linear.EigenDecomposition(
                new org.apache.commons.math3.linear.Array2DRowRealMatrix(mk)).getRealEigenvalues();
        double[] w = new double[3];
        for (int i = 0; i < 3; i++) {
            w[i] = Math.sqrt(eig[i]);
        }
        java.util.Arrays.sort(w);
        return w;
    }
}
