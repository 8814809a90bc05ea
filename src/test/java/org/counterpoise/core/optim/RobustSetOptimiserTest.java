package org.counterpoise.core.optim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.robust.Mistuning;
import org.counterpoise.core.robust.RobustDesign;
import org.counterpoise.core.robust.RobustLimits;
import org.counterpoise.core.robust.RobustOptimiser;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * The least worst-case peak of several absorbers on one mode, checked from outside the optimiser:
 * (1) the worst case it reports against a brute force of the dense complex LU solve of the equations
 * of motion (Commons Math; {@link ModalDirectSolve}, nothing of the polynomial route), a grid over
 * the structure's frequency factor times a dense frequency sweep, each refined by golden section;
 * (2) Nelder-Mead (Commons Math) on that brute-force worst case from seeded starts near the optimum
 * finds nothing lower; (3) with no range it is the nominal least-peak optimum; (4) one absorber is
 * the program's single robust design (its own exchange by Nelder-Mead on a different model, the SI
 * 2-DOF {@code Mistuning}); (5) the scaling of a stiffer structure (check, not assumption).
 */
class RobustSetOptimiserTest {
    private static final double FLOOR = 0.01;

    /** The design's worst |X k1 / F| by brute force; band [lo, hi] swept (finite), structure range s. */
    private static double bruteWorst(AbsorberSetProblem set, AbsorberSetDesign d, double s, double lo, double hi,
            int sigmas, int frequencies) {
        DoubleUnaryOperator peakAt = sigma -> {
            List<Mode> modes = List.of(new Mode(sigma, set.structureDamping(), 1.0, Map.of("s", 1.0)));
            List<PointAbsorber> absorbers = new ArrayList<>();
            for (int j = 0; j < d.count(); j++) {
                absorbers.add(PointAbsorber.tuned("s", d.massRatios().get(j), d.tuningRatios().get(j),
                        d.dampingRatios().get(j)));
            }
            return DenseSweep.maximum(g -> ModalDirectSolve.solve(modes, absorbers, "s", "s", g)[0].abs(), lo, hi,
                    frequencies);
        };
        if (s == 0) {
            return peakAt.applyAsDouble(1.0);
        }
        double[] x = new double[sigmas + 1];
        double[] v = new double[sigmas + 1];
        for (int i = 0; i <= sigmas; i++) {
            x[i] = 1 - s + 2 * s * i / sigmas;
            v[i] = peakAt.applyAsDouble(x[i]);
        }
        double best = Double.NEGATIVE_INFINITY;
        for (int i = 0; i <= sigmas; i++) {
            boolean local = (i == 0 || v[i] >= v[i - 1]) && (i == sigmas || v[i] >= v[i + 1]);
            if (local) {
                // golden section between the neighbours of every local maximum of the grid
                double a = x[Math.max(0, i - 1)];
                double b = x[Math.min(sigmas, i + 1)];
                double r = (Math.sqrt(5) - 1) / 2;
                for (int k = 0; k < 30; k++) {
                    double c = b - r * (b - a);
                    double e = a + r * (b - a);
                    if (peakAt.applyAsDouble(c) > peakAt.applyAsDouble(e)) {
                        b = e;
                    } else {
                        a = c;
                    }
                }
                best = Math.max(best, Math.max(v[i], peakAt.applyAsDouble(0.5 * (a + b))));
            }
        }
        return best;
    }

