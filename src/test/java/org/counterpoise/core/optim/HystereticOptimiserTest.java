package org.counterpoise.core.optim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.testing.HystereticDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * The exact H-infinity optimum of the hysteretic absorber against outside sources: its closed form
 * on an undamped structure (derived in docs/realisation.md and checked symbolically there), the
 * fixed-point values (the method Snowdon 1968 applies; reconstructed, see {@link HystereticFixedPoints}),
 * an independent brute force (a grid over f and eta of peaks from a direct complex solve, refined by
 * Nelder-Mead), the viscous exact optimum (measured difference), and its own optimality conditions.
 */
class HystereticOptimiserTest {

    @Test
    void undampedForceToDisplacementHasTheClosedFormOptimum() {
        // f = 1/(1+mu), eta^2 = mu (3 + mu)/2, peak^2 = 2 (1 + mu)/mu: with these, h^2 |D|^2 - |N|^2 is a
        // perfect square in x = g^2 with two double roots, so the two peaks are exactly equal (the
        // algebra is in docs/realisation.md)
        for (double mu : new double[] {0.01, 0.05, 0.1, 0.2, 0.5}) {
            PeakProblem p = PeakProblem.allFrequencies(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, mu, 0.0);
            HystereticPeakOptimum o = HystereticOptimiser.optimise(p);
            assertTrue(o.certified(), "mu " + mu);
            assertEquals(1 / (1 + mu), o.absorber().tuningRatio(), 1e-9, "mu " + mu);
            assertEquals(Math.sqrt(mu * (3 + mu) / 2), o.absorber().lossFactor(), 1e-8, "mu " + mu);
            assertEquals(Math.sqrt(2 * (1 + mu) / mu), o.peak(), 1e-10 * o.peak(), "mu " + mu);
            assertEquals("two interior peaks", o.activeSet());
        }
    }

    @Test
    void theFixedPointDesignIsCloseButNotExact() {
        // Measured (docs/realisation.md): the fixed-point tuning is the exact one; its loss factor is
        // 0.08 % (mu = 0.01) to 1.72 % (mu = 0.2) low, and its peak 9.2e-5 to 8.5e-3 above the optimum,
        // which itself lies above the fixed-point height sqrt(1 + 2/mu) (a lower bound on any design)
        double[] mus = {0.01, 0.05, 0.1, 0.2};
        double[] lowBy = {0.0008, 0.0042, 0.0085, 0.0172};
        double[] above = {9.2e-5, 1.06e-3, 3.01e-3, 8.49e-3};
        for (int i = 0; i < mus.length; i++) {
            double mu = mus[i];
            PeakProblem p = PeakProblem.allFrequencies(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, mu, 0.0);
            HystereticPeakOptimum o = HystereticOptimiser.optimise(p);
            assertEquals(o.absorber().tuningRatio(), HystereticFixedPoints.tuningRatio(mu), 1e-9);
            double eta = HystereticFixedPoints.lossFactor(mu);
            assertEquals(lowBy[i], 1 - eta / o.absorber().lossFactor(), 1e-4, "mu " + mu);
            double fixedPointPeak = HystereticOptimiser.peakOf(p, HystereticFixedPoints.tuningRatio(mu), eta);
            assertEquals(above[i], fixedPointPeak / o.peak() - 1, 0.01 * above[i], "mu " + mu);
            assertTrue(o.peak() > HystereticFixedPoints.fixedPointHeight(mu));
        }
    }

    @Test
    void aBruteForceOverTuningAndLossFactorNeverBeatsTheOptimum() {
        Object[][] cases = {
            {ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.05, 0.02, 0.8, 1.25},
            {ExcitationKind.BASE_ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT, 0.1, 0.05, 0.5, 2.0},
            {ExcitationKind.FORCE, ResponseKind.ACCELERATION, 0.03, 0.01, 0.9, 1.4},
        };
        for (Object[] c : cases) {
            ExcitationKind e = (ExcitationKind) c[0];
            ResponseKind r = (ResponseKind) c[1];
            double mu = (double) c[2];
            double zeta1 = (double) c[3];
            double low = (double) c[4];
            double high = (double) c[5];
            HystereticPeakOptimum o = HystereticOptimiser.optimise(PeakProblem.free(e, r, mu, zeta1, low, high));
            assertTrue(o.certified(), e + " " + r);
            // grid: 17 tunings over [0.6, 1.4] times 17 loss factors log-spaced over [0.02, 1.5]
            double[] best = {0, 0, Double.POSITIVE_INFINITY};
            for (int i = 0; i < 17; i++) {
                double f = 0.6 + 0.8 * i / 16;
                for (int j = 0; j < 17; j++) {
                    double eta = 0.02 * Math.pow(75, j / 16.0);
                    double peak = HystereticDirectSolve.peak(e, r, zeta1, mu, f, eta, low, high, 300);
                    if (peak < best[2]) {
                        best = new double[] {f, eta, peak};
                    }
                }
            }
            PointValuePair refined = new SimplexOptimizer(1e-12, 1e-14).optimize(new MaxEval(300),
                    new ObjectiveFunction(u -> HystereticDirectSolve.peak(e, r, zeta1, mu, u[0], Math.abs(u[1]), low,
                            high, 300)), GoalType.MINIMIZE, new InitialGuess(new double[] {best[0], best[1]}),
                    new NelderMeadSimplex(new double[] {0.02, 0.05}));
            double brute = Math.min(best[2], refined.getValue());
            assertTrue(brute >= o.peak() * (1 - 1e-9), e + " " + r + ": brute force " + brute + " below " + o.peak());
            // measured: the brute force ends 2e-13 to 8e-13 above the optimum, at its f and eta to 1e-6
            assertEquals(o.peak(), brute, 1e-9 * o.peak(), e + " " + r + " brute force reaches the optimum");
            assertEquals(o.absorber().tuningRatio(), refined.getPoint()[0], 1e-4, e + " " + r);
            assertEquals(o.absorber().lossFactor(), Math.abs(refined.getPoint()[1]), 1e-4, e + " " + r);
        }
    }

