package org.counterpoise.core.tuning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.response.TransferFunctions;
import org.counterpoise.testing.Quadrature;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Minimum-variance absorbers, checked by an independent numerical integration of |H|^2
 * ({@link Quadrature}).
 */
class MinimumVarianceTest {

    static double meanSquare(TransferFunction h) {
        return Quadrature.meanSquare(h);
    }

    @Test
    void singleDegreeMeanSquareIsOneOverFourZeta() {
        // Crandall and Mark (1963), ch. 2: for |H|^2 = 1/((1-g^2)^2 + (2 zeta g)^2), J = 1/(4 zeta).
        double zeta = 0.05;
        assertEquals(1 / (4 * zeta), meanSquare(TransferFunctions.of(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT,
                zeta, null)), 1e-6 / (4 * zeta));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.02, 0.05, 0.1, 0.2})
    void forceDisplacementOptimumHasThePublishedMeanSquareAndIsAMinimum(double mu) {
        // Warburton (1982), Table I: J_opt = sqrt((1 + 3 mu/4) / (mu (1 + mu))).
        Tuning t = MinimumVariance.forceDisplacement(mu);
        double j = meanSquare(TransferFunctions.of(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0, t));
        assertEquals(MinimumVariance.forceDisplacementOptimum(mu), j, 1e-6 * j);
        assertIsLocalMinimum(t, ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, j);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.02, 0.1, 0.2})
    void baseAccelerationRelativeDisplacementOptimumIsAMinimum(double mu) {
        // Warburton (1982), Table I.
        Tuning t = MinimumVariance.baseAccelerationRelativeDisplacement(mu);
        double j = meanSquare(TransferFunctions.of(ExcitationKind.BASE_ACCELERATION,
                ResponseKind.RELATIVE_DISPLACEMENT, 0, t));
        assertIsLocalMinimum(t, ExcitationKind.BASE_ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT, j);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.02, 0.1, 0.2})
    void forceVelocityOptimumMatchesItsDerivation(double mu) {
        // Derived for this project (reference sheet section 3): J_opt = 1 / sqrt(mu (1+mu)).
        Tuning t = MinimumVariance.forceVelocity(mu);
        double j = meanSquare(TransferFunctions.of(ExcitationKind.FORCE, ResponseKind.VELOCITY, 0, t));
        assertEquals(1 / Math.sqrt(mu * (1 + mu)), j, 1e-6 * j);
        assertIsLocalMinimum(t, ExcitationKind.FORCE, ResponseKind.VELOCITY, j);
    }

    private static void assertIsLocalMinimum(Tuning t, ExcitationKind e, ResponseKind r, double j) {
        for (double[] d : new double[][] {{0.01, 0}, {-0.01, 0}, {0, 0.01}, {0, -0.01}}) {
            Tuning near = new Tuning(t.massRatio(), t.tuningRatio() * (1 + d[0]), t.dampingRatio() * (1 + d[1]));
            double jn = meanSquare(TransferFunctions.of(e, r, 0, near));
            assertTrue(jn > j, "perturbation " + d[0] + ", " + d[1] + " gave " + jn + " <= " + j);
        }
    }
}
