package org.counterpoise.core.optim;

import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;

/**
 * Derivative-free searches on the exact band peak, for the shapes where the active-set Newton
 * solver of {@link HInfinityOptimiser} finds no active set: Nelder-Mead in logarithmic variables,
 * and the probe test of first-order optimality on values.
 */
final class PeakDirectSearch {
    /** A probe must lower the peak by this much (relative) to refute a stationary point. */
    private static final double PROBE_MARGIN = 1e-9;
    private static final int MAX_SIMPLEX_EVALUATIONS = 4000;

    private PeakDirectSearch() {
    }

    /**
     * The fallback first-order test, on values: where the gradient test fails only because the
     * optimum is too flat in one variable to locate it to round-off (a very narrow band, a tiny
     * damping), no move of 10^-1 ... 10^-8 (relative in f; times max(zeta_a, 0.01) in zeta_a) in
     * any of the eight directions of the (f, zeta_a) plane, inside the box, lowers the peak by more
     * than 1e-9 relative. With a stroke limit only feasible moves count (run-up stroke within
     * the limit).
     */
    static boolean noDescentByProbe(PeakProblem p, double f, double zeta, double peak, EvaluationCounter counter) {
        double floor = peak * (1 - PROBE_MARGIN);
        boolean tuningFree = Double.isNaN(p.fixedTuning());
        boolean dampingFree = Double.isNaN(p.fixedDamping());
        for (int k = 1; k <= 8; k++) {
            double h = Math.pow(10, -k);
            for (int a = -1; a <= 1; a++) {
                for (int b = -1; b <= 1; b++) {
                    if ((a == 0 && b == 0) || (a != 0 && !tuningFree) || (b != 0 && !dampingFree)) {
                        continue;
                    }
                    double ft = f * (1 + a * h);
                    double zt = zeta + b * h * Math.max(zeta, 1e-2);
                    if (zt < 0 || !p.inBox(ft, zt)) {
                        continue;
                    }
                    if (PeakScan.peakOf(p, ft, zt, counter) < floor
                            && (!p.hasStrokeLimit() || p.strokePeak(ft, zt) <= p.strokeLimit())) {
                        return false;
                    }
                }
            }
        }
        return true;
    }

    static double[] nelderMead(PeakProblem p, double[] start, EvaluationCounter counter) {
        return nelderMead(p, start, counter, 0.05);
    }

    static double[] nelderMead(PeakProblem p, double[] start, EvaluationCounter counter, double size) {
        // Search in logarithms so that f and zeta_a stay positive without bounds.
        // The box is kept by clamping each trial into it and adding the distance outside as a
        // penalty (a continuous exact penalty), so no trial is ever built outside the box.
        double lowF = Math.log(p.minTuning());
        double highF = Math.log(p.maxTuning());
        double lowZ = Math.log(1e-8);
        double highZ = Math.log(PeakProblem.MAX_DAMPING);
        double[] guess = {clamp(Math.log(start[0]), lowF, highF), clamp(Math.log(Math.max(start[1], 1e-4)), lowZ, highZ)};
        double[] bestSeen = {Double.POSITIVE_INFINITY, guess[0], guess[1]};
        ObjectiveFunction objective = new ObjectiveFunction(v -> {
            double a = clamp(v[0], lowF, highF);
            double b = clamp(v[1], lowZ, highZ);
            double value = Math.log(PeakScan.peakOf(p, Math.exp(a), Math.exp(b), counter));
            if (value < bestSeen[0]) {
                bestSeen[0] = value;
                bestSeen[1] = a;
                bestSeen[2] = b;
            }
            return value + Math.abs(v[0] - a) + Math.abs(v[1] - b);
        });
        try {
            new SimplexOptimizer(1e-12, 1e-14).optimize(new MaxEval(MAX_SIMPLEX_EVALUATIONS), objective,
                    GoalType.MINIMIZE, new InitialGuess(guess), new NelderMeadSimplex(new double[] {size, 6 * size}));
        } catch (TooManyEvaluationsException limit) {
            // the best point seen is kept; certification decides whether it is an optimum
        }
        return new double[] {Math.exp(bestSeen[1]), Math.exp(bestSeen[2])};
    }

    private static double clamp(double v, double low, double high) {
        return Math.max(low, Math.min(high, v));
    }
}
