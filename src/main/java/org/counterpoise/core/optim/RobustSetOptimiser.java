package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.robust.WorstCase;

/**
 * The least worst-case peak of several absorbers of equal mass on one mode
 * ({@link RobustSetProblem}): the structure's natural frequency anywhere in its range, the absorbers'
 * off together by a common factor, every damping ratio at or above the floor.
 *
 * <p>Method: exchange ({@link RobustExchange}; outer approximation, the usual method for semi-infinite
 * minimax problems, Hettich and Kortanek 1993, SIAM Review 35, section 7; the single absorber's robust
 * design does the same, {@code RobustOptimiser}). Over any finite set of builds the largest peak is at most the
 * worst case, for every design. So: (1) start with the nominal build and the corners of the ranges;
 * (2) minimise the largest peak over the set: every build's exact maxima are further smooth pieces
 * of one minimax ({@link RobustSetVariables}), solved by the machinery of the nominal problem
 * (trust-region linear programming and Newton on the first-order conditions, {@link MinimaxSearch});
 * (3) find the design's worst case over the continuum of the ranges (a grid and Brent's method on
 * the exact peak, {@link WorstCase#over}); (4) when it exceeds the set's largest peak by more than
 * {@value #GAP} (relative), add that build and go back to (2) from the design found. When the gap
 * closes, the minimax over the final set is certified as the nominal problem's is (equal active
 * peaks, first-order conditions, the coarse scan of the variables judged over every build of the
 * set, random moves), and the design's worst case is within {@value #GAP} of a lower bound on the
 * robust optimum (for the local optimum found; the scan covers the whole box).
 *
 * <p>Seeds: the certified least-nominal-peak set (its damping raised to the floor), and for the
 * uniform spread the same with twice the damping and half again the spread (a robust design spends
 * more on both); for individual tuning, the robust uniform optimum and the least-peak individual set.
 */
public final class RobustSetOptimiser {
    /** The exchange stops when the worst case is within this (relative) of the set's largest peak. */
    public static final double GAP = RobustExchange.GAP;

    private RobustSetOptimiser() {
    }

    /**
     * @param problem the problem
     * @return the robust set, its worst case, its nominal peak and the evidence
     */
    public static RobustSetOptimum optimise(RobustSetProblem problem) {
        EvaluationCounter counter = new EvaluationCounter();
        AbsorberSetProblem set = problem.set();
        AbsorberSetOptimum leastPeak = AbsorberSetOptimiser.optimise(set);
        counter.add(leastPeak.evaluations());
        AbsorberSetVariables layout = new AbsorberSetVariables(set);
        RobustExchange.Builds builds = new RobustExchange.Builds() {
            @Override
            public RobustSetVariables over(List<double[]> scenarios) {
                return new RobustSetVariables(set, scenarios, problem.dampingFloor());
            }

            @Override
            public double[] worst(double[] p) {
                WorstCase.Point w = worstCase(problem, layout, p);
                return new double[] {w.structureFactor(), w.absorberFactor(), w.peak()};
            }

            @Override
            public List<double[]> scan(RobustSetVariables v, EvaluationCounter c) {
                return AbsorberSetScan.scan(layout, v, c);
            }

            @Override
            public double[] ranges() {
                return new double[] {problem.structureRange(), problem.absorberRange()};
            }
        };
        List<double[]> seeds = seeds(problem, layout, leastPeak, counter);
        RobustExchange.Result r = RobustExchange.run(builds, RobustExchange.nominalAndCorners(builds.ranges()), seeds,
                seeds.size(), counter);
        double[] p = r.point();
        double[] worst = r.worst();
        return new RobustSetOptimum(problem, layout.design(p), worst[2], worst[0], worst[1], layout.peak(p),
                r.builds(), r.converged(), r.certificate(), leastPeak, counter.count());
    }

    /**
     * The worst case of any design of the problem's absorbers over its ranges (the same search the
     * optimiser uses), for comparing designs: the least-peak set or one absorber of the same mass.
     *
     * @param problem the ranges, structure and band (the design's count replaces the problem's)
     * @param design the absorbers as drawn
     * @return the worst peak of |X k1 / F| and where it occurs
     */
    public static WorstCase.Point worstCase(RobustSetProblem problem, AbsorberSetDesign design) {
        AbsorberSetProblem s = problem.set();
        AbsorberSetProblem individual = s.withAbsorbers(design.count(),
                design.massRatios().stream().mapToDouble(Double::doubleValue).sum(), AbsorberSetTuning.INDIVIDUAL);
        AbsorberSetVariables layout = new AbsorberSetVariables(individual);
        return worstCase(problem, layout, layout.individualPoint(design));
    }

    private static WorstCase.Point worstCase(RobustSetProblem problem, AbsorberSetVariables layout, double[] p) {
        AbsorberSetProblem set = layout.problem();
        return WorstCase.over((s, a) -> new AbsorberSetVariables(set, s, a).peak(p), problem.structureRange(),
                problem.absorberRange());
    }

    private static List<double[]> seeds(RobustSetProblem problem, AbsorberSetVariables layout,
            AbsorberSetOptimum leastPeak, EvaluationCounter counter) {
        AbsorberSetProblem set = problem.set();
        List<double[]> seeds = new ArrayList<>();
        if (set.tuning() == AbsorberSetTuning.UNIFORM) {
            double[] p = layout.pointOf(leastPeak.design());
            seeds.add(p);
            double[] wider = p.clone();
            wider[wider.length - 1] += Math.log(2);
            if (set.count() > 1) {
                wider[1] = Math.min(AbsorberSetProblem.MAX_SPREAD, 1.5 * wider[1]);
            }
            seeds.add(wider);
        } else {
            RobustSetOptimum uniform = optimise(new RobustSetProblem(set.with(AbsorberSetTuning.UNIFORM),
                    problem.structureRange(), problem.absorberRange(), problem.dampingFloor()));
            counter.add(uniform.evaluations());
            seeds.add(layout.individualPoint(uniform.design()));
            seeds.add(layout.individualPoint(leastPeak.design()));
        }
        return seeds;
    }
}
