package org.counterpoise.core.optim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * Several absorbers on one mode against references outside the optimiser. No published table of
 * optimum multiple-absorber peaks (Yamaguchi and Harnpornchai 1993; Zuo and Nayfeh 2005) could be
 * found with the search tools available here, so none is compared: the optima are checked instead
 * against (1) the closed-form exact single-absorber optimum (n = 1), (2) the property that more
 * freedom with the same total mass cannot do worse, (3) an independent brute force (Nelder-Mead
 * from seeded starts on the peak of a dense frequency sweep of the dense matrix solve), and (4) the
 * peak value against that dense solve.
 */
class AbsorberSetOptimiserTest {

    /**
     * One absorber: the exact optimum peak for an undamped structure, all frequencies, in closed form
     * (reference sheet section 3: equal double roots of the Nishihara and Asami 2002 optimum, J. Vib.
     * Acoust. 124(4) 576-582; the peak expression derived there, "not from a publication") and the
     * optimum tuning and damping of Nishihara and Asami 2002 (from memory, confirmed exact there).
     */
    @Test
    void oneAbsorberIsTheExactSingleAbsorberOptimum() {
        for (double mu : new double[] {0.01, 0.05, 0.2}) {
            double r = Math.sqrt(4 + 3 * mu);
            double peak = (16 + 9 * mu + 4 * r) / (3 * Math.sqrt(mu * (16 + 9 * mu + 8 * r)));
            double f = (2 / (1 + mu)) * Math.sqrt(2 * (16 + 23 * mu + 9 * mu * mu + 2 * (2 + mu) * r)
                    / (3 * (64 + 80 * mu + 27 * mu * mu)));
            double zeta = 0.25 * Math.sqrt((8 + 9 * mu - 4 * r) / (1 + mu));
            for (AbsorberSetTuning tuning : AbsorberSetTuning.values()) {
                AbsorberSetOptimum o = AbsorberSetOptimiser.optimise(AbsorberSetProblem.allFrequencies(1, mu, 0.0, tuning));
                assertEquals(peak, o.peak(), 1e-9 * peak, "peak, mu " + mu + " " + tuning);
                assertEquals(f, o.design().tuningRatios().get(0), 1e-7 * f, "tuning, mu " + mu);
                assertEquals(zeta, o.design().dampingRatios().get(0), 1e-6 * zeta, "damping, mu " + mu);
                assertTrue(o.certificate().certified(), o.certificate().toString());
            }
        }
    }

    /** One absorber on a damped structure over a band: the program's single-absorber optimiser (its own certificate). */
    @Test
    void oneAbsorberOverABandOnADampedStructureIsTheSingleAbsorberOptimum() {
        double mu = 0.04;
        double zeta1 = 0.03;
        PeakOptimum single = HInfinityOptimiser.optimise(PeakProblem.free(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT,
                mu, zeta1, 0.8, 1.15));
        AbsorberSetOptimum o = AbsorberSetOptimiser.optimise(new AbsorberSetProblem(1, mu, zeta1, 0.8, 1.15,
                AbsorberSetTuning.UNIFORM));
        assertEquals(single.peak(), o.peak(), 1e-9 * single.peak());
        assertTrue(o.certificate().certified(), o.certificate().toString());
    }

    /**
     * A property, always true: with the same total mass, individual tuning (2n variables) contains
     * the uniform spread, which contains the single absorber (n equal absorbers at one tuning act as
     * one of the total mass), so the optimum peaks are ordered individual &lt;= uniform &lt;= single.
     */
    @Test
    void moreFreedomWithTheSameMassNeverDoesWorse() {
        for (double mu : new double[] {0.02, 0.1}) {
            for (double zeta1 : new double[] {0.0, 0.02}) {
                double single = HInfinityOptimiser.optimise(PeakProblem.allFrequencies(ExcitationKind.FORCE,
                        ResponseKind.DISPLACEMENT, mu, zeta1)).peak();
                for (int n = 2; n <= 3; n++) {
                    AbsorberSetOptimum uniform = AbsorberSetOptimiser.optimise(AbsorberSetProblem.allFrequencies(n, mu, zeta1,
                            AbsorberSetTuning.UNIFORM));
                    AbsorberSetOptimum individual = AbsorberSetOptimiser.optimise(AbsorberSetProblem.allFrequencies(n, mu,
                            zeta1, AbsorberSetTuning.INDIVIDUAL));
                    String where = "mu " + mu + " zeta1 " + zeta1 + " n " + n;
                    assertTrue(uniform.peak() < single * (1 - 1e-4), where + ": uniform " + uniform.peak() + " single " + single);
                    assertTrue(individual.peak() < uniform.peak() * (1 - 1e-4), where + ": individual " + individual.peak());
                    assertTrue(uniform.certificate().certified(), where + " " + uniform.certificate());
                    assertTrue(individual.certificate().certified(), where + " " + individual.certificate());
                }
            }
        }
    }

