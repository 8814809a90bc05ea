package org.counterpoise.core.optim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * One absorber per mode of a two-mode structure, designed jointly, against references outside the
 * optimiser: (1) the peak against a dense frequency sweep of the dense complex LU solve of the
 * equations of motion in modal and absorber coordinates ({@code ModalDirectSolve}, Commons Math),
 * refined by golden section; (2) Nelder-Mead (Commons Math) on that brute-force peak from seeded
 * starts near the optimum; (3) the property that the joint design, whose search starts from the
 * sequential one, is never worse; (4) modes far apart, where the two absorbers barely interact, so
 * that joint and sequential designs must nearly agree. No published optimum of jointly designed
 * absorbers on two modes was found to compare with.
 */
class JointAbsorberOptimiserTest {
    private static final double ALL = Double.POSITIVE_INFINITY;

    /** Modes 2.5 apart, equal modal masses, zeta = 0.01, mu = 0.05 in total (an invented case). */
    private static final JointAbsorberProblem TYPICAL = new JointAbsorberProblem(0.05, 0.01, 2.5, 1.0, 1.0, 0.0, ALL);

    @Test
    void jointAndSequentialPeaksEqualADenseSweepOfTheDenseSolve() {
        JointAbsorberOptimum o = JointAbsorberOptimiser.optimise(TYPICAL);
        assertTrue(o.certificate().certified(), o.certificate().toString());
        assertTrue(o.certificate().activeSpread() <= 1e-9, o.certificate().toString());
        assertEquals(o.peak(), bruteForcePeak(TYPICAL, variables(o.design()), 60_000), 1e-9 * o.peak(),
                "joint peak against the dense solve");
        assertEquals(o.sequentialPeak(), bruteForcePeak(TYPICAL, variables(o.sequentialDesign()), 60_000),
                1e-9 * o.sequentialPeak(), "sequential peak against the dense solve");
        assertTrue(o.peak() < o.sequentialPeak() * (1 - 1e-3), o.peak() + " against " + o.sequentialPeak());
    }

    /**
     * Nelder-Mead on the brute-force peak (every trial design evaluated by the dense solve), started
     * from seeded random points within 3 % of the optimum and kept inside the box of the variables
     * (each absorber's tuning in its own mode's neighbourhood), finds nothing lower by more than 1e-9.
     */
    @Test
    void nelderMeadOnTheBruteForcePeakFindsNothingLower() {
        JointAbsorberOptimum o = JointAbsorberOptimiser.optimise(TYPICAL);
        double[] start = variables(o.design());
        Random random = new Random(2026);
        for (int trial = 0; trial < 2; trial++) {
            double[] guess = new double[4];
            for (int k = 0; k < 4; k++) {
                guess[k] = start[k] * (1 + 0.03 * (2 * random.nextDouble() - 1));
            }
            guess[1] = Math.max(guess[1], Math.sqrt(TYPICAL.secondModeRatio()));
            double[] least = {Double.POSITIVE_INFINITY};
            ObjectiveFunction peak = new ObjectiveFunction(q -> {
                double value = bruteForcePeak(TYPICAL, q, 3000);
                least[0] = Math.min(least[0], value);
                return value;
            });
            try {
                new SimplexOptimizer(1e-12, 1e-14).optimize(new MaxEval(700), peak, GoalType.MINIMIZE,
                        new InitialGuess(guess), new NelderMeadSimplex(new double[] {0.01, 0.02, 0.005, 0.02}));
            } catch (TooManyEvaluationsException enough) {
                // the least value seen is what counts
            }
            assertTrue(least[0] >= o.peak() * (1 - 1e-9), "brute force found " + least[0] + " below " + o.peak());
        }
    }

    /**
     * Always true: the joint search starts from the sequential design and never accepts a higher peak.
     * Each result certified, except the last case: a light absorber on a light, stiff second mode
     * whose sharp peak is one of three active ones; there Newton on the minimax conditions stalls at
     * equal peaks to 1.5e-9 and first-order conditions to 1.5e-4 (above the certificate's 1e-9 and
     * 1e-4), and the program says "not found" (docs/several-modes.md, limits).
     */
    @Test
    void jointIsNeverAboveSequential() {
        List<JointAbsorberProblem> problems = List.of(
                new JointAbsorberProblem(0.05, 0.0, 1.5, 1.0, 0.6, 0.0, ALL),
                new JointAbsorberProblem(0.1, 0.02, 4.0, 0.5, -0.8, 0.0, ALL),
                new JointAbsorberProblem(0.05, 0.01, 2.5, 1.0, 1.0, 0.8, 1.2),
                new JointAbsorberProblem(0.02, 0.005, 3.0, 0.1, 1.0, 0.0, ALL));
        for (int i = 0; i < problems.size(); i++) {
            JointAbsorberProblem p = problems.get(i);
            JointAbsorberOptimum o = JointAbsorberOptimiser.optimise(p);
            assertTrue(o.peak() <= o.sequentialPeak() * (1 + 1e-12), p + ": " + o.peak() + " > " + o.sequentialPeak());
            assertTrue(o.gain() >= 1 - 1e-12, p.toString());
            assertTrue(o.certificate().certified() || i == problems.size() - 1, p + " " + o.certificate());
            assertEquals(p.massRatio(), p.absorberMassRatio(0) + p.absorberMassRatio(1), 1e-15 * p.massRatio());
            assertEquals(p.absorberMassRatio(0) / p.seenMass(0), p.absorberMassRatio(1) / p.seenMass(1),
                    1e-15, "equal mass ratios on each absorber's own mode");
        }
    }

