package org.counterpoise.core.optim;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.counterpoise.core.error.Checks;

/**
 * The lightest absorber that meets a target: the smallest mass ratio whose exact H-infinity
 * optimum keeps the peak response over the band at or below the target. The optimum peak falls
 * as the mass ratio grows, so the answer is the first crossing of the target found on a
 * logarithmic scan of mass ratios, refined by Brent's root finder to 1e-8 relative in mu.
 */
public final class MinimumMass {
    private static final int SCAN = 16;

    private MinimumMass() {
    }

    /**
     * The outcome.
     *
     * @param reachable true when some mass ratio up to the maximum meets the target
     * @param optimum the optimum at the smallest sufficient mass ratio (or at the maximum, when
     *     the target cannot be met)
     */
    public record Result(boolean reachable, PeakOptimum optimum) {
    }

    /**
     * @param problem the problem (its mass ratio is ignored)
     * @param target the largest allowed non-dimensional peak
     * @param maxMassRatio the largest mass ratio to consider
     * @return the lightest sufficient design, or the best at the maximum with reachable false
     */
    public static Result find(PeakProblem problem, double target, double maxMassRatio) {
        Checks.positive("target", target);
        Checks.inOpenRange("maximum mass ratio", maxMassRatio, 0.0, 2.0);
        double lowest = Math.min(1e-3, maxMassRatio / 10);
        double previous = Double.NaN;
        for (int i = 0; i < SCAN; i++) {
            double mu = lowest * Math.pow(maxMassRatio / lowest, i / (SCAN - 1.0));
            PeakOptimum o = HInfinityOptimiser.optimise(problem.withMassRatio(mu));
            if (o.peak() <= target) {
                if (Double.isNaN(previous)) {
                    return new Result(true, o);
                }
                double mu0;
                try {
                    mu0 = new BrentSolver(1e-8 * mu, 1e-12).solve(200,
                            m -> Math.log(HInfinityOptimiser.optimise(problem.withMassRatio(m)).peak() / target),
                            previous, mu);
                } catch (MathIllegalStateException
                        | MathIllegalArgumentException noRoot) {
                    return new Result(true, o); // the scanned mass ratio meets the target: keep it
                }
                PeakOptimum at = HInfinityOptimiser.optimise(problem.withMassRatio(mu0));
                // Brent returns a point within tolerance on either side; step to the sufficient side.
                if (at.peak() > target) {
                    mu0 *= 1 + 1e-8;
                    at = HInfinityOptimiser.optimise(problem.withMassRatio(mu0));
                }
                return new Result(at.peak() <= target, at);
            }
            previous = mu;
        }
        return new Result(false, HInfinityOptimiser.optimise(problem.withMassRatio(maxMassRatio)));
    }
}
