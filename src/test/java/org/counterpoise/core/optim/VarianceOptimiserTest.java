package org.counterpoise.core.optim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.MeanSquare;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.response.TransferFunctions;
import org.counterpoise.core.tuning.MinimumVariance;
import org.counterpoise.testing.Quadrature;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The exact mean square and the H2 optimiser. */
class VarianceOptimiserTest {

    @Test
    void lyapunovMeanSquareEqualsNumericalIntegrationOnRandomDampedSystems() {
        // Independent route: Gauss-Legendre quadrature of |H|^2 (Quadrature).
        Random random = new Random(5);
        for (int trial = 0; trial < 15; trial++) {
            Tuning t = new Tuning(0.01 + 0.2 * random.nextDouble(), 0.8 + 0.4 * random.nextDouble(),
                    0.02 + 0.3 * random.nextDouble());
            double zeta1 = 0.05 * random.nextDouble();
            ResponseKind r = random.nextBoolean() ? ResponseKind.DISPLACEMENT : ResponseKind.VELOCITY;
            TransferFunction h = TransferFunctions.of(ExcitationKind.FORCE, r, zeta1, t);
            double numeric = Quadrature.meanSquare(h);
            assertEquals(numeric, MeanSquare.of(h), 1e-7 * numeric, "trial " + trial);
        }
        // Single degree of freedom: J = 1/(4 zeta) (Crandall and Mark 1963, ch. 2).
        assertEquals(1 / 0.12, MeanSquare.of(TransferFunctions.of(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT,
                0.03, null)), 1e-12);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.01, 0.05, 0.1, 0.2})
    void undampedStructureGivesThePublishedOptima(double mu) {
        // Crandall and Mark (1963); Warburton (1982), Table I.
        VarianceOptimum force = VarianceOptimiser.optimise(
                PeakProblem.allFrequencies(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, mu, 0));
        Tuning cm = MinimumVariance.forceDisplacement(mu);
        assertTrue(force.converged());
        assertEquals(MinimumVariance.forceDisplacementOptimum(mu), force.variance(), 1e-12 * force.variance());
        assertEquals(cm.tuningRatio(), force.tuning().tuningRatio(), 1e-7);
        assertEquals(cm.dampingRatio(), force.tuning().dampingRatio(), 1e-7);
        VarianceOptimum base = VarianceOptimiser.optimise(PeakProblem.allFrequencies(
                ExcitationKind.BASE_ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT, mu, 0));
        Tuning w = MinimumVariance.baseAccelerationRelativeDisplacement(mu);
        assertEquals(w.tuningRatio(), base.tuning().tuningRatio(), 1e-7);
        assertEquals(w.dampingRatio(), base.tuning().dampingRatio(), 1e-7);
    }

    @Test
    void dampedStructureOptimumIsALocalMinimumBelowTheClosedForm() {
        for (double zeta1 : new double[] {0.01, 0.03, 0.05}) {
            PeakProblem p = PeakProblem.allFrequencies(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.05, zeta1);
            VarianceOptimum o = VarianceOptimiser.optimise(p);
            Tuning seed = MinimumVariance.forceDisplacement(0.05);
            assertTrue(o.variance() <= MeanSquare.of(p.transferFunction(seed.tuningRatio(), seed.dampingRatio())));
            for (double[] d : new double[][] {{1e-3, 0}, {-1e-3, 0}, {0, 1e-3}, {0, -1e-3}}) {
                double j = MeanSquare.of(p.transferFunction(o.tuning().tuningRatio() + d[0],
                        o.tuning().dampingRatio() + d[1]));
                assertTrue(j >= o.variance());
            }
        }
    }

    @Test
    void infiniteMeanSquareAndBandsAreRefused() {
        // Reference sheet section 2: force to acceleration has an infinite mean square.
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> VarianceOptimiser.optimise(
                PeakProblem.allFrequencies(ExcitationKind.FORCE, ResponseKind.ACCELERATION, 0.05, 0.02)));
        assertTrue(e.getMessage().contains("infinite"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> VarianceOptimiser.optimise(new PeakProblem(
                ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.05, 0.02, 0.5, 2, Double.NaN, Double.NaN)));
    }
}
