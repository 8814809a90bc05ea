package org.counterpoise.core.optim;

import java.util.Arrays;

/**
 * The convex combination of a few vectors with the least Euclidean norm: min |sum lambda_i g_i|
 * over lambda_i &gt;= 0, sum lambda_i = 1, by projected gradient descent on the simplex (a small
 * convex quadratic problem; the projection is that of Duchi et al. 2008, "Efficient projections
 * onto the l1-ball for learning in high dimensions", ICML, algorithm 1; the projection of
 * {@link MinimaxCertificate}).
 */
final class SimplexLeastNorm {
    private static final int STEPS = 4000;

    private SimplexLeastNorm() {
    }

    /**
     * @param g the vectors (rows), all of one length
     * @return the weights lambda
     */
    static double[] weights(double[][] g) {
        int k = g.length;
        double[] lambda = new double[k];
        Arrays.fill(lambda, 1.0 / k);
        double lipschitz = 0;
        for (double[] row : g) {
            for (double c : row) {
                lipschitz += c * c;
            }
        }
        if (k == 1 || lipschitz == 0) {
            return lambda;
        }
        double step = 1.0 / lipschitz;
        double[] scratch = new double[k];
        for (int it = 0; it < STEPS; it++) {
            double[] r = combination(g, lambda);
            double[] next = new double[k];
            for (int i = 0; i < k; i++) {
                double dot = 0;
                for (int j = 0; j < r.length; j++) {
                    dot += g[i][j] * r[j];
                }
                next[i] = lambda[i] - step * dot;
            }
            MinimaxCertificate.projectOntoSimplex(next, scratch);
            lambda = next;
        }
        return lambda;
    }

    /** @return sum lambda_i g_i */
    static double[] combination(double[][] g, double[] lambda) {
        double[] r = new double[g[0].length];
        for (int i = 0; i < g.length; i++) {
            for (int j = 0; j < r.length; j++) {
                r[j] += lambda[i] * g[i][j];
            }
        }
        return r;
    }
}
