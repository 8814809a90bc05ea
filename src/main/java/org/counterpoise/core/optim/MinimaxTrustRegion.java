package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.optim.MaxIter;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.linear.LinearConstraint;
import org.apache.commons.math3.optim.linear.LinearConstraintSet;
import org.apache.commons.math3.optim.linear.LinearObjectiveFunction;
import org.apache.commons.math3.optim.linear.NonNegativeConstraint;
import org.apache.commons.math3.optim.linear.Relationship;
import org.apache.commons.math3.optim.linear.SimplexSolver;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;

/**
 * Minimises the largest of the smooth maxima ln|H|^2 over a box by sequential linear programming
 * in a trust region (Madsen 1975, "An algorithm for minimax solution of overdetermined systems of
 * non-linear equations", J. Inst. Math. Appl. 16, 321-328): at p, each maximum h_i is replaced by
 * its linearisation v_i + g_i . delta (exact gradients at the frozen frequency; shoulders where a
 * peak may be born join as further frozen-frequency pieces, see {@link MinimaxVariables#pieces}),
 * the linear program
 * min t subject to v_i + g_i . delta &lt;= F + t, |delta_k| &lt;= r and the box is solved by Commons
 * Math's simplex method, and the step is kept when the true peak falls by at least 1 % of the
 * predicted fall; the radius grows after good predictions and shrinks after poor ones. Globally
 * convergent to a stationary point of the minimax; linearly near an optimum with fewer active
 * maxima than variables plus one, which is why {@link MinimaxKkt} finishes the job.
 */
final class MinimaxTrustRegion {
    private static final int MAX_ITERATIONS = 400;

    private MinimaxTrustRegion() {
    }

    /**
     * @param v the variables
     * @param start the starting point (clamped into the box)
     * @param counter counts transfer functions built
     * @return the point reached
     */
    static double[] minimise(MinimaxVariables v, double[] start, EvaluationCounter counter) {
        double[] lo = v.lower();
        double[] hi = v.upper();
        double[] p = start.clone();
        for (int k = 0; k < p.length; k++) {
            p[k] = Math.min(hi[k], Math.max(lo[k], p[k]));
        }
        double radius = 0.1;
        counter.add(1);
        List<double[]> maxima = v.pieces(p, true);
        double level = level(maxima);
        for (int iteration = 0; iteration < MAX_ITERATIONS && radius > 1e-12; iteration++) {
            double[] step = linearStep(v, p, maxima, level, radius, lo, hi);
            if (step == null) {
                radius /= 4;
                continue;
            }
            double predicted = -step[p.length];
            if (!(predicted > 1e-14 * (1 + Math.abs(level)))) {
                break;
            }
            double[] trial = p.clone();
            double length = 0;
            for (int k = 0; k < p.length; k++) {
                trial[k] = Math.min(hi[k], Math.max(lo[k], p[k] + step[k]));
                length = Math.max(length, Math.abs(step[k]));
            }
            counter.add(1);
            List<double[]> trialMaxima = v.pieces(trial, true);
            double trialLevel = level(trialMaxima);
            double ratio = (level - trialLevel) / predicted;
            if (ratio > 0.01) {
                p = trial;
                maxima = trialMaxima;
                level = trialLevel;
            }
            if (ratio > 0.75 && length > 0.99 * radius) {
                radius = Math.min(2 * radius, 1.0);
            } else if (ratio < 0.25) {
                radius = length / 4;
            }
        }
        return p;
    }

    /** @return the largest ln|H|^2 among the maxima (the peak; -infinity when there are none) */
    static double level(List<double[]> maxima) {
        double level = Double.NEGATIVE_INFINITY;
        for (double[] m : maxima) {
            level = Math.max(level, m[2]);
        }
        return level;
    }

    /** @return {delta_1 .. delta_d, t} of the linear program, or null when it could not be solved */
    private static double[] linearStep(MinimaxVariables v, double[] p, List<double[]> maxima, double level,
            double radius, double[] lo, double[] hi) {
        int d = p.length;
        List<LinearConstraint> constraints = new ArrayList<>();
        for (double[] m : maxima) {
            double[] g = v.gradient(p, MinimaxVariables.scenario(m), m[0]);
            double[] row = new double[d + 1];
            for (int k = 0; k < d; k++) {
                if (!Double.isFinite(g[k])) {
                    return null;
                }
                row[k] = g[k];
            }
            row[d] = -1.0;
            constraints.add(new LinearConstraint(row, Relationship.LEQ, level - m[2]));
        }
        for (int k = 0; k < d; k++) {
            double[] row = new double[d + 1];
            row[k] = 1.0;
            constraints.add(new LinearConstraint(row, Relationship.LEQ, Math.min(radius, hi[k] - p[k])));
            constraints.add(new LinearConstraint(row, Relationship.GEQ, -Math.min(radius, p[k] - lo[k])));
        }
        double[] objective = new double[d + 1];
        objective[d] = 1.0;
        try {
            PointValuePair solution = new SimplexSolver().optimize(new MaxIter(1000),
                    new LinearObjectiveFunction(objective, 0.0), new LinearConstraintSet(constraints),
                    GoalType.MINIMIZE, new NonNegativeConstraint(false));
            return solution.getPoint();
        } catch (MathIllegalStateException noSolution) {
            return null; // unbounded or infeasible through round-off: try a smaller region
        }
    }
}
