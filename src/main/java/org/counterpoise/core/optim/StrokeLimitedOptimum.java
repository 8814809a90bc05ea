package org.counterpoise.core.optim;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/** The H-infinity optimum held back by a stroke limit (used by {@link HInfinityOptimiser}). */
final class StrokeLimitedOptimum {
    private static final double MIN_DAMPING = 1e-4;
    private static final double MAX_DAMPING = PeakProblem.MAX_DAMPING;
    /** A scan point must beat the optimum by this much (relative) to force a restart. */
    private static final double SCAN_MARGIN = 1e-9;

    private StrokeLimitedOptimum() {
    }

    /**
     * The optimum on the stroke limit, when the free optimum's stroke exceeds it. More absorber
     * damping lowers the stroke, so the limit then holds with equality at the optimum: for each
     * tuning the least damping that meets it, zeta_c(f), is found by Brent's root finder, and the
     * band peak along that curve is minimised over f by Brent's minimiser (relative accuracy 1e-10
     * in f). Needs the damping to be free.
     */
    static PeakOptimum optimise(PeakProblem problem, PeakOptimum free, EvaluationCounter counter) {
        if (!Double.isNaN(problem.fixedDamping())) {
            throw new InvalidInputException("stroke limit", Checks.show(problem.strokeLimit()),
                    "cannot be met with the absorber damping held fixed (the best design's stroke exceeds it);"
                            + " free the damping or allow a larger stroke");
        }
        double limit = problem.strokeLimit();
        DoubleUnaryOperator dampingOnLimit = f -> {
            UnivariateFunction excess = z -> {
                counter.add(1);
                return Math.log(problem.strokePeak(f, z) / limit);
            };
            if (excess.value(MAX_DAMPING) > 0) {
                return Double.NaN;
            }
            if (excess.value(MIN_DAMPING) <= 0) {
                return MIN_DAMPING;
            }
            try {
                return new BrentSolver(1e-14, 1e-12)
                        .solve(200, excess, MIN_DAMPING, MAX_DAMPING);
            } catch (MathIllegalStateException
                    | MathIllegalArgumentException notBracketed) {
                return Double.NaN; // treated as "no damping meets the limit at this tuning"
            }
        };
        double f0 = free.tuning().tuningRatio();
        if (!Double.isNaN(problem.fixedTuning())) {
            double z = dampingOnLimit.applyAsDouble(f0);
            if (Double.isNaN(z)) {
                throw unreachable(problem);
            }
            return new PeakOptimum(problem.tuning(f0, z), PeakScan.peakOf(problem, f0, z, counter), "stroke on its limit",
                    counter.count(), true, ActiveConstraint.STROKE_LIMIT);
        }
        UnivariateFunction alongLimit = f -> {
            double z = dampingOnLimit.applyAsDouble(f);
            double peak = Double.isNaN(z) ? 1e300 : PeakScan.peakOf(problem, f, z, counter);
            return Double.isFinite(peak) ? peak : 1e300;
        };
        double low = Math.max(0.5 * f0, problem.minTuning());
        double high = Math.min(1.5 * f0, problem.maxTuning());
        double[] found = minimiseAlongLimit(alongLimit, low, high, f0);
        // Certification on the limit curve: a coarse scan of tunings over the whole search box;
        // a point that beats the local minimum restarts Brent's search around it.
        int points = 24;
        double[] grid = new double[points];
        for (int i = 0; i < points; i++) {
            grid[i] = problem.minTuning() * Math.pow(problem.maxTuning() / problem.minTuning(), i / (points - 1.0));
        }
        double scanBest = Double.POSITIVE_INFINITY;
        double scanAt = Double.NaN;
        for (double f : grid) {
            double v = alongLimit.value(f);
            if (v < scanBest) {
                scanBest = v;
                scanAt = f;
            }
        }
        if (scanBest < found[1] * (1 - SCAN_MARGIN)) {
            double ratio = Math.pow(problem.maxTuning() / problem.minTuning(), 1.0 / (points - 1.0));
            double[] again = minimiseAlongLimit(alongLimit, Math.max(scanAt / ratio, problem.minTuning()),
                    Math.min(scanAt * ratio, problem.maxTuning()), scanAt);
            if (again[1] < found[1]) {
                found = again;
            }
        }
        if (found[1] >= 1e300) {
            throw unreachable(problem);
        }
        double f = found[0];
        double z = dampingOnLimit.applyAsDouble(f);
        boolean certified = found[1] <= Math.min(scanBest, 1e300) * (1 + SCAN_MARGIN) && !Double.isNaN(z);
        if (Double.isNaN(z)) {
            throw unreachable(problem);
        }
        return new PeakOptimum(problem.tuning(f, z), PeakScan.peakOf(problem, f, z, counter), "stroke on its limit",
                counter.count(), certified, ActiveConstraint.STROKE_LIMIT);
    }

    /** Brent's minimiser of the peak along the stroke limit over [low, high]; {f, value}. */
    private static double[] minimiseAlongLimit(UnivariateFunction alongLimit,
            double low, double high, double start) {
        if (!(high > low)) {
            return new double[] {low, alongLimit.value(low)};
        }
        try {
            UnivariatePointValuePair best =
                    new BrentOptimizer(1e-10, 1e-14).optimize(
                            new MaxEval(500), new UnivariateObjectiveFunction(
                                    alongLimit), GoalType.MINIMIZE,
                            new SearchInterval(low, high,
                                    Math.max(low, Math.min(high, start))));
            return new double[] {best.getPoint(), best.getValue()};
        } catch (TooManyEvaluationsException limit) {
            return new double[] {start, alongLimit.value(start)};
        }
    }

    private static InvalidInputException unreachable(PeakProblem problem) {
        return new InvalidInputException("stroke limit", Checks.show(problem.strokeLimit()),
                "no absorber damping up to " + MAX_DAMPING + " keeps the stroke this small; allow a larger stroke or"
                        + " a heavier absorber");
    }
}