    /**
     * Modes twenty times apart: each absorber acts on the other mode only as a small mass (absorber 2
     * below its tuning) or not at all (absorber 1 above its tuning), which the sequential design
     * counts; so the joint optimum must be within 1 % of it.
     */
    @Test
    void modesFarApartJointIsWithinOnePercentOfSequential() {
        for (double secondMass : new double[] {1.0, 0.2}) {
            JointAbsorberProblem p = new JointAbsorberProblem(0.05, 0.01, 20.0, secondMass, 1.0, 0.0, ALL);
            JointAbsorberOptimum o = JointAbsorberOptimiser.optimise(p);
            assertTrue(o.certificate().certified(), o.certificate().toString());
            assertTrue(o.gain() < 1.01, "gain " + o.gain() + " with M = " + secondMass);
        }
    }

    /**
     * Each absorber at the point where its mode moves most: mode 2 barely moves the first point
     * (phi = 0.3) and fully moves a second one, so absorber 2 sits there (a rank-two change of the
     * structure). The joint and sequential peaks against the dense solve, to 1e-9.
     */
    @Test
    void absorbersAtDifferentPointsAgreeWithTheDenseSolve() {
        JointAbsorberProblem p = new JointAbsorberProblem(0.05, 0.01, 2.5, 1.0, 0.3, 0.0, ALL,
                Optional.of(new JointAbsorberProblem.OtherPoint(0.5, 1.0)));
        assertEquals(JointAbsorberProblem.POINT, p.absorberPoint(0));
        assertEquals(JointAbsorberProblem.OTHER_POINT, p.absorberPoint(1));
        JointAbsorberOptimum o = JointAbsorberOptimiser.optimise(p);
        assertTrue(o.certificate().certified(), o.certificate().toString());
        assertTrue(o.peak() <= o.sequentialPeak() * (1 + 1e-12), o.peak() + " > " + o.sequentialPeak());
        assertEquals(o.peak(), bruteForcePeak(p, variables(o.design()), 60_000), 1e-9 * o.peak(), "joint peak");
        assertEquals(o.sequentialPeak(), bruteForcePeak(p, variables(o.sequentialDesign()), 60_000),
                1e-9 * o.sequentialPeak(), "sequential peak");
    }

    @Test
    void badInputIsRefusedInPlainWords() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new JointAbsorberProblem(0.05, 0.01, 1.0, 1.0, 1.0, 0.0, ALL));
        assertEquals("second mode ratio", e.field());
        e = assertThrows(InvalidInputException.class, () -> new JointAbsorberProblem(0.05, 0.01, 2.0, 1.0, 0.0, 0.0, ALL));
        assertEquals("second mode shape", e.field());
        e = assertThrows(InvalidInputException.class, () -> new JointAbsorberProblem(0.05, 0.01, 2.0, -1.0, 1.0, 0.0, ALL));
        assertEquals("second mode mass", e.field());
        e = assertThrows(InvalidInputException.class, () -> new JointAbsorberProblem(0.0, 0.01, 2.0, 1.0, 1.0, 0.0, ALL));
        assertEquals("mass ratio", e.field());
    }

    private static double[] variables(AbsorberSetDesign d) {
        return new double[] {d.tuningRatios().get(0), d.tuningRatios().get(1), d.dampingRatios().get(0),
            d.dampingRatios().get(1)};
    }

    /**
     * Peak of |X k1 / F| for {f1, f2, zeta1, zeta2} by the dense solve: a sweep from 0 to 2 R, every
     * sampled local maximum refined by golden section. Outside the box of the variables: +infinity.
     */
    private static double bruteForcePeak(JointAbsorberProblem p, double[] q, int samples) {
        double boundary = Math.sqrt(p.secondModeRatio());
        if (q[0] <= 0 || q[0] > boundary || q[1] < boundary || q[2] <= 0 || q[3] <= 0) {
            return Double.POSITIVE_INFINITY;
        }
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < 2; j++) {
            absorbers.add(PointAbsorber.tuned(p.absorberPoint(j), p.absorberMassRatio(j), q[j], q[2 + j]));
        }
        DoubleUnaryOperator magnitude = g -> ModalDirectSolve.solve(p.structure().modes(), absorbers,
                JointAbsorberProblem.POINT, JointAbsorberProblem.POINT, g)[0].abs();
        double low = p.bandLow();
        double high = Double.isInfinite(p.bandHigh()) ? 2 * p.secondModeRatio() : p.bandHigh();
        return DenseSweep.everyMaximum(magnitude, low, high, samples);
    }
}