    @Test
    void theWorstCaseIsTheBruteForceOfTheDirectSolveAndNelderMeadFindsNothingLower() {
        // uniform spread: three absorbers of 5 % in total, zeta1 = 0.01, all frequencies, +/-5 %
        AbsorberSetProblem set = AbsorberSetProblem.allFrequencies(3, 0.05, 0.01, AbsorberSetTuning.UNIFORM);
        RobustSetOptimum o = RobustSetOptimiser.optimise(new RobustSetProblem(set, 0.05, 0.0, FLOOR));
        assertTrue(o.certified(), o.certificate() + " converged " + o.converged());
        // all frequencies: the peaks lie near the mode; the sweep covers 0.5 to 1.6 (the static end is 1 / 0.95^2)
        double brute = bruteWorst(set, o.design(), 0.05, 0.5, 1.6, 40, 4000);
        assertEquals(brute, o.worstPeak(), 1e-6 * brute, "worst case against the direct solve");
        assertTrue(o.worstPeak() < RobustSetOptimiser.worstCase(o.problem(), o.leastPeak().design()).peak(),
                "the robust set has a lower worst case than the least-peak set");
        assertTrue(o.nominalPeak() >= o.leastPeak().peak() * (1 - 1e-9), "no lower nominal peak than the least-peak set");
        for (double z : o.design().dampingRatios()) {
            assertTrue(z >= FLOOR * (1 - 1e-12), "damping floor: " + z);
        }
        // Nelder-Mead on (f_c, spread, zeta) of the brute-force worst case, from seeded starts within 2 %
        double fLow = o.design().tuningRatios().get(0);
        double fHigh = o.design().tuningRatios().get(2);
        double[] start = {(fLow + fHigh) / 2, (fHigh - fLow) / ((fLow + fHigh) / 2), o.design().dampingRatios().get(0)};
        Random random = new Random(1993);
        for (int trial = 0; trial < 2; trial++) {
            double[] guess = new double[3];
            for (int k = 0; k < 3; k++) {
                guess[k] = start[k] * (1 + 0.02 * (2 * random.nextDouble() - 1));
            }
            double[] lowest = {Double.POSITIVE_INFINITY};
            ObjectiveFunction worst = new ObjectiveFunction(q -> {
                double w = q[2] < FLOOR || q[0] <= 0 || q[1] < 0 ? Double.POSITIVE_INFINITY
                        : bruteWorst(set, uniform(set, q), 0.05, 0.5, 1.6, 10, 600);
                lowest[0] = Math.min(lowest[0], w);
                return w;
            });
            try {
                new SimplexOptimizer(1e-10, 1e-14).optimize(new MaxEval(80), worst, GoalType.MINIMIZE,
                        new InitialGuess(guess), new NelderMeadSimplex(new double[] {0.01, 0.02, 0.01}));
            } catch (TooManyEvaluationsException budget) {
                // the lowest value seen within the budget is what is compared
            }
            assertTrue(lowest[0] >= o.worstPeak() * (1 - 1e-6), "brute force found " + lowest[0] + " below "
                    + o.worstPeak());
        }
    }

    @Test
    void individualTuningWithACommonAbsorberFactorAgreesWithTheBruteForce() {
        // two individually tuned absorbers of 4 % over a band, zeta1 = 0.02, structure +/-4 %, absorbers +/-2 %
        AbsorberSetProblem set = new AbsorberSetProblem(2, 0.04, 0.02, 0.8, 1.25, AbsorberSetTuning.INDIVIDUAL);
        RobustSetOptimum o = RobustSetOptimiser.optimise(new RobustSetProblem(set, 0.04, 0.02, FLOOR));
        assertTrue(o.certified(), o.certificate() + " converged " + o.converged());
        // the common absorber factor alpha: tunings alpha f_j, damping ratios zeta_j / alpha (dampers kept)
        double alpha = o.worstAbsorberFactor();
        List<Double> f = new ArrayList<>();
        List<Double> z = new ArrayList<>();
        for (int j = 0; j < 2; j++) {
            f.add(o.design().tuningRatios().get(j) * alpha);
            z.add(o.design().dampingRatios().get(j) / alpha);
        }
        AbsorberSetDesign built = new AbsorberSetDesign(o.design().massRatios(), f, z);
        double brute = bruteWorst(set, built, 0.04, 0.8, 1.25, 40, 3000);
        assertEquals(brute, o.worstPeak(), 1e-6 * brute, "worst case against the direct solve at the worst alpha");
        // every alpha of a grid: none above the reported worst case
        for (double a = 0.98; a <= 1.02 + 1e-12; a += 0.01) {
            List<Double> fa = new ArrayList<>();
            List<Double> za = new ArrayList<>();
            for (int j = 0; j < 2; j++) {
                fa.add(o.design().tuningRatios().get(j) * a);
                za.add(o.design().dampingRatios().get(j) / a);
            }
            double b = bruteWorst(set, new AbsorberSetDesign(o.design().massRatios(), fa, za), 0.04, 0.8, 1.25, 20, 1500);
            assertTrue(b <= o.worstPeak() * (1 + 1e-6), "alpha " + a + ": " + b + " above " + o.worstPeak());
        }
    }

    /** With no range the robust set is the least-peak set (damping above the floor there). */
    @Test
    void withNoRangeItIsTheNominalLeastPeakOptimum() {
        for (AbsorberSetTuning t : AbsorberSetTuning.values()) {
            AbsorberSetProblem set = new AbsorberSetProblem(2, 0.05, 0.01, 0.7, 1.3, t);
            RobustSetOptimum o = RobustSetOptimiser.optimise(new RobustSetProblem(set, 0.0, 0.0, FLOOR));
            AbsorberSetOptimum nominal = AbsorberSetOptimiser.optimise(set);
            assertEquals(nominal.peak(), o.worstPeak(), 1e-9 * nominal.peak(), t.toString());
            assertEquals(nominal.peak(), o.nominalPeak(), 1e-9 * nominal.peak(), t.toString());
            assertTrue(o.certified(), o.certificate().toString());
        }
    }

