package org.counterpoise.core.optim;

import java.util.function.Function;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;

/**
 * The Newton step of the active-set solvers ({@link ActiveSetNewton}, {@link HystereticActiveSet},
 * {@link MinimaxKkt}): the Jacobian of the residual by forward differences (step h_j = relative
 * step times max(|u_j|, 1e-3)), then -J^-1 r by Commons Math's LU decomposition, and the
 * backtracking that keeps the first of the steps 1, 1/2, 1/4 ... (30 halvings) that lowers the
 * residual's norm.
 */
final class ForwardDifferenceNewton {
    private ForwardDifferenceNewton() {
    }

    /**
     * @param residual the residual of the system, null outside its domain
     * @param u the unknowns
     * @param r the residual at u
     * @param relativeStep the relative difference step
     * @return the Newton step, or null when a shifted residual is undefined or J is singular
     */
    static RealVector step(Function<double[], double[]> residual, double[] u, double[] r, double relativeStep) {
        double[][] jacobian = new double[u.length][];
        for (int j = 0; j < u.length; j++) {
            double h = relativeStep * Math.max(Math.abs(u[j]), 1e-3);
            double[] shifted = u.clone();
            shifted[j] += h;
            double[] rs = residual.apply(shifted);
            if (rs == null) {
                return null;
            }
            jacobian[j] = new double[rs.length];
            for (int i = 0; i < rs.length; i++) {
                jacobian[j][i] = (rs[i] - r[i]) / h;
            }
        }
        try {
            return new LUDecomposition(new Array2DRowRealMatrix(jacobian).transpose(), 1e-300).getSolver()
                    .solve(new ArrayRealVector(r).mapMultiply(-1));
        } catch (RuntimeException singular) {
            return null;
        }
    }

    /**
     * A step kept by {@link #backtrack}.
     *
     * @param u the new unknowns
     * @param residual the residual there
     * @param alpha the fraction of the Newton step taken
     */
    record Accepted(double[] u, double[] residual, double alpha) {
    }

    /**
     * @param residual the residual of the system, null outside its domain
     * @param u the unknowns
     * @param step the Newton step
     * @param norm the residual's norm at u
     * @return the first trial u + alpha step, alpha = 1, 1/2, ... (30 halvings), whose residual norm
     *     is below {@code norm}; null when none is
     */
    static Accepted backtrack(Function<double[], double[]> residual, double[] u, RealVector step, double norm) {
        double alpha = 1.0;
        for (int halving = 0; halving < 30; halving++) {
            double[] trial = u.clone();
            for (int j = 0; j < u.length; j++) {
                trial[j] += alpha * step.getEntry(j);
            }
            double[] r = residual.apply(trial);
            if (r != null && norm(r) < norm) {
                return new Accepted(trial, r, alpha);
            }
            alpha *= 0.5;
        }
        return null;
    }

    /**
     * @param v a vector
     * @return its Euclidean norm
     */
    static double norm(double[] v) {
        double s = 0;
        for (double c : v) {
            s += c * c;
        }
        return Math.sqrt(s);
    }
}