    @Test
    void theOptimumSatisfiesItsConditionsAndNoSmallMoveLowersIt() {
        Random random = new Random(2026L);
        ExcitationKind[] excitations = {ExcitationKind.FORCE, ExcitationKind.BASE_ACCELERATION, ExcitationKind.UNBALANCE};
        ResponseKind[] responses = {ResponseKind.DISPLACEMENT, ResponseKind.RELATIVE_DISPLACEMENT,
            ResponseKind.TRANSMITTED_FORCE};
        for (int trial = 0; trial < 6; trial++) {
            double low = 0.6 + 0.6 * random.nextDouble();
            PeakProblem p = PeakProblem.free(excitations[trial % 3], responses[(trial / 3 + trial) % 3],
                    0.02 + 0.2 * random.nextDouble(), 0.05 * random.nextDouble(), low, low * (1.2 + random.nextDouble()));
            HystereticPeakOptimum o = HystereticOptimiser.optimise(p);
            assertTrue(o.certified(), p.toString());
            assertTrue(o.violation() <= HystereticCertificate.VIOLATION_LIMIT, p + " " + o.violation());
            double f = o.absorber().tuningRatio();
            double eta = o.absorber().lossFactor();
            for (double angle = 0; angle < 2 * Math.PI; angle += Math.PI / 4) {
                double ff = f * (1 + 1e-4 * Math.cos(angle));
                double ee = Math.max(0, eta + 1e-4 * Math.max(eta, 0.01) * Math.sin(angle));
                assertTrue(HystereticOptimiser.peakOf(p, ff, ee) >= o.peak() * (1 - 1e-9), p + " angle " + angle);
            }
        }
    }

    @Test
    void theHystereticPeakAgainstTheViscousOptimumsPeak() {
        // Measured over 51 random problems (mu 0.01-0.31, zeta1 0-0.1, every excitation and response of
        // the structure, all frequencies or bands): the hysteretic optimum's peak over the viscous exact
        // optimum's peak lies in [0.977, 1.130]. Below 1 where the band lies away from the absorber's
        // frequency (a viscous damper's loss eta = c omega / k falls below resonance); above it in the
        // classical all-frequency cases (1.0023 to 1.0417 for force to displacement, mu 0.01 to 0.2).
        Random random = new Random(5L);
        ExcitationKind[] excitations = {ExcitationKind.FORCE, ExcitationKind.BASE_DISPLACEMENT,
            ExcitationKind.BASE_ACCELERATION};
        ResponseKind[] responses = {ResponseKind.DISPLACEMENT, ResponseKind.ACCELERATION,
            ResponseKind.RELATIVE_DISPLACEMENT};
        double lowest = Double.POSITIVE_INFINITY;
        for (int trial = 0; trial < 6; trial++) {
            double low = 0.5 + random.nextDouble();
            PeakProblem p = PeakProblem.free(excitations[trial % 3], responses[random.nextInt(3)],
                    0.01 + 0.3 * random.nextDouble(), 0.1 * random.nextDouble(), low, low * (1.1 + random.nextDouble()));
            double ratio = HystereticOptimiser.optimise(p).peak() / HInfinityOptimiser.optimise(p).peak();
            lowest = Math.min(lowest, ratio);
            assertTrue(ratio > 0.97 && ratio < 1.14, p + ": " + ratio);
        }
        for (double mu : new double[] {0.01, 0.05, 0.1, 0.2}) {
            PeakProblem p = PeakProblem.allFrequencies(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, mu, 0.0);
            // against Nishihara and Asami's (2002) exact viscous peak
            double root = Math.sqrt(4 + 3 * mu);
            double viscous = (16 + 9 * mu + 4 * root) / (3 * Math.sqrt(mu * (16 + 9 * mu + 8 * root)));
            double ratio = HystereticOptimiser.optimise(p).peak() / viscous;
            assertTrue(ratio > 1.002 && ratio < 1.042, "mu " + mu + ": " + ratio);
        }
        assertTrue(lowest < 1.14);
    }
}
