package org.counterpoise.core.optim;

import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.MeanSquare;
import org.counterpoise.core.tuning.ClosedForm;
import org.counterpoise.core.tuning.ClosedForms;
import org.counterpoise.core.tuning.DenHartogEqualPeak;

/**
 * The exact H2 absorber: the tuning ratio and damping ratio that minimise the mean square of the
 * response to white noise, for any structure damping, with either variable optionally fixed.
 *
 * <p>The mean square is exact ({@link MeanSquare}) and smooth in (f, zeta_a), so Newton's method
 * on its gradient converges quadratically from the published closed form (Crandall and Mark 1963;
 * Warburton 1982), which is exact for an undamped structure and close for a damped one. Gradient
 * and Hessian are taken by central differences of ln J in ln f and ln zeta_a; a backtracking line
 * search keeps every step a descent. Stops when the Newton step changes ln f and ln zeta_a by less
 * than 1e-10, so the optimum J is exact to round-off (J is stationary there).
 */
public final class VarianceOptimiser {
    private static final double STEP = 1e-4;

    private VarianceOptimiser() {
    }

    /**
     * @param problem the problem; its band must be all frequencies (white noise)
     * @return the optimum
     * @throws InvalidInputException when the mean square is infinite for every absorber, or a
     *     band is given
     */
    public static VarianceOptimum optimise(PeakProblem problem) {
        if (!problem.allFrequencies()) {
            throw new InvalidInputException("band", problem.bandLow() + ":" + problem.bandHigh(),
                    "the variance objective is the mean square under white noise over all frequencies;"
                            + " leave the band out");
        }
        int[] count = {0};
        boolean tuningFree = Double.isNaN(problem.fixedTuning());
        boolean dampingFree = Double.isNaN(problem.fixedDamping());
        Tuning seed = ClosedForms.minimumVariance(problem.excitation(), problem.response(), problem.massRatio())
                .map(ClosedForm::tuning).orElse(DenHartogEqualPeak.tuning(problem.massRatio()));
        double[] v = {Math.log(tuningFree ? seed.tuningRatio() : problem.fixedTuning()),
            Math.log(dampingFree ? seed.dampingRatio() : Math.max(problem.fixedDamping(), 1e-300))};
        double value = logJ(problem, v, count);
        if (Double.isInfinite(value)) {
            throw new InvalidInputException("response", problem.response().label(),
                    "its mean square under white-noise " + problem.excitation().label() + " is infinite for every"
                            + " absorber (the response does not fall off at high frequency, or grows without bound"
                            + " at zero frequency); choose another response or the peak objective");
        }
        boolean[] free = {tuningFree, dampingFree};
        boolean converged = false;
        for (int iteration = 0; iteration < 50 && !converged; iteration++) {
            double[] grad = new double[2];
            double[][] hess = new double[2][2];
            for (int i = 0; i < 2; i++) {
                if (!free[i]) {
                    continue;
                }
                double[] plus = v.clone();
                double[] minus = v.clone();
                plus[i] += STEP;
                minus[i] -= STEP;
                double fp = logJ(problem, plus, count);
                double fm = logJ(problem, minus, count);
                grad[i] = (fp - fm) / (2 * STEP);
                hess[i][i] = (fp - 2 * value + fm) / (STEP * STEP);
            }
            if (free[0] && free[1]) {
                double[] pp = {v[0] + STEP, v[1] + STEP};
                double[] pm = {v[0] + STEP, v[1] - STEP};
                double[] mp = {v[0] - STEP, v[1] + STEP};
                double[] mm = {v[0] - STEP, v[1] - STEP};
                hess[0][1] = (logJ(problem, pp, count) - logJ(problem, pm, count) - logJ(problem, mp, count)
                        + logJ(problem, mm, count)) / (4 * STEP * STEP);
                hess[1][0] = hess[0][1];
            }
            double[] step = newtonStep(grad, hess, free);
            double alpha = 1.0;
            boolean moved = false;
            for (int halving = 0; halving < 40; halving++) {
                double[] trial = {v[0] + alpha * step[0], v[1] + alpha * step[1]};
                double t = logJ(problem, trial, count);
                if (t <= value) {
                    converged = Math.abs(alpha * step[0]) < 1e-10 && Math.abs(alpha * step[1]) < 1e-10;
                    v = trial;
                    value = t;
                    moved = true;
                    break;
                }
                alpha *= 0.5;
            }
            if (!moved) {
                converged = Math.abs(grad[0]) < 1e-7 && Math.abs(grad[1]) < 1e-7;
                break;
            }
        }
        Tuning t = problem.tuning(Math.exp(v[0]), Math.exp(v[1]));
        return new VarianceOptimum(t, Math.exp(value), count[0], converged);
    }

    private static double[] newtonStep(double[] grad, double[][] hess, boolean[] free) {
        double[] step = new double[2];
        if (free[0] && free[1]) {
            double det = hess[0][0] * hess[1][1] - hess[0][1] * hess[1][0];
            if (det > 0 && hess[0][0] > 0) {
                step[0] = -(hess[1][1] * grad[0] - hess[0][1] * grad[1]) / det;
                step[1] = -(hess[0][0] * grad[1] - hess[1][0] * grad[0]) / det;
                return step;
            }
        }
        for (int i = 0; i < 2; i++) {
            if (free[i]) {
                // Newton along one variable, or steepest descent where the Hessian is not positive.
                step[i] = hess[i][i] > 0 && !(free[0] && free[1]) ? -grad[i] / hess[i][i] : -0.1 * grad[i];
            }
        }
        return step;
    }

    private static double logJ(PeakProblem p, double[] v, int[] count) {
        count[0]++;
        double f = Math.exp(v[0]);
        double zeta = Math.exp(v[1]);
        if (!(f < 20) || !(zeta < 5)) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.log(MeanSquare.of(p.transferFunction(f, zeta)));
    }
}