    /**
     * One absorber: the program's single robust design (RobustOptimiser, SI, by Nelder-Mead on the
     * 2-DOF model) over the structure range alone, damping floor 1 %, gives the same worst case.
     */
    @Test
    void oneAbsorberIsTheSingleRobustDesign() {
        double w1 = 2 * Math.PI * 12;
        double k1 = 2000 * w1 * w1;
        double force = 150;
        double mu = 0.05;
        double zeta1 = 0.02;
        Mistuning m = new Mistuning(Structure.of(2000, k1, zeta1),
                new Excitation(ExcitationKind.FORCE, force, new FrequencyBand(0.8 * w1, 1.2 * w1)), ResponseKind.DISPLACEMENT);
        AbsorberSetProblem set = new AbsorberSetProblem(1, mu, zeta1, 0.8, 1.2, AbsorberSetTuning.UNIFORM);
        for (double s : new double[] {0.03, 0.08}) {
            RobustSetOptimum o = RobustSetOptimiser.optimise(new RobustSetProblem(set, s, 0.0, FLOOR));
            AbsorberSetDesign d = o.leastPeak().design();
            RobustDesign single = RobustOptimiser.optimiseAboveFloor(m, mu, ToleranceRanges.stated(s, 0, 0),
                    List.of(new Tuning(mu, d.tuningRatios().get(0), d.dampingRatios().get(0))), RobustLimits.NONE,
                    FLOOR, ProgressListener.NONE);
            double theirs = single.worstCase().peak() * k1 / force;
            assertTrue(o.certified(), o.certificate().toString());
            assertEquals(theirs, o.worstPeak(), 1e-6 * theirs, "s " + s);
            assertEquals(single.tuning().tuningRatio(), o.design().tuningRatios().get(0), 1e-3, "tuning, s " + s);
        }
    }

    /**
     * The scaling the brief proposed, checked: the structure's frequency times sigma (stiffness by
     * sigma^2, modal mass and damping ratio kept) is the nominal problem with the band and every
     * tuning divided by sigma, the damping ratios kept, and the response divided by sigma^2 (it is
     * per F / k1 of the nominal structure). And each build's peak is the direct solve's.
     */
    @Test
    void aStifferStructureIsTheNominalProblemScaled() {
        AbsorberSetProblem set = new AbsorberSetProblem(3, 0.06, 0.015, 0.75, 1.3, AbsorberSetTuning.INDIVIDUAL);
        AbsorberSetVariables layout = new AbsorberSetVariables(set);
        double[] p = layout.individualPoint(set.design(new double[] {0.88, 0.97, 1.06}, new double[] {0.05, 0.04, 0.06}));
        for (double sigma : new double[] {0.93, 1.0, 1.07}) {
            double varied = new AbsorberSetVariables(set, sigma, 1.0).peak(p);
            AbsorberSetProblem scaled = new AbsorberSetProblem(3, 0.06, 0.015, 0.75 / sigma, 1.3 / sigma,
                    AbsorberSetTuning.INDIVIDUAL);
            double[] q = new AbsorberSetVariables(scaled).individualPoint(scaled.design(
                    new double[] {0.88 / sigma, 0.97 / sigma, 1.06 / sigma}, new double[] {0.05, 0.04, 0.06}));
            double fromScaled = new AbsorberSetVariables(scaled).peak(q) / (sigma * sigma);
            assertEquals(fromScaled, varied, 1e-10 * varied, "sigma " + sigma);
            double brute = bruteWorst(set, layout.design(p), 0.0, 0.75, 1.3, 0, 20000) ;
            if (sigma == 1.0) {
                assertEquals(brute, varied, 1e-9 * brute);
            }
        }
    }

    @Test
    void badRangesAreRefusedInPlainWords() {
        AbsorberSetProblem set = AbsorberSetProblem.allFrequencies(2, 0.05, 0.0, AbsorberSetTuning.UNIFORM);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new RobustSetProblem(set, 0.7, 0, FLOOR));
        assertEquals("structure frequency range", e.field());
        e = assertThrows(InvalidInputException.class, () -> new RobustSetProblem(set, 0.05, -0.1, FLOOR));
        assertEquals("absorber frequency range", e.field());
    }

    private static AbsorberSetDesign uniform(AbsorberSetProblem set, double[] q) {
        double[] f = new double[set.count()];
        double[] z = new double[set.count()];
        for (int j = 0; j < f.length; j++) {
            f[j] = q[0] * (1 + q[1] * ((double) j / (f.length - 1) - 0.5));
            z[j] = q[2];
        }
        return set.design(f, z);
    }
}
