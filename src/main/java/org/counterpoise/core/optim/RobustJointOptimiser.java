package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.robust.WorstCase;

/**
 * One absorber per mode designed for the least worst-case peak over the band ({@link RobustJointProblem}):
 * each designed mode's natural frequency anywhere in its range on its own, both absorbers off by a
 * common factor, every damping ratio at or above the floor.
 *
 * <p>Method: exchange ({@link RobustExchange}, as the robust design of several absorbers on one
 * mode) on the four variables of the joint design ({@link JointAbsorberVariables}, each build judged
 * by its own exact transfer function and gradient); the worst case over the continuum of the three
 * factors by a grid and Brent refinement ({@link WorstCase#overBox}). Seeds: the certified joint
 * least-peak design (its damping raised to the floor), the same with twice the damping (a robust
 * design spends more on damping), and the sequential design; only the one with the least largest
 * peak over the first builds is pursued (each local search is seconds here, and on the invented
 * cases of the tests all three ended at the same design to 1e-10; the certificate's scan restarts
 * the search from any lower point it finds). The certificate is the joint design's
 * ({@link AbsorberSetCertificate}: equal active peaks over the builds, first-order conditions, the
 * coarse scan of 512 seeded random designs judged over every build, random moves).
 */
public final class RobustJointOptimiser {
    private RobustJointOptimiser() {
    }

    /**
     * @param problem the problem
     * @return the robust design, its worst case, its nominal peak and the evidence, in the setup's units
     */
    public static RobustJointResult optimise(RobustJointProblem problem) {
        EvaluationCounter counter = new EvaluationCounter();
        JointAbsorberSetup setup = problem.setup();
        JointAbsorberResult leastPeak = JointAbsorberOptimiser.optimise(setup);
        counter.add(leastPeak.evaluations());
        JointAbsorberVariables layout = new JointAbsorberVariables(setup);
        double[] lower = layout.lower();
        int n = JointAbsorberProblem.MODES;
        for (int j = 0; j < n; j++) {
            if (problem.dampingFloor() > 0) {
                lower[n + j] = Math.max(lower[n + j], Math.log(problem.dampingFloor()));
            }
        }
        double[] ranges = problem.ranges();
        RobustExchange.Builds builds = new RobustExchange.Builds() {
            @Override
            public RobustSetVariables over(List<double[]> factors) {
                List<JointAbsorberVariables> each = new ArrayList<>();
                for (double[] b : factors) {
                    each.add(new JointAbsorberVariables(setup, b));
                }
                return new RobustSetVariables(layout, each, lower);
            }

            @Override
            public double[] worst(double[] p) {
                return WorstCase.overBox(b -> new JointAbsorberVariables(setup, b).peak(p), ranges);
            }

            @Override
            public List<double[]> scan(RobustSetVariables v, EvaluationCounter c) {
                return AbsorberSetScan.evaluate(v, AbsorberSetScan.random(v), c);
            }

            @Override
            public double[] ranges() {
                return ranges.clone();
            }
        };
        double[] least = layout.point(leastPeak.design());
        double[] damped = least.clone();
        for (int j = 0; j < n; j++) {
            damped[n + j] += Math.log(2);
        }
        List<double[]> seeds = List.of(least, damped, layout.point(leastPeak.sequentialDesign()));

        RobustExchange.Result r = RobustExchange.run(builds, RobustExchange.nominalAndCorners(ranges), seeds, 1,
                counter);
        double scale = layout.referenceStiffness();
        double[] worst = r.worst();
        AbsorberSetDesign design = layout.design(r.point());
        return new RobustJointResult(problem, design, worst[n + 1] / scale, List.of(worst[0], worst[1], worst[2]),
                setup.peak(design), r.builds(), r.converged(), r.certificate(), leastPeak, counter.count());
    }
}
