package org.counterpoise.core.robust;

import java.util.List;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;

/**
 * The robust absorber: the tuning ratio and damping ratio that minimise the worst response over
 * the band when the structure's natural frequency is anywhere within +/- ds of nominal and the
 * absorber's within +/- da ({@link WorstCase}). The worst case is a maximum of maxima, not smooth,
 * so it is minimised by Nelder-Mead in (ln f, ln zeta_a) from each seed (the nominal optimum and
 * the classical design), to 1e-9 relative in the worst case; the best result is kept. By
 * construction it is never worse than any seed's worst case.
 */
public final class RobustOptimiser {
    /** What a cancelled search says it was. */
    private static final String WHAT = "the robust design";

    private RobustOptimiser() {
    }

    /**
     * @param m the mistuning model (nominal structure, disturbance, response)
     * @param massRatio mu
     * @param structureRange ds, fraction
     * @param absorberRange da, fraction
     * @param seeds starting tunings (their mass ratio is replaced by mu)
     * @return the robust design
     */
    public static RobustDesign optimise(Mistuning m, double massRatio, double structureRange, double absorberRange,
            List<Tuning> seeds) {
        return optimise(m, massRatio, structureRange, absorberRange, seeds, ProgressListener.NONE);
    }

    /**
     * @param m the mistuning model (nominal structure, disturbance, response)
     * @param massRatio mu
     * @param structureRange ds, fraction
     * @param absorberRange da, fraction
     * @param seeds starting tunings (their mass ratio is replaced by mu)
     * @param listener progress (per seed) and cancellation (asked before every worst-case evaluation)
     * @return the robust design
     * @throws CoreException with key {@link Messages#CANCELLED} when cancelled
     */
    public static RobustDesign optimise(Mistuning m, double massRatio, double structureRange, double absorberRange,
            List<Tuning> seeds, ProgressListener listener) {
        int[] count = {0};
        ObjectiveFunction worst = new ObjectiveFunction(v -> {
            listener.checkCancelled(WHAT);
            double f = Math.exp(v[0]);
            double zeta = Math.exp(v[1]);
            if (!(f > 0.05 && f < 20 && zeta > 1e-5 && zeta < 4)) {
                return Double.POSITIVE_INFINITY;
            }
            count[0]++;
            Absorber a = Absorber.of(m.structure(), new Tuning(massRatio, f, zeta));
            double value = Math.log(WorstCase.of(m, a, structureRange, absorberRange).peak());
            return Double.isNaN(value) || value == Double.NEGATIVE_INFINITY ? Double.POSITIVE_INFINITY : value;
        });
        Tuning best = null;
        WorstCase.Point bestWorst = null;
        boolean converged = true;
        for (Tuning seed : seeds) {
            listener.progress((double) seeds.indexOf(seed) / seeds.size());
            // Each seed is itself a candidate, evaluated exactly as given (not through ln and exp),
            // so the result is never worse than any seed.
            Tuning exactSeed = new Tuning(massRatio, seed.tuningRatio(), seed.dampingRatio());
            WorstCase.Point seedWorst = WorstCase.of(m, Absorber.of(m.structure(), exactSeed), structureRange,
                    absorberRange);
            if (bestWorst == null || seedWorst.peak() < bestWorst.peak()) {
                best = exactSeed;
                bestWorst = seedWorst;
            }
            if (!(seedWorst.peak() > 0) || Double.isInfinite(seedWorst.peak())) {
                // zero (the response underflows in SI) or unbounded: nothing to compare, no search
                converged = false;
                continue;
            }
            double[] start = {Math.log(seed.tuningRatio()), Math.log(Math.max(seed.dampingRatio(), 1e-3))};
            try {
                PointValuePair p = new SimplexOptimizer(1e-9, 1e-12).optimize(new MaxEval(1500), worst,
                        GoalType.MINIMIZE, new InitialGuess(start), new NelderMeadSimplex(new double[] {0.03, 0.25}));
                Tuning found = new Tuning(massRatio, Math.exp(p.getPoint()[0]), Math.exp(p.getPoint()[1]));
                WorstCase.Point foundWorst = WorstCase.of(m, Absorber.of(m.structure(), found), structureRange,
                        absorberRange);
                if (foundWorst.peak() < bestWorst.peak()) {
                    best = found;
                    bestWorst = foundWorst;
                }
            } catch (TooManyEvaluationsException e) {
                converged = false;
            }
        }
        Absorber a = Absorber.of(m.structure(), best);
        return new RobustDesign(best, bestWorst, m.peak(a, 1, 1), count[0], converged);
    }
}