    /**
     * The certificate's claims, checked independently: the optimum peak equals the largest |X k1/F|
     * of a dense sweep (refined by golden section) of the dense matrix solve, to 1e-9; and
     * Nelder-Mead on that brute-force peak, started from seeded random points around the optimum,
     * finds nothing lower by more than 1e-9.
     */
    @Test
    void twoAbsorbersIndividuallyTunedSurviveAnIndependentBruteForce() {
        AbsorberSetProblem problem = AbsorberSetProblem.allFrequencies(2, 0.05, 0.01, AbsorberSetTuning.INDIVIDUAL);
        AbsorberSetOptimum o = AbsorberSetOptimiser.optimise(problem);
        AbsorberSetCertificate c = o.certificate();
        assertTrue(c.certified(), c.toString());
        assertTrue(c.activePeaks() >= 2, "several equal peaks at a minimax optimum: " + c.activePeaks());
        assertTrue(c.activeSpread() <= 1e-9, c.toString());
        double[] start = {o.design().tuningRatios().get(0), o.design().tuningRatios().get(1),
            o.design().dampingRatios().get(0), o.design().dampingRatios().get(1)};
        assertEquals(o.peak(), bruteForcePeak(problem, start), 1e-9 * o.peak(), "peak against the dense solve");
        Random random = new Random(2005);
        for (int trial = 0; trial < 3; trial++) {
            double[] guess = new double[4];
            for (int k = 0; k < 4; k++) {
                guess[k] = start[k] * (1 + 0.05 * (2 * random.nextDouble() - 1));
            }
            PointValuePair best = new SimplexOptimizer(1e-12, 1e-14).optimize(new MaxEval(4000),
                    new ObjectiveFunction(q -> bruteForcePeak(problem, q)), GoalType.MINIMIZE, new InitialGuess(guess),
                    new NelderMeadSimplex(new double[] {0.01, 0.01, 0.005, 0.005}));
            assertTrue(best.getValue() >= o.peak() * (1 - 1e-9),
                    "brute force found " + best.getValue() + " below " + o.peak());
        }
    }

    @Test
    void badInputIsRefusedInPlainWords() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> AbsorberSetProblem.allFrequencies(0, 0.05, 0, AbsorberSetTuning.UNIFORM));
        assertEquals("absorber count", e.field());
        e = assertThrows(InvalidInputException.class,
                () -> AbsorberSetProblem.allFrequencies(2, -1, 0, AbsorberSetTuning.UNIFORM));
        assertEquals("mass ratio", e.field());
    }

    /** Peak of |X k1 / F| for two absorbers {f1, f2, zeta1, zeta2} by a dense sweep of the direct solve, refined. */
    private static double bruteForcePeak(AbsorberSetProblem problem, double[] q) {
        if (q[0] <= 0 || q[1] <= 0 || q[2] <= 0 || q[3] <= 0) {
            return Double.POSITIVE_INFINITY;
        }
        List<Mode> modes = List.of(new Mode(1.0, problem.structureDamping(), 1.0, Map.of("s", 1.0)));
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < 2; j++) {
            absorbers.add(PointAbsorber.tuned("s", problem.massRatio() / 2, q[j], q[2 + j]));
        }
        DoubleUnaryOperator magnitude = g -> {
            Complex h = ModalDirectSolve.solve(modes, absorbers, "s", "s", g)[0];
            return h.abs();
        };
        return DenseSweep.maximum(magnitude, 0.5, 1.5, 6000);
    }
}
