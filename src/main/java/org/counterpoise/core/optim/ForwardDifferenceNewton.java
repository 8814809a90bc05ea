package org.counterpoise.core.optim;

import java.util.function.Function;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;

/**
 * The Newton step of the active-set solvers ({@link ActiveSetNewton}, {@link HystereticActiveSet},
 * {@link MinimaxKkt}): the Jacobian of the residual by forward differences (step h_j = relative
 * step times max(|u_j|, 1e-3)), then -J^-1 r by Commons Math's LU decomposition.
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
}
